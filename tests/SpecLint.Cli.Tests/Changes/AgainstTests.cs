using System.Text.Json;

namespace SpecLint.Cli.Tests.Changes;

/// <summary><c>check --against</c> on real repositories: two branches, edits, a rename, a delete, a configuration change.</summary>
public sealed class AgainstTests
{
    private static string Clean(string name) => Specs.Clean.Replace("name: e2e-clean", $"name: {name}", StringComparison.Ordinal);

    /// <summary>The clean channel with Cf cut from 3.3 pF to 0.5 pF: the phase margin falls below the floor.</summary>
    private static string SmallCf(string name) => Clean(name).Replace("capacitance: 3.3 pF ±10%", "capacitance: 0.5 pF ±10%", StringComparison.Ordinal);

    /// <summary>A clean channel with another op-amp and sensor: not similar enough to any other file to pass for a move.</summary>
    private static string Other(string name) => Clean(name)
        .Replace("gbw: 10 MHz", "gbw: 20 MHz", StringComparison.Ordinal)
        .Replace("voltage-noise: 8 nV/√Hz", "voltage-noise: 5 nV/√Hz", StringComparison.Ordinal)
        .Replace("current-noise: 1 fA/√Hz", "current-noise: 2 fA/√Hz", StringComparison.Ordinal)
        .Replace("offset-voltage: 0.5 mV", "offset-voltage: 0.2 mV", StringComparison.Ordinal);

    /// <summary>main: a, b, c, d (d flagged); the branch edits a, renames b, deletes c, adds e, leaves d.</summary>
    private static CliHarness TwoBranches()
    {
        var cli = new CliHarness();
        GitRepo.Init(cli);
        cli.Write("hw/a.tia.yaml", Clean("ch-a"));
        cli.Write("hw/b.tia.yaml", Clean("ch-b"));
        cli.Write("hw/c.tia.yaml", SmallCf("ch-c"));
        cli.Write("hw/d.tia.yaml", SmallCf("ch-d"));
        GitRepo.Commit(cli, "four channels");
        GitRepo.Git(cli.Root, "checkout", "-q", "-b", "change");
        cli.Write("hw/a.tia.yaml", SmallCf("ch-a"));
        GitRepo.Git(cli.Root, "mv", "hw/b.tia.yaml", "hw/b2.tia.yaml");
        GitRepo.Git(cli.Root, "rm", "-q", "hw/c.tia.yaml");
        cli.Write("hw/e.tia.yaml", Other("ch-e"));
        GitRepo.Commit(cli, "edit a, move b, drop c, add e");
        return cli;
    }

    private static JsonElement Change(JsonDocument doc, string file) =>
        doc.RootElement.GetProperty("changes").EnumerateArray().Single(c => c.GetProperty("file").GetString() == file);

    private static string[] Rules(JsonElement change, string cls) =>
        [.. change.GetProperty("findings").GetProperty(cls).EnumerateArray().Select(f => f.GetProperty("rule").GetString()!).Order(StringComparer.Ordinal)];

    [Fact]
    public void Classifies_added_changed_renamed_deleted_and_leaves_untouched_specs_out()
    {
        using var cli = TwoBranches();
        var (exit, output, error) = cli.Run("check", "--against", "main", "--nominal-only", "--format", "json");
        Assert.True(exit == 1, error + output);
        using var doc = JsonDocument.Parse(output);
        var statuses = doc.RootElement.GetProperty("changes").EnumerateArray()
            .Select(c => $"{c.GetProperty("status").GetString()} {c.GetProperty("file").GetString()} {(c.GetProperty("previousFile").ValueKind == JsonValueKind.Null ? "-" : c.GetProperty("previousFile").GetString())}")
            .ToArray();
        Assert.Equal(["changed hw/a.tia.yaml -", "renamed hw/b2.tia.yaml hw/b.tia.yaml", "deleted hw/c.tia.yaml -", "added hw/e.tia.yaml -"], statuses);
        // d did not change, so it is not checked at all.
        Assert.DoesNotContain(doc.RootElement.GetProperty("specs").EnumerateArray(), s => s.GetProperty("file").GetString() == "hw/d.tia.yaml");
        Assert.Equal("main", doc.RootElement.GetProperty("against").GetProperty("ref").GetString());

        var a = Change(doc, "hw/a.tia.yaml");
        Assert.Contains("phase-margin", Rules(a, "new"));
        Assert.Empty(Rules(a, "resolved"));
        var c = Change(doc, "hw/c.tia.yaml");
        Assert.Equal(JsonValueKind.Null, c.GetProperty("after").ValueKind);
        Assert.Contains("phase-margin", Rules(c, "resolved"));
        var e = Change(doc, "hw/e.tia.yaml");
        Assert.Equal(JsonValueKind.Null, e.GetProperty("before").ValueKind);
        Assert.Empty(Rules(e, "new"));
    }

