using System.Text.Json;
using SpecLint.HouseRules;
using SpecLint.Rules.Changes;
using SpecLint.Rules.Checking;

namespace SpecLint.Cli.Tests.Changes;

/// <summary>
/// <c>check --against</c> judges each base version by the house rules of the base: a rule a change adds flags
/// new findings, a rule it deletes resolves its findings, and rules it leaves alone are built once.
/// </summary>
public sealed class BaseHouseRulesTests
{
    private const string RulePath = "house-rules/guard-ring-note/GuardRingNoteRule.cs";

    private static string Clean(string name) => Specs.Clean.Replace("name: e2e-clean", $"name: {name}", StringComparison.Ordinal);

    /// <summary>A repository with a configuration and one clean channel (Rf = 1 MΩ) on main; no house rules yet.</summary>
    private static CliHarness Repository()
    {
        var cli = new CliHarness();
        GitRepo.Init(cli);
        // Cases of house rules live under house-rules/; the specs under hw/.
        cli.Write(".speclint.yaml", "include: [\"hw/**/*.tia.yaml\"]\n");
        cli.Write("hw/a.tia.yaml", Clean("ch-a"));
        GitRepo.Commit(cli, "a channel");
        return cli;
    }

    /// <summary>
    /// Adds the scaffold rule with its limit lowered to 100 kΩ and its severity raised to error, so it flags the
    /// 1 MΩ feedback resistor of the clean channel (numbers chosen for the test, no engineering meaning).
    /// </summary>
    private static void AddFlaggingRule(CliHarness cli)
    {
        Assert.Equal(0, cli.Run("new-rule", "guard-ring-note").Exit);
        var file = cli.Path_(RulePath);
        File.WriteAllText(file, File.ReadAllText(file)
            .Replace("\"100 MΩ\", \"Largest", "\"100 kΩ\", \"Largest", StringComparison.Ordinal)
            .Replace("Severity.Warning", "Severity.Error", StringComparison.Ordinal));
    }

    private static JsonElement Change(JsonDocument doc, string file) =>
        doc.RootElement.GetProperty("changes").EnumerateArray().Single(c => c.GetProperty("file").GetString() == file);

    private static string[] Rules(JsonElement change, string cls) =>
        [.. change.GetProperty("findings").GetProperty(cls).EnumerateArray().Select(f => f.GetProperty("rule").GetString()!).Order(StringComparer.Ordinal)];

    [Fact]
    public void A_house_rule_the_change_adds_flags_new_findings_and_fails_gate_new()
    {
        using var cli = Repository();
        GitRepo.Git(cli.Root, "checkout", "-q", "-b", "rule");
        AddFlaggingRule(cli);
        GitRepo.Commit(cli, "a house rule");

        var (exit, output, error) = cli.Run("check", "--against", "main", "--nominal-only", "--format", "json", "--gate", "new");

        Assert.True(exit == 1, error + output);
        using var doc = JsonDocument.Parse(output);
        var a = Change(doc, "hw/a.tia.yaml");
        Assert.Contains("guard-ring-note", Rules(a, "new"));
        Assert.DoesNotContain("guard-ring-note", Rules(a, "unchanged"));
        Assert.False(doc.RootElement.TryGetProperty("baseNotes", out _));
        // The rule's cases are not specs of the change.
        Assert.Single(doc.RootElement.GetProperty("changes").EnumerateArray());
    }

    [Fact]
    public void A_house_rule_the_change_deletes_has_its_findings_resolved()
    {
        using var cli = Repository();
        AddFlaggingRule(cli);
        GitRepo.Commit(cli, "a house rule");
        GitRepo.Git(cli.Root, "checkout", "-q", "-b", "drop");
        GitRepo.Git(cli.Root, "rm", "-q", "-r", "house-rules");
        GitRepo.Commit(cli, "no house rules");

        var (exit, output, error) = cli.Run("check", "--against", "main", "--nominal-only", "--format", "json");

        Assert.True(exit == 0, error + output);
        using var doc = JsonDocument.Parse(output);
        var a = Change(doc, "hw/a.tia.yaml");
        Assert.Equal(["guard-ring-note"], Rules(a, "resolved"));
        Assert.Empty(Rules(a, "new"));
        // Its deleted cases were never checked as specs, so they are not listed as deleted specs.
        Assert.Equal(["hw/a.tia.yaml"], doc.RootElement.GetProperty("changes").EnumerateArray().Select(c => c.GetProperty("file").GetString()));
    }

    [Fact]
    public void A_base_only_rule_that_throws_is_reported_at_its_file_in_the_repository_not_the_temporary_folder()
    {
        using var cli = Repository();
        Assert.Equal(0, cli.Run("new-rule", "guard-ring-note").Exit);
        var file = cli.Path_(RulePath);
        File.WriteAllText(file, File.ReadAllText(file).Replace(
            "var rf = context.Spec.Feedback.Resistance.Typ;",
            "var rf = context.Spec.Feedback.Resistance.Typ;\n        if (rf.Ohms > 0) { throw new InvalidOperationException(\"base rule fails\"); }",
            StringComparison.Ordinal));
        GitRepo.Commit(cli, "a house rule that throws");
        GitRepo.Git(cli.Root, "checkout", "-q", "-b", "drop");
        GitRepo.Git(cli.Root, "rm", "-q", "-r", "house-rules");
        GitRepo.Commit(cli, "no house rules");

        var (_, output, error) = cli.Run("check", "--against", "main", "--nominal-only", "--format", "json");

        using var doc = JsonDocument.Parse(output);
        var resolved = Change(doc, "hw/a.tia.yaml").GetProperty("findings").GetProperty("resolved").EnumerateArray()
            .Single(f => f.GetProperty("rule").GetString() == "house-rule-failed");
        Assert.True(resolved.GetProperty("file").GetString() == RulePath, error + output);
    }

