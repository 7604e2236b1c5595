using SpecLint.Rules.Engine;

namespace SpecLint.HouseRules.Tests;

/// <summary>House rules take part in configuration, waivers, tags, listings and pages like built-in rules.</summary>
public sealed class RuleIntegrationTests
{
    [Fact]
    public void A_house_rule_reports_at_the_spec_key_with_its_default_option()
    {
        using var repo = new HouseRuleRepo();
        repo.Write("house-rules/rf-max/RfMaxRule.cs", Sources.RfMaxRule());
        repo.Write("house-rules/rf-max/rf-max.md", "# rf-max: Rf at most 100 kΩ\n");
        var spec = Marked.Parse(Sources.Spec.Replace("  resistance: 1 MΩ ±1%", "  resistance: [|1 MΩ ±1%|]", StringComparison.Ordinal));
        repo.Write("a.tia.yaml", spec.Text);

        var run = repo.Check();

        var finding = Assert.Single(Assert.Single(run.Specs).Findings, f => f.RuleId == "rf-max");
        Assert.Equal((spec.Line, spec.Column), (finding.Line, finding.Column));
        Assert.Equal("Rf is above 100 kΩ", finding.Message);
        Assert.Equal("# rf-max: Rf at most 100 kΩ\n", run.Catalog.Page("rf-max"));
        Assert.EndsWith("house-rules/rf-max/RfMaxRule.cs", run.Catalog.HouseRuleSource("rf-max"), StringComparison.Ordinal);
        Assert.Equal(ExitCodes.FindingsAtFailLevel, run.ExitCode);
    }

    [Fact]
    public void Options_and_severity_of_a_house_rule_are_configured_with_units()
    {
        using var repo = new HouseRuleRepo("house-rules: [house-rules/]\nrules:\n  rf-max: { max: 2.2 MΩ }\n");
        repo.Write("house-rules/rf-max/RfMaxRule.cs", Sources.RfMaxRule());
        repo.Write("a.tia.yaml", Sources.Spec);
        Assert.DoesNotContain(Assert.Single(repo.Check().Specs).Findings, f => f.RuleId == "rf-max");

        repo.Write(".speclint.yaml", "house-rules: [house-rules/]\nrules:\n  rf-max: { max: 470 kΩ, severity: warning }\n");
        var flagged = Assert.Single(Assert.Single(repo.Check().Specs).Findings, f => f.RuleId == "rf-max");
        Assert.Equal(Severity.Warning, flagged.Severity);
        Assert.Equal("Rf is above 470 kΩ", flagged.Message);
    }

    [Fact]
    public void An_option_in_the_wrong_unit_is_a_configuration_error_at_its_value()
    {
        using var repo = new HouseRuleRepo("house-rules: [house-rules/]\nrules:\n  rf-max:\n    max: 2.2 pF\n");
        repo.Write("house-rules/rf-max/RfMaxRule.cs", Sources.RfMaxRule());
        repo.Write("a.tia.yaml", Sources.Spec);

        var problem = Assert.Single(repo.Check().RunProblems);

        Assert.Equal(RuleIds.ConfigInvalid, problem.RuleId);
        Assert.Equal((4, 10), (problem.Line, problem.Column));
    }

