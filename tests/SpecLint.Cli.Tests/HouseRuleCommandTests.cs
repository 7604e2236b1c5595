namespace SpecLint.Cli.Tests;

/// <summary>new-rule, test-rules, rules and the page verb with house rules, and the example team's rules on their cases.</summary>
public sealed class HouseRuleCommandTests
{
    [Fact]
    public void New_rule_scaffolds_a_rule_whose_cases_pass_test_rules()
    {
        using var cli = new CliHarness();
        Directory.CreateDirectory(cli.Path_(".git"));

        var (exit, output, error) = cli.Run("new-rule", "guard-ring-note");

        Assert.True(exit == 0, error);
        Assert.Contains("house-rules/guard-ring-note/GuardRingNoteRule.cs", output, StringComparison.Ordinal);
        Assert.True(File.Exists(cli.Path_("house-rules/guard-ring-note/guard-ring-note.md")));
        Assert.True(File.Exists(cli.Path_(".speclint.yaml")));

        var tested = cli.Run("test-rules");
        Assert.True(tested.Exit == 0, tested.Out + tested.Err);
        Assert.Contains("2 case(s) passed, 0 failed, for 1 house rule(s).", tested.Out, StringComparison.Ordinal);

        var listed = cli.Run("rules");
        Assert.Contains("guard-ring-note", listed.Out, StringComparison.Ordinal);
        Assert.Contains("[house rule: house-rules/guard-ring-note/GuardRingNoteRule.cs]", listed.Out, StringComparison.Ordinal);
        Assert.DoesNotContain("guard-ring-note", cli.Run("rules", "--no-house-rules").Out, StringComparison.Ordinal);

        var page = cli.Run("why", "guard-ring-note");
        Assert.StartsWith("# guard-ring-note:", page.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void New_rule_never_overwrites_and_refuses_ids_that_are_not_ours_to_take()
    {
        using var cli = new CliHarness();
        Directory.CreateDirectory(cli.Path_(".git"));
        Assert.Equal(0, cli.Run("new-rule", "guard-ring-note").Exit);
        var before = File.ReadAllText(cli.Path_("house-rules/guard-ring-note/GuardRingNoteRule.cs"));

        Assert.Equal(2, cli.Run("new-rule", "guard-ring-note").Exit);
        Assert.Equal(2, cli.Run("new-rule", "phase-margin").Exit);
        Assert.Equal(2, cli.Run("new-rule", "Guard_Ring").Exit);
        Assert.Equal(before, File.ReadAllText(cli.Path_("house-rules/guard-ring-note/GuardRingNoteRule.cs")));
    }

    [Fact]
    public void Test_rules_fails_on_a_missing_and_on_an_unexpected_finding()
    {
        using var cli = new CliHarness();
        Directory.CreateDirectory(cli.Path_(".git"));
        cli.Run("new-rule", "guard-ring-note");
        // The clean case now carries a mark the rule cannot satisfy, and the flagged case loses its mark.
        var clean = cli.Path_("house-rules/guard-ring-note/cases/clean.tia.yaml");
        File.WriteAllText(clean, File.ReadAllText(clean).Replace("  resistance: 10 MΩ", "  resistance: 10 MΩ   # expect: guard-ring-note", StringComparison.Ordinal));
        var flagged = cli.Path_("house-rules/guard-ring-note/cases/flagged.tia.yaml");
        File.WriteAllText(flagged, File.ReadAllText(flagged).Replace("   # expect: guard-ring-note", "", StringComparison.Ordinal));

        var (exit, output, _) = cli.Run("test-rules");

        Assert.Equal(1, exit);
        Assert.Contains("expected a finding of 'guard-ring-note', none was reported", output, StringComparison.Ordinal);
        Assert.Contains("unexpected finding of 'guard-ring-note'", output, StringComparison.Ordinal);
        Assert.Contains("0 case(s) passed, 2 failed", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_runs_house_rules_and_no_house_rules_skips_them()
    {
        using var cli = new CliHarness();
        Directory.CreateDirectory(cli.Path_(".git"));
        cli.Run("new-rule", "rf-limit");
        cli.Write("hw/big-rf.tia.yaml", Specs.Clean.Replace("resistance: 1 MΩ ±1%", "resistance: 220 MΩ ±1%", StringComparison.Ordinal)
            .Replace("current: { min: 80 nA, max: 3 µA }", "current: { min: 80 pA, max: 3 nA }", StringComparison.Ordinal));

        var with = cli.Run("check", "hw", "--nominal-only");
        var without = cli.Run("check", "hw", "--nominal-only", "--no-house-rules");

        Assert.Contains("warning rf-limit: Rf = 220 MΩ is above 100 MΩ", with.Out, StringComparison.Ordinal);
        Assert.DoesNotContain("rf-limit", without.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Sarif_describes_a_house_rule_with_its_page_and_no_link_to_speclints_pages()
    {
        using var cli = new CliHarness();
        Directory.CreateDirectory(cli.Path_(".git"));
        cli.Run("new-rule", "rf-limit");
        cli.Write("hw/big-rf.tia.yaml", Specs.Clean.Replace("resistance: 1 MΩ ±1%", "resistance: 220 MΩ ±1%", StringComparison.Ordinal)
            .Replace("current: { min: 80 nA, max: 3 µA }", "current: { min: 80 pA, max: 3 nA }", StringComparison.Ordinal));

        cli.Run("check", "hw", "--nominal-only", "--sarif", "out/speclint.sarif");

        using var sarif = System.Text.Json.JsonDocument.Parse(File.ReadAllText(cli.Path_("out/speclint.sarif")));
        var run = sarif.RootElement.GetProperty("runs")[0];
        var rule = run.GetProperty("tool").GetProperty("driver").GetProperty("rules").EnumerateArray().Single(r => r.GetProperty("id").GetString() == "rf-limit");
        Assert.False(rule.TryGetProperty("helpUri", out _));
        Assert.StartsWith("# rf-limit:", rule.GetProperty("help").GetProperty("markdown").GetString(), StringComparison.Ordinal);
        Assert.Equal("house-rule", rule.GetProperty("properties").GetProperty("tags")[0].GetString());
        Assert.Contains(run.GetProperty("results").EnumerateArray(), r => r.GetProperty("ruleId").GetString() == "rf-limit");
    }

    [Fact]
    public void The_example_teams_house_rules_pass_their_cases()
    {
        using var cli = new CliHarness();
        var examples = Path.Combine(RepoPaths.Root, "examples");

        var (exit, output, error) = cli.Run("test-rules", "--config", Path.Combine(examples, ".speclint.yaml"));

        Assert.True(exit == 0, output + error);
        Assert.Contains("7 case(s) passed, 0 failed, for 3 house rule(s).", output, StringComparison.Ordinal);
        foreach (var id in new[] { "low-light-margin", "snr-at-minimum", "build-spread" })
        {
            Assert.Contains($"ok    {id}", output, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void The_demo_shows_a_house_rule_finding()
    {
        using var cli = new CliHarness();

        var (_, output, _) = cli.Run("demo", "--out", "d");

        Assert.Contains("warning build-spread:", output, StringComparison.Ordinal);
        Assert.True(File.Exists(cli.Path_("d/house-rules/build-spread/BuildSpreadTooWideRule.cs")));
        Assert.Contains("`build-spread`", File.ReadAllText(cli.Path_("d/report.md")), StringComparison.Ordinal);
    }
}
