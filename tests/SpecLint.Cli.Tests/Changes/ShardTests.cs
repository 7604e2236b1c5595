using System.Text.Json;
using SpecLint.Rules.Checking;

namespace SpecLint.Cli.Tests.Changes;

/// <summary><c>check --shard i/n</c> and <c>speclint merge</c>: every spec in exactly one shard, and the merge equals the unsharded run.</summary>
public sealed class ShardTests
{
    private static CliHarness Repository()
    {
        var cli = new CliHarness();
        for (var i = 0; i < 9; i++)
        {
            var text = Specs.Clean.Replace("name: e2e-clean", $"name: ch-{i}", StringComparison.Ordinal);
            if (i % 3 == 0)
            {
                text = text.Replace("capacitance: 3.3 pF ±10%", "capacitance: 0.5 pF ±10%", StringComparison.Ordinal);
            }

            cli.Write($"hw/rack{i % 2}/ch{i}.tia.yaml", text);
        }

        cli.Write("hw/broken.tia.yaml", "spec: 1\nkind: transimpedance\nname: broken\n");
        return cli;
    }

    private static string[] Files(string json)
    {
        using var doc = JsonDocument.Parse(json);
        return [.. doc.RootElement.GetProperty("specs").EnumerateArray().Select(s => s.GetProperty("file").GetString()!)];
    }

    [Fact]
    public void Every_spec_is_in_exactly_one_shard_and_the_merge_equals_the_unsharded_run()
    {
        using var cli = Repository();
        var whole = cli.Run("check", "hw", "--nominal-only", "--format", "json", "--sarif", "whole/r.sarif", "--report", "whole/r.md", "--html", "whole/r.html");
        Assert.Equal(2, whole.Exit);
        const int Count = 3;
        var shardFiles = new List<string>();
        for (var i = 1; i <= Count; i++)
        {
            var shard = cli.Run("check", "hw", "--nominal-only", "--format", "json", "--shard", $"{i}/{Count}");
            cli.Write($"shard{i}.json", shard.Out);
            shardFiles.Add($"shard{i}.json");
        }

        var all = shardFiles.SelectMany(f => Files(File.ReadAllText(cli.Path_(f)))).ToList();
        Assert.Equal(Files(whole.Out).Order(StringComparer.Ordinal), all.Order(StringComparer.Ordinal));
        Assert.Equal(all.Count, all.Distinct(StringComparer.Ordinal).Count());
        // More than one shard holds specs (the hash spreads them), so the merge below merges something.
        Assert.True(shardFiles.Count(f => Files(File.ReadAllText(cli.Path_(f))).Length > 0) > 1);

        var merged = cli.Run(["merge", .. shardFiles, "--sarif", "merged/r.sarif", "--report", "merged/r.md", "--html", "merged/r.html"]);
        Assert.Equal(whole.Exit, merged.Exit);
        Assert.Equal(whole.Out, merged.Out);
        SameFiles(cli, "whole", "merged", ["r.sarif", "r.md", "r.html"]);
    }