    [Fact]
    public void Deltas_equal_the_figures_of_each_version_checked_on_its_own()
    {
        using var cli = TwoBranches();
        var (_, output, _) = cli.Run("check", "--against", "main", "--format", "json");
        using var doc = JsonDocument.Parse(output);
        var a = Change(doc, "hw/a.tia.yaml");

        // Independently: each version of a checked as a plain file, outside any comparison.
        cli.Write("alone/base.tia.yaml", Clean("ch-a"));
        cli.Write("alone/head.tia.yaml", SmallCf("ch-a"));
        using var baseDoc = JsonDocument.Parse(cli.Run("check", "alone/base.tia.yaml", "--format", "json").Out);
        using var headDoc = JsonDocument.Parse(cli.Run("check", "alone/head.tia.yaml", "--format", "json").Out);
        foreach (var (side, plain) in new[] { ("before", baseDoc), ("after", headDoc) })
        {
            var spec = plain.RootElement.GetProperty("specs")[0];
            var m = a.GetProperty(side);
            Assert.Equal(spec.GetProperty("metrics").GetProperty("phaseMarginDeg").GetDouble(), m.GetProperty("phaseMarginDeg").GetDouble());
            Assert.Equal(spec.GetProperty("metrics").GetProperty("bandwidthHz").GetDouble(), m.GetProperty("bandwidthHz").GetDouble());
            Assert.Equal(spec.GetProperty("metrics").GetProperty("inputNoiseRmsA").GetDouble(), m.GetProperty("inputNoiseRmsA").GetDouble());
            Assert.Equal(spec.GetProperty("metrics").GetProperty("outputMaxV").GetDouble(), m.GetProperty("outputMaxV").GetDouble());
            Assert.Equal(spec.GetProperty("corners").GetProperty("phaseMarginDegMin").GetDouble(), m.GetProperty("phaseMarginDegMin").GetDouble());
            Assert.Equal(spec.GetProperty("monteCarlo").GetProperty("yield").GetDouble(), m.GetProperty("yield").GetDouble());
        }

        Assert.True(a.GetProperty("after").GetProperty("phaseMarginDeg").GetDouble() < a.GetProperty("before").GetProperty("phaseMarginDeg").GetDouble());
    }