    [Fact]
    public void Rules_the_change_leaves_alone_are_built_once_and_a_changed_rule_once_more_for_the_base()
    {
        using var cli = Repository();
        AddFlaggingRule(cli);
        GitRepo.Commit(cli, "a house rule");
        GitRepo.Git(cli.Root, "checkout", "-q", "-b", "edit");
        cli.Write("hw/a.tia.yaml", Clean("ch-a").Replace("gbw: 10 MHz", "gbw: 12 MHz", StringComparison.Ordinal));
        GitRepo.Commit(cli, "another op-amp");

        var untouched = Check(cli, out var compilations);
        Assert.Equal(1, compilations);
        var a = Assert.Single(untouched.Changes!.Specs);
        Assert.Contains(a.Findings.Unchanged, f => f.RuleId == "guard-ring-note");

        // Only the message changes: the base's rule is built from git and reports the same finding, unchanged.
        var file = cli.Path_(RulePath);
        File.WriteAllText(file, File.ReadAllText(file).Replace("say why that matters", "say why it matters", StringComparison.Ordinal));
        GitRepo.Commit(cli, "reword the rule");
        var reworded = Check(cli, out compilations);
        Assert.Equal(2, compilations);
        Assert.True(reworded.Changes!.AllSpecs);
        Assert.Contains(Assert.Single(reworded.Changes.Specs).Findings.Unchanged, f => f.RuleId == "guard-ring-note");
        Assert.Empty(reworded.Changes.BaseNotes);

        // The temporary folder the base's rules were written to is gone.
        Assert.DoesNotContain(Directory.GetDirectories(Path.GetTempPath(), "speclint-base-rules-*"), d => Directory.GetCreationTimeUtc(d) > DateTime.UtcNow.AddMinutes(-5));
    }

    [Fact]
    public void Base_rules_that_do_not_build_give_a_note_naming_the_merge_base_and_do_not_fail_the_run()
    {
        using var cli = Repository();
        AddFlaggingRule(cli);
        File.AppendAllText(cli.Path_(RulePath), "this line is not C#\n");
        GitRepo.Commit(cli, "a broken house rule");
        GitRepo.Git(cli.Root, "checkout", "-q", "-b", "fix");
        AddFlaggingRuleAgain(cli);
        GitRepo.Commit(cli, "fix the rule");
        var mergeBase = GitRepo.Git(cli.Root, "merge-base", "main", "HEAD").Trim()[..12];

        var (exit, output, error) = cli.Run("check", "--against", "main", "--nominal-only", "--gate", "new");

        // The head's rule flags the channel; judged by the head's rules the base has the same finding, so it is not new.
        Assert.True(exit == 0, error + output);
        Assert.Contains($"house-rules/guard-ring-note/GuardRingNoteRule.cs:", output, StringComparison.Ordinal);
        Assert.Contains($"note house-rule-invalid: the house rules at the merge base {mergeBase} could not be built", output, StringComparison.Ordinal);
        Assert.Contains("judged by this change's house rules instead", output, StringComparison.Ordinal);

        var json = cli.Run("check", "--against", "main", "--nominal-only", "--format", "json", "--gate", "new", "--report", "out/report.md");
        using var doc = JsonDocument.Parse(json.Out);
        var note = Assert.Single(doc.RootElement.GetProperty("baseNotes").EnumerateArray());
        Assert.Equal("note", note.GetProperty("severity").GetString());
        Assert.Equal("house-rules/guard-ring-note/GuardRingNoteRule.cs", note.GetProperty("file").GetString());
        Assert.Contains("guard-ring-note", Rules(Change(doc, "hw/a.tia.yaml"), "unchanged"));
        Assert.Contains($"the house rules at the merge base {mergeBase} could not be built", File.ReadAllText(cli.Path_("out/report.md")), StringComparison.Ordinal);

        // Shards of the run merge into the same JSON, notes included.
        var shard = cli.Run("check", "--against", "main", "--nominal-only", "--format", "json", "--gate", "new", "--shard", "1/1");
        cli.Write("shard-1.json", shard.Out);
        var merged = cli.Run("merge", "shard-1.json");
        Assert.Equal(json.Out.TrimEnd(), merged.Out.TrimEnd());
    }

    private static void AddFlaggingRuleAgain(CliHarness cli)
    {
        var file = cli.Path_(RulePath);
        File.WriteAllText(file, File.ReadAllText(file).Replace("this line is not C#\n", "", StringComparison.Ordinal));
    }

    /// <summary>Runs the comparison with main through the engine, with a cache of its own so every build is counted.</summary>
    private static CheckRun Check(CliHarness cli, out int compilations)
    {
        var cache = Directory.CreateTempSubdirectory("speclint-cache-").FullName;
        try
        {
            var source = new RoslynHouseRuleSource(cache);
            var run = cli.InRoot(() =>
            {
                var changes = GitChanges.Read(".", "main", out var why);
                Assert.True(changes is not null, why);
                return ChangeCheck.Run(new CheckOptions { HouseRules = source, Tolerances = false }, changes, Gate.All);
            });
            compilations = source.Compilations;
            return run;
        }
        finally
        {
            Directory.Delete(cache, recursive: true);
        }
    }
}