    [Fact]
    public void A_sharded_comparison_with_house_rules_merges_into_the_unsharded_json_reports_and_sarif()
    {
        using var cli = Repository();
        GitRepo.Init(cli);
        Assert.Equal(0, cli.Run("new-rule", "guard-ring-note").Exit);
        GitRepo.Commit(cli, "channels and a house rule");
        GitRepo.Git(cli.Root, "checkout", "-q", "-b", "change");
        // Two channels change: one gains a 1 GΩ feedback resistor (the house rule's finding), one loses its small Cf.
        var ch1 = cli.Path_("hw/rack1/ch1.tia.yaml");
        File.WriteAllText(ch1, File.ReadAllText(ch1).Replace("resistance: 1 MΩ", "resistance: 1 GΩ", StringComparison.Ordinal));
        var ch3 = cli.Path_("hw/rack1/ch3.tia.yaml");
        File.WriteAllText(ch3, File.ReadAllText(ch3).Replace("capacitance: 0.5 pF ±10%", "capacitance: 3.3 pF ±10%", StringComparison.Ordinal));
        // A configuration change re-checks every spec, so every shard has changes to merge.
        cli.Write(".speclint.yaml", File.ReadAllText(cli.Path_(".speclint.yaml")) + "fail-on: error\n");
        GitRepo.Commit(cli, "edit two channels");

        string[] common = ["check", "hw", "--against", "main", "--nominal-only", "--format", "json"];
        var whole = cli.Run([.. common, "--sarif", "whole/r.sarif", "--report", "whole/r.md", "--html", "whole/r.html"]);
        Assert.True(whole.Out.Contains("\"guard-ring-note\"", StringComparison.Ordinal), whole.Err + whole.Out);
        var shardFiles = new List<string>();
        for (var i = 1; i <= 3; i++)
        {
            var shard = cli.Run([.. common, "--shard", $"{i}/3"]);
            Assert.Contains("\"report\"", shard.Out, StringComparison.Ordinal);
            cli.Write($"shard{i}.json", shard.Out);
            shardFiles.Add($"shard{i}.json");
        }

        var merged = cli.Run(["merge", .. shardFiles, "--sarif", "merged/r.sarif", "--report", "merged/r.md", "--html", "merged/r.html"]);
        Assert.True(whole.Exit == merged.Exit, merged.Err);
        Assert.Equal(whole.Out, merged.Out);
        SameFiles(cli, "whole", "merged", ["r.sarif", "r.md", "r.html"]);
        Assert.Contains("## What this change does", File.ReadAllText(cli.Path_("merged/r.md")), StringComparison.Ordinal);
        Assert.Contains("House rules of this repository ran beside the built-in rules: `guard-ring-note`", File.ReadAllText(cli.Path_("merged/r.md")), StringComparison.Ordinal);

        // The house rule is described from its own page and tagged, as in the unsharded SARIF (compared above).
        using var sarif = JsonDocument.Parse(File.ReadAllText(cli.Path_("merged/r.sarif")));
        var rule = sarif.RootElement.GetProperty("runs")[0].GetProperty("tool").GetProperty("driver").GetProperty("rules").EnumerateArray()
            .Single(r => r.GetProperty("id").GetString() == "guard-ring-note");
        Assert.Equal(["house-rule"], rule.GetProperty("properties").GetProperty("tags").EnumerateArray().Select(t => t.GetString()));
        var page = File.ReadAllText(cli.Path_("house-rules/guard-ring-note/guard-ring-note.md")).Replace("\r\n", "\n", StringComparison.Ordinal).Trim();
        Assert.Equal(page, rule.GetProperty("help").GetProperty("markdown").GetString());
        Assert.False(rule.TryGetProperty("helpUri", out _));
    }

    [Fact]
    public void Merge_needs_the_shards_report_data_only_for_reports_and_never_passes_it_on()
    {
        using var cli = Repository();
        var shard = cli.Run("check", "hw", "--nominal-only", "--format", "json", "--shard", "1/2").Out;
        cli.Write("one.json", shard);
        var plain = cli.Run("merge", "one.json");
        Assert.DoesNotContain("\"report\"", plain.Out, StringComparison.Ordinal);

        // A plain check's JSON has no report data: merging it is fine, a report from it is refused with a reason.
        cli.Write("plain.json", cli.Run("check", "hw/rack0", "--nominal-only", "--format", "json").Out);
        Assert.NotEqual(2, cli.Run("merge", "plain.json").Exit);
        var (exit, _, error) = cli.Run("merge", "plain.json", "--report", "out/r.md");
        Assert.Equal(2, exit);
        Assert.Contains("plain.json: has no report data", error, StringComparison.Ordinal);
        Assert.False(File.Exists(cli.Path_("out/r.md")));

        // Damaged report data names the shard and the member, and writes nothing.
        cli.Write("damaged.json", shard.Replace("\"phaseMargin\":", "\"phaseMarginX\":", StringComparison.Ordinal));
        var damaged = cli.Run("merge", "damaged.json", "--html", "out/r.html");
        Assert.Equal(2, damaged.Exit);
        Assert.Contains("damaged.json: the report data is damaged ('phaseMargin'", damaged.Err, StringComparison.Ordinal);
        Assert.False(File.Exists(cli.Path_("out/r.html")));

        // An output that cannot be written is a message and exit 2, not a crash.
        cli.Write("taken", "a file where a folder should be");
        var blocked = cli.Run("merge", "one.json", "--report", "taken/r.md");
        Assert.Equal(2, blocked.Exit);
        Assert.Contains("speclint: --report:", blocked.Err, StringComparison.Ordinal);
    }

