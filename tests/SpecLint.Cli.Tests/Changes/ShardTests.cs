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
        var whole = cli.Run("check", "hw", "--nominal-only", "--format", "json", "--sarif", "whole.sarif");
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

        var merged = cli.Run(["merge", .. shardFiles, "--sarif", "merged.sarif"]);
        Assert.Equal(whole.Exit, merged.Exit);
        Assert.Equal(whole.Out, merged.Out);
        Assert.Equal(File.ReadAllText(cli.Path_("whole.sarif")), File.ReadAllText(cli.Path_("merged.sarif")));
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
