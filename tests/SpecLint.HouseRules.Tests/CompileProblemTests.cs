using SpecLint.Rules.Engine;

namespace SpecLint.HouseRules.Tests;

public sealed class CompileProblemTests
{
    [Fact]
    public void A_compile_error_is_a_finding_at_its_line_and_column_in_the_cs_file()
    {
        using var repo = new HouseRuleRepo();
        var src = Marked.Parse(Sources.Rule("probe", """
                var x = [|undefinedName|] + 1;
                yield break;
        """));
        repo.Write("house-rules/probe/ProbeRule.cs", src.Text);
        repo.Write("a.tia.yaml", Sources.Spec);

        var run = repo.Check();

        var problem = Assert.Single(run.RunProblems, f => f.RuleId == RuleIds.HouseRuleInvalid);
        Assert.EndsWith("house-rules/probe/ProbeRule.cs", problem.File, StringComparison.Ordinal);
        Assert.Equal((src.Line, src.Column), (problem.Line, problem.Column));
        Assert.Contains("CS0103", problem.Message, StringComparison.Ordinal);
        Assert.Equal(Severity.Error, problem.Severity);
        Assert.Equal(ExitCodes.UnusableInput, run.ExitCode);
        // The built-in rules still ran on the spec.
        Assert.NotNull(Assert.Single(run.Specs).Analysis);
    }

    [Fact]
    public void A_compiler_warning_is_a_warning_finding_and_the_rule_still_runs()
    {
        using var repo = new HouseRuleRepo();
        var src = Marked.Parse(Sources.Rule("probe", """
                string? maybe = context.Spec.Title;
                int n = [|maybe|].Length;
                if (n < 0) yield return context.Report("/name", "never");
        """));
        repo.Write("house-rules/probe/ProbeRule.cs", src.Text);
        repo.Write("a.tia.yaml", Sources.Spec);

        var run = repo.Check();

        var warning = Assert.Single(run.RunProblems);
        Assert.Equal(Severity.Warning, warning.Severity);
        Assert.Equal(RuleIds.HouseRuleInvalid, warning.RuleId);
        Assert.Equal((src.Line, src.Column), (warning.Line, warning.Column));
        Assert.Contains("CS8602", warning.Message, StringComparison.Ordinal);
        Assert.True(run.Catalog.IsHouseRule("probe"));
    }

    [Fact]
    public void A_file_that_is_not_csharp_is_reported_at_its_first_line()
    {
        using var repo = new HouseRuleRepo();
        repo.Write("house-rules/probe/ProbeRule.cs", "rules:\n  - this is YAML, not C#\n");
        repo.Write("a.tia.yaml", Sources.Spec);

        var run = repo.Check();

        Assert.Contains(run.RunProblems, f => f.RuleId == RuleIds.HouseRuleInvalid && f.Line == 1 && f.Severity == Severity.Error);
        Assert.Equal(ExitCodes.UnusableInput, run.ExitCode);
        Assert.NotNull(Assert.Single(run.Specs).Analysis);
    }

    [Fact]
    public void A_rule_file_whose_class_does_not_implement_IRule_is_named_at_the_class()
    {
        using var repo = new HouseRuleRepo();
        var src = Marked.Parse("""
            namespace Team.Rules;

            public sealed class [|GuardRingRule|]
            {
                public string Id => "guard-ring";
            }
            """);
        repo.Write("house-rules/guard-ring/GuardRingRule.cs", src.Text);
        repo.Write("a.tia.yaml", Sources.Spec);

        var problem = Assert.Single(repo.Check().RunProblems);

        Assert.Equal((src.Line, src.Column), (problem.Line, problem.Column));
        Assert.Contains("does not implement IRule", problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void An_empty_house_rules_folder_is_a_warning_at_its_configuration_entry()
    {
        using var repo = new HouseRuleRepo("include: [\"*.tia.yaml\"]\nhouse-rules:\n  - house-rules/\n");
        Directory.CreateDirectory(Path.Combine(repo.Root, "house-rules"));
        repo.Write("a.tia.yaml", Sources.Spec);

        var run = repo.Check();

        var problem = Assert.Single(run.RunProblems);
        Assert.Equal(RuleIds.HouseRuleInvalid, problem.RuleId);
        Assert.Equal(Severity.Warning, problem.Severity);
        Assert.Equal(3, problem.Line);
        Assert.EndsWith(".speclint.yaml", problem.File, StringComparison.Ordinal);
        Assert.Equal(ExitCodes.Clean, run.ExitCode);
    }

    [Fact]
    public void A_missing_house_rules_folder_is_a_configuration_error()
    {
        using var repo = new HouseRuleRepo("house-rules: [team-rules/]\n");
        repo.Write("a.tia.yaml", Sources.Spec);

        var problem = Assert.Single(repo.Check().RunProblems);

        Assert.Equal(RuleIds.ConfigInvalid, problem.RuleId);
        Assert.Equal(1, problem.Line);
        Assert.Contains("team-rules/", problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_folder_that_leaves_the_repository_is_refused()
    {
        using var repo = new HouseRuleRepo("house-rules: [../elsewhere/]\n");
        repo.Write("a.tia.yaml", Sources.Spec);

        var problem = Assert.Single(repo.Check().RunProblems);

        Assert.Equal(RuleIds.ConfigInvalid, problem.RuleId);
        Assert.Contains("leaves the folder", problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void The_default_folder_is_used_when_the_key_is_absent()
    {
        using var repo = new HouseRuleRepo("fail-on: error\n");
        repo.Write("house-rules/rf-max/RfMaxRule.cs", Sources.RfMaxRule());
        repo.Write("a.tia.yaml", Sources.Spec);

        var run = repo.Check();

        Assert.Empty(run.RunProblems);
        Assert.Contains(Assert.Single(run.Specs).Findings, f => f.RuleId == "rf-max");
    }
}
