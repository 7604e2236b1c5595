using System.Diagnostics;
using SpecLint.Rules.Engine;

namespace SpecLint.HouseRules.Tests;

/// <summary>A runaway or throwing rule is stopped and reported; the other rules and specs still run.</summary>
public sealed class GuardTests
{
    private const string FastBudget = "house-rules: [house-rules/]\nhouse-rule-budget: 300 ms\n";

    [Theory]
    [InlineData("while (true) { }")]
    [InlineData("for (var i = 0; ; i++) { }")]
    [InlineData("while (true) { try { while (true) { } } catch (Exception) { } }")]
    [InlineData("again: goto again;")]
    [InlineData("do { } while (true);")]
    public void A_runaway_rule_is_stopped_within_its_budget_and_reported(string statement)
    {
        using var repo = new HouseRuleRepo(FastBudget);
        repo.Write("house-rules/runaway/RunawayRule.cs", Sources.Rule("runaway", statement + "\n        yield break;", "RunawayRule"));
        repo.Write("house-rules/rf-max/RfMaxRule.cs", Sources.RfMaxRule());
        repo.Write("a.tia.yaml", Sources.Spec);
        repo.Write("b.tia.yaml", Sources.Spec.Replace("name: hr-clean", "name: hr-second", StringComparison.Ordinal));

        var clock = Stopwatch.StartNew();
        var run = repo.Check();
        clock.Stop();

        Assert.DoesNotContain(run.RunProblems, f => f.Severity == Severity.Error);
        foreach (var spec in run.Specs)
        {
            var budget = Assert.Single(spec.Findings, f => f.RuleId == RuleIds.HouseRuleBudget);
            Assert.EndsWith("house-rules/runaway/RunawayRule.cs", budget.File, StringComparison.Ordinal);
            Assert.Contains("300 ms", budget.Message, StringComparison.Ordinal);
            Assert.Contains(spec.Findings, f => f.RuleId == "rf-max");
        }

        Assert.Equal(ExitCodes.UnusableInput, run.ExitCode);
        // Two specs, each stopped after 300 ms: well under what an unguarded loop would take (forever).
        Assert.True(clock.Elapsed < TimeSpan.FromSeconds(20), $"took {clock.Elapsed}");
    }

    [Theory]
    [InlineData("Deep(1);", "private static int Deep(int n) => Deep(n + 1) + 1;")]
    [InlineData("Func<int, int>? f = null; f = n => f!(n) + 1; f(0);", "")]
    public void Runaway_recursion_ends_as_a_finding_not_a_crashed_process(string statement, string members)
    {
        using var repo = new HouseRuleRepo(FastBudget);
        repo.Write("house-rules/deep/DeepRule.cs", Sources.Rule("deep", statement + "\n        yield break;", "DeepRule", members: members));
        repo.Write("a.tia.yaml", Sources.Spec);

        var finding = Assert.Single(Assert.Single(repo.Check().Specs).Findings, f => f.RuleId is RuleIds.HouseRuleFailed or RuleIds.HouseRuleBudget);

        Assert.EndsWith("house-rules/deep/DeepRule.cs", finding.File, StringComparison.Ordinal);
    }

    [Fact]
    public void A_throwing_rule_is_reported_at_the_line_of_the_throw()
    {
        using var repo = new HouseRuleRepo();
        var src = Marked.Parse(Sources.Rule("thrower", """
                if (context.Spec.Name.Length > 0)
                {
                    [|throw|] new InvalidOperationException("no guard-ring note for " + context.Spec.Name);
                }
                yield break;
        """, "ThrowerRule"));
        repo.Write("house-rules/thrower/ThrowerRule.cs", src.Text);
        repo.Write("house-rules/rf-max/RfMaxRule.cs", Sources.RfMaxRule());
        repo.Write("a.tia.yaml", Sources.Spec);

        var run = repo.Check();

        var spec = Assert.Single(run.Specs);
        var failed = Assert.Single(spec.Findings, f => f.RuleId == RuleIds.HouseRuleFailed);
        Assert.EndsWith("house-rules/thrower/ThrowerRule.cs", failed.File, StringComparison.Ordinal);
        Assert.Equal(src.Line, failed.Line);
        Assert.Contains("InvalidOperationException: no guard-ring note for hr-clean", failed.Message, StringComparison.Ordinal);
        Assert.Contains(spec.Findings, f => f.RuleId == "rf-max");
        Assert.Equal(ExitCodes.UnusableInput, run.ExitCode);
    }

    [Fact]
    public void A_rule_whose_constructor_throws_is_reported_and_the_others_load()
    {
        using var repo = new HouseRuleRepo();
        repo.Write("house-rules/ctor/CtorRule.cs", Sources.Rule("ctor", "yield break;", "CtorRule",
            members: "public CtorRule() { throw new NotSupportedException(\"broken\"); }"));
        repo.Write("house-rules/rf-max/RfMaxRule.cs", Sources.RfMaxRule());
        repo.Write("a.tia.yaml", Sources.Spec);

        var run = repo.Check();

        Assert.Contains(run.RunProblems, f => f.RuleId == RuleIds.HouseRuleFailed && f.Message.Contains("NotSupportedException: broken", StringComparison.Ordinal));
        Assert.Contains(Assert.Single(run.Specs).Findings, f => f.RuleId == "rf-max");
    }

    [Fact]
    public void A_finding_under_another_rules_id_is_restamped_with_the_house_rules_own()
    {
        using var repo = new HouseRuleRepo();
        repo.Write("house-rules/poser/PoserRule.cs", Sources.Rule("poser",
            "yield return new Finding(\"phase-margin\", Severity.Error, context.Spec.File, \"\", 1, 1, \"forged\");", "PoserRule"));
        repo.Write("a.tia.yaml", Sources.Spec);

        var spec = Assert.Single(repo.Check().Specs);

        Assert.DoesNotContain(spec.Findings, f => f.RuleId == "phase-margin" && f.Message == "forged");
        Assert.Contains(spec.Findings, f => f.RuleId == "poser" && f.Message == "forged");
    }
}