    [Fact]
    public void Gate_new_passes_when_the_only_errors_were_there_before()
    {
        using var cli = new CliHarness();
        GitRepo.Init(cli);
        cli.Write("hw/d.tia.yaml", SmallCf("ch-d"));
        GitRepo.Commit(cli, "flagged channel");
        GitRepo.Git(cli.Root, "checkout", "-q", "-b", "change");
        // Lines move (a comment on top) and a title is added: the findings keep their identity.
        cli.Write("hw/d.tia.yaml", "# moved down by a comment\n" + SmallCf("ch-d").Replace("kind: transimpedance\n", "kind: transimpedance\ntitle: channel d\n", StringComparison.Ordinal));
        GitRepo.Commit(cli, "retitle d");

        var all = cli.Run("check", "--against", "main", "--nominal-only", "--format", "json");
        Assert.Equal(1, all.Exit);
        using var doc = JsonDocument.Parse(all.Out);
        var d = Change(doc, "hw/d.tia.yaml");
        Assert.Empty(Rules(d, "new"));
        Assert.Contains("phase-margin", Rules(d, "unchanged"));

        var gated = cli.Run("check", "--against", "main", "--nominal-only", "--gate", "new");
        Assert.True(gated.Exit == 0, gated.Out + gated.Err);
        Assert.Contains("0 new in this change", gated.Out, StringComparison.Ordinal);
        Assert.Contains("changed hw/d.tia.yaml: 0 new", gated.Out, StringComparison.Ordinal);

        // A new error fails even under --gate new, and only it is annotated.
        cli.Write("hw/e.tia.yaml", SmallCf("ch-e"));
        var fresh = cli.Run("check", "--against", "main", "--nominal-only", "--gate", "new", "--format", "github");
        Assert.Equal(1, fresh.Exit);
        Assert.Contains("file=hw/e.tia.yaml", fresh.Out, StringComparison.Ordinal);
        Assert.DoesNotContain("file=hw/d.tia.yaml", fresh.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Uncommitted_edits_and_new_files_count_as_changes()
    {
        using var cli = new CliHarness();
        GitRepo.Init(cli);
        cli.Write("hw/a.tia.yaml", Clean("ch-a"));
        cli.Write("hw/b.tia.yaml", Clean("ch-b"));
        GitRepo.Commit(cli, "two channels");
        cli.Write("hw/a.tia.yaml", SmallCf("ch-a"));
        cli.Write("hw/new.tia.yaml", Clean("ch-new"));
        var (_, output, _) = cli.Run("check", "--against", "HEAD", "--nominal-only", "--format", "json");
        using var doc = JsonDocument.Parse(output);
        Assert.Equal(["changed hw/a.tia.yaml", "added hw/new.tia.yaml"],
            doc.RootElement.GetProperty("changes").EnumerateArray().Select(c => $"{c.GetProperty("status").GetString()} {c.GetProperty("file").GetString()}"));
    }

    [Fact]
    public void A_configuration_change_rechecks_every_spec_with_the_base_judged_by_the_base_configuration()
    {
        using var cli = new CliHarness();
        GitRepo.Init(cli);
        cli.Write(".speclint.yaml", "include: [\"**/*.tia.yaml\"]\n");
        cli.Write("hw/a.tia.yaml", Clean("ch-a"));
        cli.Write("hw/b.tia.yaml", Clean("ch-b"));
        GitRepo.Commit(cli, "two channels");
        GitRepo.Git(cli.Root, "checkout", "-q", "-b", "stricter");
        // A floor above the clean channel's margin: both specs now fail, and the failures are new.
        cli.Write(".speclint.yaml", "include: [\"**/*.tia.yaml\"]\nrules:\n  phase-margin: { floor: 89 deg }\n");
        GitRepo.Commit(cli, "raise the floor");
        var (exit, output, _) = cli.Run("check", "--against", "main", "--nominal-only", "--format", "json");
        Assert.Equal(1, exit);
        using var doc = JsonDocument.Parse(output);
        Assert.True(doc.RootElement.GetProperty("against").GetProperty("everySpec").GetBoolean());
        foreach (var file in new[] { "hw/a.tia.yaml", "hw/b.tia.yaml" })
        {
            var c = Change(doc, file);
            Assert.Equal("changed", c.GetProperty("status").GetString());
            Assert.Contains("phase-margin", Rules(c, "new"));
        }
    }

    [Fact]
    public void A_house_rule_change_rechecks_every_spec_unless_house_rules_are_off()
    {
        using var cli = new CliHarness();
        GitRepo.Init(cli);
        Assert.Equal(0, cli.Run("new-rule", "guard-ring-note").Exit);
        cli.Write("hw/a.tia.yaml", Clean("ch-a"));
        GitRepo.Commit(cli, "a channel and a house rule");
        var rule = cli.Path_("house-rules/guard-ring-note/GuardRingNoteRule.cs");
        File.AppendAllText(rule, "// reviewed\n");

        var (_, output, error) = cli.Run("check", "--against", "HEAD", "--nominal-only", "--format", "json");
        using (var doc = JsonDocument.Parse(output))
        {
            Assert.True(doc.RootElement.GetProperty("against").GetProperty("everySpec").GetBoolean(), error);
            Assert.Equal("changed", Change(doc, "hw/a.tia.yaml").GetProperty("status").GetString());
        }

        var off = cli.Run("check", "--against", "HEAD", "--nominal-only", "--format", "json", "--no-house-rules");
        using var offDoc = JsonDocument.Parse(off.Out);
        Assert.False(offDoc.RootElement.GetProperty("against").GetProperty("everySpec").GetBoolean());
        Assert.Equal(0, offDoc.RootElement.GetProperty("changes").GetArrayLength());
        Assert.Equal(0, off.Exit);
    }

    [Fact]
    public void Terminal_and_markdown_show_the_deltas()
    {
        using var cli = TwoBranches();
        var (_, output, _) = cli.Run("check", "--against", "main", "--nominal-only", "--report", "out/report.md");
        Assert.Contains("Against main (merge base ", output, StringComparison.Ordinal);
        Assert.Matches(@"Phase margin: \d+\.\d° → \d+\.\d° \(−\d+\.\d°\)", output);
        var md = File.ReadAllText(cli.Path_("out/report.md"));
        var section = md.IndexOf("## What this change does", StringComparison.Ordinal);
        Assert.True(section > 0 && section < md.IndexOf("## Summary", StringComparison.Ordinal));
        Assert.Contains("| ch-a | Phase margin |", md, StringComparison.Ordinal);
        Assert.Contains("| deleted |", md, StringComparison.Ordinal);

        // Base and head drawn together for the changed spec; the added and deleted ones have one version only.
        Assert.Contains("](report-plots/ch-a.change-loop-gain.svg)", md, StringComparison.Ordinal);
        Assert.Contains("](report-plots/ch-a.change-noise.svg)", md, StringComparison.Ordinal);
        Assert.DoesNotContain("ch-e.change-loop-gain.svg", md, StringComparison.Ordinal);
        Assert.DoesNotContain("ch-c.change-loop-gain.svg", md, StringComparison.Ordinal);
        var loop = File.ReadAllText(cli.Path_("out/report-plots/ch-a.change-loop-gain.svg"));
        Assert.Contains("|T| base", loop, StringComparison.Ordinal);
        Assert.Contains("|T| magnitude, this change", loop, StringComparison.Ordinal);
        Assert.Contains("total, base", File.ReadAllText(cli.Path_("out/report-plots/ch-a.change-noise.svg")), StringComparison.Ordinal);
    }

    [Fact]
    public void A_base_version_that_is_not_a_valid_spec_is_reported_and_the_head_still_checked()
    {
        using var cli = new CliHarness();
        GitRepo.Init(cli);
        cli.Write("hw/a.tia.yaml", Clean("ch-a").Replace("capacitance: 20 pF", "capacitance: 20", StringComparison.Ordinal));
        GitRepo.Commit(cli, "broken");
        GitRepo.Git(cli.Root, "checkout", "-q", "-b", "fix");
        cli.Write("hw/a.tia.yaml", Clean("ch-a"));
        GitRepo.Commit(cli, "fixed");
        var (exit, output, _) = cli.Run("check", "--against", "main", "--nominal-only");
        Assert.Equal(0, exit);
        Assert.Contains("base version is not a valid spec", output, StringComparison.Ordinal);
        Assert.Contains("has no unit", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Not_a_repository_unknown_ref_and_shallow_clone_are_clear_errors()
    {
        using var plain = new CliHarness();
        plain.Write("hw/a.tia.yaml", Clean("ch-a"));
        var notRepo = plain.Run("check", "--against", "main");
        Assert.Equal(2, notRepo.Exit);
        Assert.Contains("is not inside a git repository", notRepo.Err, StringComparison.Ordinal);

        using var cli = TwoBranches();
        var unknown = cli.Run("check", "--against", "no-such-branch");
        Assert.Equal(2, unknown.Exit);
        Assert.Contains("unknown ref 'no-such-branch'", unknown.Err, StringComparison.Ordinal);

        // A depth-1 clone of the branch, with main fetched at depth 1 too: the merge base is not there.
        using var shallow = new CliHarness();
        GitRepo.Git(shallow.Root, "clone", "-q", "--depth", "1", "--branch", "change", "file://" + cli.Root, "repo");
        GitRepo.Git(Path.Combine(shallow.Root, "repo"), "fetch", "-q", "--depth", "1", "origin", "main:refs/remotes/origin/main");
        var (exit, _, error) = shallow.RunIn("repo", "check", "--against", "origin/main");
        Assert.Equal(2, exit);
        Assert.Contains("shallow", error, StringComparison.Ordinal);
        Assert.Contains("fetch-depth: 0", error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_deleted_spec_named_on_the_command_line_is_exit_two_with_a_message_that_says_so()
    {
        using var cli = TwoBranches();
        var (exit, output, _) = cli.Run("check", "--against", "main", "--nominal-only", "hw/c.tia.yaml");
        Assert.Equal(2, exit);
        Assert.Contains("hw/c.tia.yaml:1:1: error spec-invalid: this spec was deleted since the merge base", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Gate_new_without_against_is_refused()
    {
        using var cli = new CliHarness();
        cli.Write("hw/a.tia.yaml", Clean("ch-a"));
        var (exit, _, error) = cli.Run("check", "--gate", "new");
        Assert.Equal(2, exit);
        Assert.Contains("--gate new needs --against", error, StringComparison.Ordinal);
    }
}
