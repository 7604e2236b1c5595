using System.Text.Json;

namespace SpecLint.Cli.Tests.Changes;

/// <summary>
/// <c>check --against</c> on a channel with more than one gain: the figures are compared setting by setting,
/// paired by name, and each setting's figures equal those of the version checked on its own (the base and head
/// texts checked as plain files, outside any comparison, as the single-gain deltas test does).
/// </summary>
public sealed class AgainstSettingsTests
{
    private const string OneGain = "feedback:\n  resistance: 1 MΩ ±1%\n  capacitance: 3.3 pF ±10%\n  dielectric: C0G";

    /// <summary>
    /// A day range and a night range. No <c>switch</c>: an ideal switch drops the unselected branch out of the
    /// circuit (docs/references.md §D8), so an edit to the night branch cannot move the day figures at all; with an
    /// off-capacitance it would, a little, through the open switch.
    /// </summary>
    private static string Switched(string nightCf = "3.3 pF ±10%", string extra = "") => Specs.Clean
        .Replace("name: e2e-clean", "name: ch-sw", StringComparison.Ordinal)
        .Replace(OneGain, $$"""
            feedback:
              settings:
                - { name: day, resistance: 100 kΩ ±1%, capacitance: 10 pF ±5%, dielectric: C0G, input: { current: { min: 1 µA, max: 20 µA } } }
                - { name: night, resistance: 1 MΩ ±1%, capacitance: {{nightCf}}, dielectric: C0G }
            {{extra}}
            """.TrimEnd('\n'), StringComparison.Ordinal);

    private const string Dusk = "    - { name: dusk, resistance: 330 kΩ ±1%, capacitance: 4.7 pF ±10%, dielectric: C0G, input: { current: { min: 300 nA, max: 8 µA } } }";

    private static CliHarness Repository(string main, string branch)
    {
        var cli = new CliHarness();
        GitRepo.Init(cli);
        cli.Write("hw/sw.tia.yaml", main);
        GitRepo.Commit(cli, "switched channel");
        GitRepo.Git(cli.Root, "checkout", "-q", "-b", "change");
        cli.Write("hw/sw.tia.yaml", branch);
        GitRepo.Commit(cli, "edit the switched channel");
        return cli;
    }

    private static string Compact(JsonElement e) => JsonSerializer.Serialize(e);

    private static JsonElement Change(JsonDocument doc) =>
        doc.RootElement.GetProperty("changes").EnumerateArray().Single(c => c.GetProperty("file").GetString() == "hw/sw.tia.yaml");

    private static JsonElement Setting(JsonElement change, string name) =>
        change.GetProperty("settings").EnumerateArray().Single(s => s.GetProperty("name").GetString() == name);

    /// <summary>
    /// One setting of a spec checked on its own, in a folder of its own (a new file in the repository would be a
    /// change itself): its figures as the plain check's JSON gives them.
    /// </summary>
    private static JsonElement Alone(string text, string setting)
    {
        using var plain = new CliHarness();
        plain.Write("alone.tia.yaml", text);
        using var doc = JsonDocument.Parse(plain.Run("check", "alone.tia.yaml", "--format", "json").Out);
        return doc.RootElement.GetProperty("specs")[0].GetProperty("settings").EnumerateArray()
            .Single(s => s.GetProperty("name").GetString() == setting).Clone();
    }

    private static void SameFigures(JsonElement alone, JsonElement metrics)
    {
        Assert.Equal(alone.GetProperty("metrics").GetProperty("phaseMarginDeg").GetDouble(), metrics.GetProperty("phaseMarginDeg").GetDouble());
        Assert.Equal(alone.GetProperty("metrics").GetProperty("bandwidthHz").GetDouble(), metrics.GetProperty("bandwidthHz").GetDouble());
        Assert.Equal(alone.GetProperty("metrics").GetProperty("peakingDb").GetDouble(), metrics.GetProperty("peakingDb").GetDouble());
        Assert.Equal(alone.GetProperty("metrics").GetProperty("inputNoiseRmsA").GetDouble(), metrics.GetProperty("inputNoiseRmsA").GetDouble());
        Assert.Equal(alone.GetProperty("metrics").GetProperty("outputMinV").GetDouble(), metrics.GetProperty("outputMinV").GetDouble());
        Assert.Equal(alone.GetProperty("metrics").GetProperty("outputMaxV").GetDouble(), metrics.GetProperty("outputMaxV").GetDouble());
        Assert.Equal(alone.GetProperty("corners").GetProperty("phaseMarginDegMin").GetDouble(), metrics.GetProperty("phaseMarginDegMin").GetDouble());
        Assert.Equal(alone.GetProperty("corners").GetProperty("phaseMarginMinCorner").GetString(), metrics.GetProperty("phaseMarginMinCorner").GetString());
        Assert.Equal(alone.GetProperty("monteCarlo").GetProperty("yield").GetDouble(), metrics.GetProperty("yield").GetDouble());
    }