    [Fact]
    public void Reading_an_option_as_a_type_of_another_dimension_is_refused()
    {
        using var repo = new HouseRuleRepo();
        var src = Marked.Parse(Sources.Rule("probe", """
                var wrong = [|context.Option<Capacitance>("floor")|];
                yield break;
        """, options: """new RuleOption("floor", Dimension.Angle, "60 deg", "floor")"""));
        repo.Write("house-rules/probe/ProbeRule.cs", src.Text);
        repo.Write("a.tia.yaml", Sources.Spec);

        var failed = Assert.Single(Assert.Single(repo.Check().Specs).Findings, f => f.RuleId == RuleIds.HouseRuleFailed);

        Assert.Equal(src.Line, failed.Line);
        Assert.Contains("declared as Angle, but was read as Capacitance", failed.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("5 kg", "needs a unit")]
    [InlineData("2", "expected text")]
    [InlineData("1 ms", "outside 10 ms .. 10 min")]
    [InlineData("2 h", "needs a unit")]
    [InlineData("forever s", "is not a duration")]
    public void A_house_rule_budget_that_is_not_a_duration_in_range_is_a_configuration_error(string budget, string why)
    {
        using var repo = new HouseRuleRepo($"house-rules: [house-rules/]\nhouse-rule-budget: {budget}\n");
        repo.Write("house-rules/rf-max/RfMaxRule.cs", Sources.RfMaxRule());
        repo.Write("a.tia.yaml", Sources.Spec);

        var problem = Assert.Single(repo.Check().RunProblems);

        Assert.Equal(RuleIds.ConfigInvalid, problem.RuleId);
        Assert.Equal(2, problem.Line);
        Assert.Contains(why, problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_waiver_in_the_spec_covers_a_house_rule_finding()
    {
        using var repo = new HouseRuleRepo();
        repo.Write("house-rules/rf-max/RfMaxRule.cs", Sources.RfMaxRule());
        repo.Write("a.tia.yaml", Sources.Spec + "\nwaivers:\n  - { rule: rf-max, reason: bench-proven with a guard ring, expires: 2027-06-30 }\n");

        var run = repo.Check();

        var finding = Assert.Single(Assert.Single(run.Specs).Findings, f => f.RuleId == "rf-max");
        Assert.True(finding.Waived);
        Assert.Equal(ExitCodes.Clean, run.ExitCode);
    }

    [Fact]
    public void Tags_in_the_configuration_select_the_specs_a_rule_runs_on()
    {
        using var repo = new HouseRuleRepo("house-rules: [house-rules/]\nrules:\n  rf-max: { tags: [medical] }\n");
        repo.Write("house-rules/rf-max/RfMaxRule.cs", Sources.RfMaxRule());
        repo.Write("bench.tia.yaml", Sources.Spec);
        repo.Write("medical.tia.yaml", Sources.Spec.Replace("name: hr-clean", "name: hr-medical", StringComparison.Ordinal)
            .Replace("tags: [bench]", "tags: [medical, optical]", StringComparison.Ordinal));

        var run = repo.Check();

        Assert.Empty(run.RunProblems);
        Assert.DoesNotContain(run.Specs.Single(s => s.Name == "hr-clean").Findings, f => f.RuleId == "rf-max");
        Assert.Contains(run.Specs.Single(s => s.Name == "hr-medical").Findings, f => f.RuleId == "rf-max");
    }

    [Fact]
    public void A_house_rule_cannot_take_a_built_in_rules_id()
    {
        using var repo = new HouseRuleRepo();
        var src = Marked.Parse(Sources.Rule("phase-margin", "yield break;", "StricterMarginRule").Replace("class StricterMarginRule", "class [|StricterMarginRule|]", StringComparison.Ordinal));
        repo.Write("house-rules/phase-margin/StricterMarginRule.cs", src.Text);
        repo.Write("a.tia.yaml", Sources.Spec);

        var run = repo.Check();

        var problem = Assert.Single(run.RunProblems);
        Assert.Equal(RuleIds.HouseRuleInvalid, problem.RuleId);
        Assert.Equal((src.Line, src.Column), (problem.Line, problem.Column));
        Assert.Contains("already uses for a built-in rule", problem.Message, StringComparison.Ordinal);
        Assert.False(run.Catalog.IsHouseRule("phase-margin"));
    }

    [Fact]
    public void Two_house_rules_with_one_id_are_an_error_at_the_second()
    {
        using var repo = new HouseRuleRepo();
        repo.Write("house-rules/guard-ring/AGuardRingRule.cs", Sources.Rule("guard-ring", "yield break;", "AGuardRingRule"));
        repo.Write("house-rules/guard-ring/BGuardRingRule.cs", Sources.Rule("guard-ring", "yield break;", "BGuardRingRule"));
        repo.Write("a.tia.yaml", Sources.Spec);

        var run = repo.Check();

        var problem = Assert.Single(run.RunProblems);
        Assert.EndsWith("BGuardRingRule.cs", problem.File, StringComparison.Ordinal);
        Assert.Contains("already used by", problem.Message, StringComparison.Ordinal);
        Assert.True(run.Catalog.IsHouseRule("guard-ring"));
    }

    [Fact]
    public void A_rule_outside_a_folder_named_after_its_id_is_a_warning()
    {
        using var repo = new HouseRuleRepo();
        repo.Write("house-rules/misc/RfMaxRule.cs", Sources.RfMaxRule());
        repo.Write("a.tia.yaml", Sources.Spec);

        var problem = Assert.Single(repo.Check().RunProblems);

        Assert.Equal(Severity.Warning, problem.Severity);
        Assert.Contains("outside a folder named 'rf-max'", problem.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Helper_files_shared_by_rules_compile_with_them()
    {
        using var repo = new HouseRuleRepo();
        repo.Write("house-rules/Shared/Limits.cs", "namespace Team.Rules;\n\npublic static class Limits\n{\n    public static Resistance GuardRingAbove => new(1e9);\n}\n");
        repo.Write("house-rules/guard-ring/GuardRingRule.cs", Sources.Rule("guard-ring", """
                if (context.Spec.Feedback.Resistance.Typ > Limits.GuardRingAbove) yield return context.Report("/feedback/resistance", "guard ring");
        """, "GuardRingRule"));
        repo.Write("a.tia.yaml", Sources.Spec);

        var run = repo.Check();

        Assert.Empty(run.RunProblems);
        Assert.True(run.Catalog.IsHouseRule("guard-ring"));
    }

    [Fact]
    public void Case_specs_beside_house_rules_are_not_checked_as_part_of_the_tree()
    {
        using var repo = new HouseRuleRepo();
        repo.Write("house-rules/rf-max/RfMaxRule.cs", Sources.RfMaxRule());
        repo.Write("house-rules/rf-max/cases/flagged.tia.yaml", Sources.Spec.Replace("name: hr-clean", "name: hr-case", StringComparison.Ordinal));
        repo.Write("a.tia.yaml", Sources.Spec);

        var run = repo.Check();

        Assert.Equal(["hr-clean"], run.Specs.Select(s => s.Name));
    }

    [Fact]
    public void Without_a_house_rule_source_nothing_is_compiled()
    {
        using var repo = new HouseRuleRepo();
        repo.Write("house-rules/rf-max/RfMaxRule.cs", Sources.RfMaxRule());
        repo.Write("a.tia.yaml", Sources.Spec);

        var run = Rules.Checking.CheckRunner.Run(new Rules.Checking.CheckOptions { Paths = [repo.Root], Tolerances = false });

        Assert.False(run.Catalog.IsHouseRule("rf-max"));
        Assert.Empty(run.RunProblems);
    }
}
