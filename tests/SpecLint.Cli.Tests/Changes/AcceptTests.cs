using System.Text.Json;

namespace SpecLint.Cli.Tests.Changes;

/// <summary><c>speclint accept</c> and <c>check --accepted</c>: the round trip, stale entries, and a file that cannot be read.</summary>
public sealed class AcceptTests
{
    private static string Flagged(string name) => Specs.Clean.Replace("name: e2e-clean", $"name: {name}", StringComparison.Ordinal)
        .Replace("capacitance: 3.3 pF ±10%", "capacitance: 0.5 pF ±10%", StringComparison.Ordinal);

    [Fact]
    public void Accepted_findings_do_not_fail_and_entries_that_match_nothing_are_listed()
    {
        using var cli = new CliHarness();
        cli.Write("hw/d.tia.yaml", Flagged("ch-d"));
        Assert.Equal(1, cli.Run("check", "hw", "--nominal-only").Exit);

        var accept = cli.Run("accept", "--reason", "legacy board, rev B fixes it", "speclint-accepted.json", "hw", "--nominal-only");
        Assert.True(accept.Exit == 0, accept.Err);
        using (var file = JsonDocument.Parse(File.ReadAllText(cli.Path_("speclint-accepted.json"))))
        {
            var entries = file.RootElement.GetProperty("accepted").EnumerateArray().ToList();
            Assert.Contains(entries, e => e.GetProperty("rule").GetString() == "phase-margin" && e.GetProperty("spec").GetString() == "ch-d"
                && e.GetProperty("reason").GetString() == "legacy board, rev B fixes it");
            Assert.DoesNotContain(entries, e => e.TryGetProperty("line", out _));
        }

        var accepted = cli.Run("check", "hw", "--nominal-only", "--accepted", "speclint-accepted.json");
        Assert.True(accepted.Exit == 0, accepted.Out);
        Assert.Matches(@"error phase-margin: .* \(accepted\)", accepted.Out);
        Assert.DoesNotContain("accepted-stale", accepted.Out, StringComparison.Ordinal);

        var json = cli.Run("check", "hw", "--nominal-only", "--accepted", "speclint-accepted.json", "--format", "json");
        using (var doc = JsonDocument.Parse(json.Out))
        {
            Assert.Contains(doc.RootElement.GetProperty("specs")[0].GetProperty("findings").EnumerateArray(),
                f => f.GetProperty("rule").GetString() == "phase-margin" && f.GetProperty("accepted").GetBoolean());
            Assert.Equal(0, doc.RootElement.GetProperty("accepted").GetProperty("stale").GetArrayLength());
        }

        // Code scanning gets them as suppressed results, the same from a merge of shard outputs.
        Assert.Equal(0, cli.Run("check", "hw", "--nominal-only", "--accepted", "speclint-accepted.json", "--sarif", "run.sarif", "--format", "json").Exit);
        using (var sarif = JsonDocument.Parse(File.ReadAllText(cli.Path_("run.sarif"))))
        {
            var result = sarif.RootElement.GetProperty("runs")[0].GetProperty("results").EnumerateArray().Single(r => r.GetProperty("ruleId").GetString() == "phase-margin");
            Assert.Equal("accepted in speclint-accepted.json", result.GetProperty("suppressions")[0].GetProperty("justification").GetString());
        }

        cli.Write("whole.json", json.Out);
        Assert.Equal(0, cli.Run("merge", "whole.json", "--sarif", "merged.sarif").Exit);
        Assert.Equal(File.ReadAllText(cli.Path_("run.sarif")), File.ReadAllText(cli.Path_("merged.sarif")));

        // A new finding in another spec still fails.
        cli.Write("hw/e.tia.yaml", Flagged("ch-e"));
        Assert.Equal(1, cli.Run("check", "hw", "--nominal-only", "--accepted", "speclint-accepted.json").Exit);
        File.Delete(cli.Path_("hw/e.tia.yaml"));

        // Fixed: the entries no longer match, and each is named with its line in the file.
        cli.Write("hw/d.tia.yaml", Specs.Clean.Replace("name: e2e-clean", "name: ch-d", StringComparison.Ordinal));
        var fixedRun = cli.Run("check", "hw", "--nominal-only", "--accepted", "speclint-accepted.json");
        Assert.Equal(0, fixedRun.Exit);
        var lines = File.ReadAllLines(cli.Path_("speclint-accepted.json"));
        var entryLine = Array.FindIndex(lines, l => l.Contains("\"rule\": \"phase-margin\"", StringComparison.Ordinal));
        Assert.Contains($"speclint-accepted.json:{entryLine}:1: note accepted-stale: 'phase-margin'", fixedRun.Out, StringComparison.Ordinal);

        // In a workflow the same entry is a notice at that line of the accepted file; it does not fail the run.
        var annotated = cli.Run("check", "hw", "--nominal-only", "--accepted", "speclint-accepted.json", "--format", "github");
        Assert.Equal(0, annotated.Exit);
        Assert.Contains($"::notice file=speclint-accepted.json,line={entryLine},col=1,title=SpecLint accepted-stale::'phase-margin'", annotated.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Accepting_again_keeps_the_entries_already_there()
    {
        using var cli = new CliHarness();
        cli.Write("hw/d.tia.yaml", Flagged("ch-d"));
        Assert.Equal(0, cli.Run("accept", "--reason", "first", "acc.json", "hw", "--nominal-only").Exit);
        var first = File.ReadAllText(cli.Path_("acc.json"));
        cli.Write("hw/e.tia.yaml", Flagged("ch-e"));
        var again = cli.Run("accept", "--reason", "second", "acc.json", "hw", "--nominal-only");
        Assert.Equal(0, again.Exit);
        Assert.Contains("already there", again.Out, StringComparison.Ordinal);
        using var doc = JsonDocument.Parse(File.ReadAllText(cli.Path_("acc.json")));
        var entries = doc.RootElement.GetProperty("accepted").EnumerateArray().ToList();
        Assert.All(entries.Where(e => e.GetProperty("spec").GetString() == "ch-d"), e => Assert.Equal("first", e.GetProperty("reason").GetString()));
        Assert.Contains(entries, e => e.GetProperty("spec").GetString() == "ch-e" && e.GetProperty("reason").GetString() == "second");
        Assert.Contains("\"spec\": \"ch-d\"", first, StringComparison.Ordinal);
    }

    [Fact]
    public void An_accepted_file_that_cannot_be_read_is_exit_two_at_its_line_and_is_left_as_it_is()
    {
        using var cli = new CliHarness();
        cli.Write("hw/d.tia.yaml", Flagged("ch-d"));
        const string Broken = "{\n  \"version\": 1,\n  \"accepted\": [\n    { \"rule\": \"phase-margin\", \"spec\": \"ch-d\" }\n  ]\n}\n";
        cli.Write("acc.json", Broken);
        var check = cli.Run("check", "hw", "--nominal-only", "--accepted", "acc.json");
        Assert.Equal(2, check.Exit);
        Assert.Contains("acc.json:4:5: an accepted entry lacks \"pointer\"", check.Err, StringComparison.Ordinal);

        var accept = cli.Run("accept", "acc.json", "hw", "--nominal-only");
        Assert.Equal(2, accept.Exit);
        Assert.Equal(Broken, File.ReadAllText(cli.Path_("acc.json")));

        cli.Write("bad.json", "{ \"version\": 1, \"accepted\": [ }");
        var syntax = cli.Run("check", "hw", "--nominal-only", "--accepted", "bad.json");
        Assert.Equal(2, syntax.Exit);
        Assert.Matches(@"bad\.json:1:\d+: not valid JSON", syntax.Err);

        var missing = cli.Run("check", "hw", "--nominal-only", "--accepted", "nope.json");
        Assert.Equal(2, missing.Exit);
        Assert.Contains("no such file 'nope.json'", missing.Err, StringComparison.Ordinal);
    }

    [Fact]
    public void Accept_refuses_to_write_over_a_spec()
    {
        using var cli = new CliHarness();
        var spec = cli.Write("hw/d.tia.yaml", Flagged("ch-d"));
        var before = File.ReadAllText(spec);
        Assert.Equal(2, cli.Run("accept", "hw/d.tia.yaml", "hw", "--nominal-only").Exit);
        Assert.Equal(before, File.ReadAllText(spec));
    }
}