    [Fact]
    public void A_changed_night_cf_moves_only_the_night_figures_which_equal_each_version_checked_on_its_own()
    {
        var main = Switched();
        var branch = Switched(nightCf: "1 pF ±10%");
        using var cli = Repository(main, branch);

        var (_, output, error) = cli.Run("check", "--against", "main", "--format", "json");
        using var doc = JsonDocument.Parse(output);
        var change = Change(doc);
        Assert.Equal(["day", "night"], change.GetProperty("settings").EnumerateArray().Select(s => s.GetProperty("name").GetString()));
        Assert.All(change.GetProperty("settings").EnumerateArray(), s => Assert.False(s.TryGetProperty("status", out _), error));

        var day = Setting(change, "day").GetProperty("metrics");
        Assert.Equal(Compact(day.GetProperty("before")), Compact(day.GetProperty("after")));
        var night = Setting(change, "night").GetProperty("metrics");
        SameFigures(Alone(main, "night"), night.GetProperty("before"));
        SameFigures(Alone(branch, "night"), night.GetProperty("after"));
        SameFigures(Alone(main, "day"), day.GetProperty("before"));
        // A smaller Cf leaves less phase margin (the feedback zero moves up past the crossing).
        Assert.True(night.GetProperty("after").GetProperty("phaseMarginDeg").GetDouble() < night.GetProperty("before").GetProperty("phaseMarginDeg").GetDouble());

        // The spec-level figures stay the first setting's, as before settings were compared.
        Assert.Equal(Compact(day.GetProperty("before")), Compact(change.GetProperty("before")));

        // The terminal and the report name the setting on each moved figure, and only night moved.
        var text = cli.Run("check", "--against", "main", "--report", "out/report.md", "--html", "out/report.html");
        Assert.Matches(@"Phase margin: \d+\.\d° → \d+\.\d° \(−\d+\.\d°\) \[setting night\]", text.Out);
        Assert.DoesNotContain("[setting day", text.Out, StringComparison.Ordinal);
        var md = File.ReadAllText(cli.Path_("out/report.md"));
        Assert.Contains(@"| ch-sw \[setting night\] | Phase margin |", md, StringComparison.Ordinal);
        Assert.DoesNotContain(@"\[setting day\]", md, StringComparison.Ordinal);
        Assert.Contains("ch-sw [setting night]", File.ReadAllText(cli.Path_("out/report.html")), StringComparison.Ordinal);

        // One chart with a base-and-head pair of curves per setting.
        Assert.Contains("](report-plots/ch-sw.change-loop-gain.svg)", md, StringComparison.Ordinal);
        var loop = File.ReadAllText(cli.Path_("out/report-plots/ch-sw.change-loop-gain.svg"));
        foreach (var series in new[] { "|T| day, base", "|T| day, this change", "|T| night, base", "|T| night, this change" })
        {
            Assert.Contains(series, loop, StringComparison.Ordinal);
        }

        Assert.Contains("total, night, base", File.ReadAllText(cli.Path_("out/report-plots/ch-sw.change-noise.svg")), StringComparison.Ordinal);
    }

    [Fact]
    public void A_setting_added_on_the_head_has_only_its_head_figures_and_a_removed_one_only_its_base_figures()
    {
        var main = Switched();
        var branch = Switched(extra: Dusk);
        using var cli = Repository(main, branch);

        var (_, output, error) = cli.Run("check", "--against", "main", "--format", "json");
        using var doc = JsonDocument.Parse(output);
        var change = Change(doc);
        Assert.Equal(["day", "night", "dusk"], change.GetProperty("settings").EnumerateArray().Select(s => s.GetProperty("name").GetString()));
        var dusk = Setting(change, "dusk");
        Assert.Equal("added", dusk.GetProperty("status").GetString());
        Assert.Equal(JsonValueKind.Null, dusk.GetProperty("metrics").GetProperty("before").ValueKind);
        SameFigures(Alone(branch, "dusk"), dusk.GetProperty("metrics").GetProperty("after"));
        Assert.False(Setting(change, "night").TryGetProperty("status", out _), error);

        var text = cli.Run("check", "--against", "main");
        Assert.Matches(@"Phase margin: — → \d+\.\d° \[setting dusk, added\]", text.Out);

        // Night dropped in the working tree, compared with the committed head: removed, with its base figures only.
        cli.Write("hw/sw.tia.yaml", branch.Replace("    - { name: night, resistance: 1 MΩ ±1%, capacitance: 3.3 pF ±10%, dielectric: C0G }\n", "", StringComparison.Ordinal));
        var removed = cli.Run("check", "--against", "HEAD", "--format", "json");
        using var removedDoc = JsonDocument.Parse(removed.Out);
        Assert.True(Change(removedDoc).TryGetProperty("settings", out _), removed.Out + removed.Err);
        var night = Setting(Change(removedDoc), "night");
        Assert.Equal("removed", night.GetProperty("status").GetString());
        Assert.Equal(JsonValueKind.Null, night.GetProperty("metrics").GetProperty("after").ValueKind);
        SameFigures(Alone(branch, "night"), night.GetProperty("metrics").GetProperty("before"));
    }

    [Fact]
    public void A_sharded_comparison_of_settings_merges_into_the_unsharded_report()
    {
        using var cli = Repository(Switched(), Switched(nightCf: "1 pF ±10%", extra: Dusk));
        string[] common = ["check", "--against", "main", "--nominal-only", "--format", "json"];
        var whole = cli.Run([.. common, "--report", "whole/r.md"]);
        cli.Write("shard.json", cli.Run([.. common, "--shard", "1/1"]).Out);
        var merged = cli.Run("merge", "shard.json", "--report", "merged/r.md");
        Assert.True(whole.Out == merged.Out, merged.Err);
        var md = File.ReadAllText(cli.Path_("merged/r.md"));
        Assert.Equal(File.ReadAllText(cli.Path_("whole/r.md")), md);
        Assert.Contains(@"| ch-sw \[setting dusk, added\] | Phase margin | — |", md, StringComparison.Ordinal);
    }
}