    /// <summary>Every file under <paramref name="left"/> (plots included) is byte for byte the one under <paramref name="right"/>, and no file is extra.</summary>
    private static void SameFiles(CliHarness cli, string left, string right, string[] expected)
    {
        static string[] List(string folder) =>
            [.. Directory.GetFiles(folder, "*", SearchOption.AllDirectories).Select(f => Path.GetRelativePath(folder, f).Replace('\\', '/')).Order(StringComparer.Ordinal)];
        var files = List(cli.Path_(left));
        Assert.Equal(files, List(cli.Path_(right)));
        Assert.All(expected, e => Assert.Contains(e, files));
        Assert.Contains(files, f => f.EndsWith(".svg", StringComparison.Ordinal));
        foreach (var f in files)
        {
            Assert.True(File.ReadAllBytes(Path.Combine(cli.Path_(left), f)).AsSpan().SequenceEqual(File.ReadAllBytes(Path.Combine(cli.Path_(right), f))), $"{f} differs");
        }
    }

    [Fact]
    public void A_path_lands_in_the_same_shard_every_time()
    {
        // The first 8 bytes of SHA-256("hw/a.tia.yaml"), big-endian, are 2125198310564784331 (computed outside
        // SpecLint with Python's hashlib): mod 7 is 2, mod 4 is 3. It must not depend on the process or the OS.
        Assert.Equal(3, Shard.Of("hw/a.tia.yaml", 7));
        Assert.Equal(4, Shard.Of("hw/a.tia.yaml", 4));
        Assert.Equal(3, Shard.Of("hw\\a.tia.yaml", 7));
        var spread = Enumerable.Range(0, 200).Select(i => Shard.Of($"hw/ch{i}.tia.yaml", 4)).ToList();
        Assert.All(spread, s => Assert.InRange(s, 1, 4));
        Assert.Equal(4, spread.Distinct().Count());
        // Paths that differ in one digit still split between two shards.
        var two = Enumerable.Range(0, 40).Select(i => Shard.Of($"hw/ch{i}.tia.yaml", 2)).ToList();
        Assert.InRange(two.Count(s => s == 1), 10, 30);
    }

    [Fact]
    public void Bad_shard_and_overlapping_or_foreign_inputs_are_exit_two()
    {
        using var cli = Repository();
        foreach (var bad in new[] { "0/3", "4/3", "x", "1/0", "2" })
        {
            var (exit, _, error) = cli.Run("check", "hw", "--nominal-only", "--shard", bad);
            Assert.Equal(2, exit);
            Assert.Contains("write i/n", error, StringComparison.Ordinal);
        }

        var one = cli.Run("check", "hw", "--nominal-only", "--format", "json", "--shard", "1/2").Out;
        cli.Write("one.json", one);
        cli.Write("again.json", one);
        var twice = cli.Run("merge", "one.json", "again.json");
        Assert.Equal(2, twice.Exit);
        Assert.Contains("is also in one.json", twice.Err, StringComparison.Ordinal);

        cli.Write("junk.json", "{\n  \"version\": 1,\n  \"specs\": [,\n}");
        var junk = cli.Run("merge", "one.json", "junk.json");
        Assert.Equal(2, junk.Exit);
        Assert.Matches(@"junk\.json:3:\d+: not valid JSON", junk.Err);
    }
}
