using System.Text.Json;
using SpecLint.Core.Units;

namespace SpecLint.Cli.Tests;

public sealed class CheckCommandTests
{
    [Fact]
    public void Clean_spec_exits_zero_with_a_summary()
    {
        using var cli = new CliHarness();
        cli.Write("hw/ch1.tia.yaml", Specs.Clean);
        var (exit, output, _) = cli.Run("check", "hw");
        Assert.Equal(0, exit);
        Assert.Contains("1 spec checked: 0 errors", output, StringComparison.Ordinal);
        Assert.Contains("verify on the bench", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Unstable_spec_exits_one_with_a_located_finding()
    {
        using var cli = new CliHarness();
        var file = cli.Write("hw/ch2.tia.yaml", Specs.NoCf);
        var (exit, output, _) = cli.Run("check", "hw/ch2.tia.yaml");
        Assert.Equal(1, exit);
        // The finding points at the feedback block (Cf is missing): the line of "feedback:".
        var feedbackLine = Array.FindIndex(File.ReadAllLines(file), l => l.StartsWith("feedback:", StringComparison.Ordinal)) + 1;
        Assert.Contains($"hw/ch2.tia.yaml:{feedbackLine}:", output, StringComparison.Ordinal);
        Assert.Matches(@"hw/ch2\.tia\.yaml:\d+:\d+: error phase-margin: phase margin is", output);
    }

    [Fact]
    public void Unreadable_spec_exits_two_and_other_files_are_still_checked()
    {
        using var cli = new CliHarness();
        cli.Write("hw/a-broken.tia.yaml", Specs.Clean.Replace("capacitance: 20 pF", "capacitance: 20", StringComparison.Ordinal).Replace("e2e-clean", "e2e-broken", StringComparison.Ordinal));
        cli.Write("hw/b-unstable.tia.yaml", Specs.NoCf);
        var (exit, output, _) = cli.Run("check", "hw");
        Assert.Equal(2, exit);
        Assert.Contains("hw/a-broken.tia.yaml:10:16: error spec-invalid: input.capacitance: \"20\" has no unit", output, StringComparison.Ordinal);
        Assert.Contains("error phase-margin", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Fail_on_warning_turns_a_warning_into_a_failing_run()
    {
        using var cli = new CliHarness();
        cli.Write("x.tia.yaml", Specs.WarningOnly);
        Assert.Equal(0, cli.Run("check", "x.tia.yaml").Exit);
        Assert.Equal(1, cli.Run("check", "x.tia.yaml", "--fail-on", "warning").Exit);
    }

    [Fact]
    public void Fail_level_comes_from_the_repository_configuration()
    {
        using var cli = new CliHarness();
        cli.Write(".speclint.yaml", "fail-on: warning\n");
        cli.Write("hw/x.tia.yaml", Specs.WarningOnly);
        Assert.Equal(1, cli.Run("check").Exit);
    }

    [Fact]
    public void A_rule_turned_off_in_configuration_does_not_report()
    {
        using var cli = new CliHarness();
        cli.Write(".speclint.yaml", "rules:\n  phase-margin: { severity: off }\n  peaking: { severity: off }\n  feedback-capacitor-size: { severity: off }\n");
        cli.Write("hw/x.tia.yaml", Specs.NoCf);
        var (exit, output, _) = cli.Run("check");
        Assert.DoesNotContain("phase-margin", output, StringComparison.Ordinal);
        Assert.Equal(0, exit);
    }

    [Fact]
    public void Configuration_naming_an_unknown_rule_is_unusable_input()
    {
        using var cli = new CliHarness();
        cli.Write(".speclint.yaml", "rules:\n  phase-margn: { floor: 50 deg }\n");
        cli.Write("hw/x.tia.yaml", Specs.Clean);
        var (exit, output, _) = cli.Run("check");
        Assert.Equal(2, exit);
        Assert.Contains(".speclint.yaml:2:3: error config-invalid:", output, StringComparison.Ordinal);
        Assert.Contains("did you mean 'phase-margin'", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Json_output_has_the_contract_fields()
    {
        using var cli = new CliHarness();
        cli.Write("hw/x.tia.yaml", Specs.NoCf);
        var (exit, output, _) = cli.Run("check", "hw", "--format", "json");
        Assert.Equal(1, exit);
        using var doc = JsonDocument.Parse(output);
        var root = doc.RootElement;
        Assert.Equal(1, root.GetProperty("version").GetInt32());
        var spec = root.GetProperty("specs")[0];
        Assert.Equal("hw/x.tia.yaml", spec.GetProperty("file").GetString());
        Assert.Equal("e2e-no-cf", spec.GetProperty("name").GetString());
        var metrics = spec.GetProperty("metrics");
        foreach (var key in new[] { "transimpedanceOhm", "bandwidthHz", "phaseMarginDeg", "crossoverHz", "peakingDb", "noiseGainHighFrequency", "outputNoiseRmsV", "inputNoiseRmsA", "noiseBandHz", "outputMinV", "outputMaxV" })
        {
            Assert.True(metrics.TryGetProperty(key, out _), key);
        }

        Assert.Equal(JsonValueKind.Object, spec.GetProperty("corners").ValueKind);
        Assert.True(spec.GetProperty("corners").GetProperty("phaseMarginDegMin").GetDouble() <= metrics.GetProperty("phaseMarginDeg").GetDouble());
        Assert.InRange(spec.GetProperty("monteCarlo").GetProperty("yield").GetDouble(), 0, 1);
        var pm = spec.GetProperty("findings").EnumerateArray().Single(f => f.GetProperty("rule").GetString() == "phase-margin");
        Assert.Equal("error", pm.GetProperty("severity").GetString());
        Assert.False(pm.GetProperty("waived").GetBoolean());
        Assert.True(pm.GetProperty("line").GetInt32() > 0);
        Assert.True(pm.GetProperty("column").GetInt32() > 0);
        var fix = pm.GetProperty("fix");
        Assert.Equal("/feedback/capacitance", fix.GetProperty("path").GetString());
        // The fix value must follow the quantity grammar (references.md §D5).
        Assert.True(QuantityParser.Parse(fix.GetProperty("value").GetString()!, Dimension.Capacitance).Typ > 0);
    }

    [Fact]
    public void The_json_fix_really_fixes_the_finding()
    {
        using var cli = new CliHarness();
        var file = cli.Write("hw/x.tia.yaml", Specs.NoCf);
        var (_, output, _) = cli.Run("check", "hw", "--format", "json");
        using var doc = JsonDocument.Parse(output);
        var fix = doc.RootElement.GetProperty("specs")[0].GetProperty("findings").EnumerateArray()
            .Single(f => f.GetProperty("rule").GetString() == "phase-margin").GetProperty("fix").GetProperty("value").GetString();
        File.WriteAllText(file, Specs.NoCf.Replace("feedback:\n", $"feedback:\n  capacitance: {fix}\n", StringComparison.Ordinal));
        var (exit, again, _) = cli.Run("check", "hw");
        Assert.DoesNotContain("phase-margin", again, StringComparison.Ordinal);
        Assert.NotEqual(2, exit);
    }

    [Fact]
    public void Report_sarif_and_html_are_written_and_identical_on_a_rerun()
    {
        using var cli = new CliHarness();
        cli.Write("hw/a.tia.yaml", Specs.Clean);
        cli.Write("hw/b.tia.yaml", Specs.NoCf);
        cli.Run("check", "hw", "--report", "out/report.md", "--sarif", "out/run.sarif", "--html", "out/report.html");
        var first = new[] { "out/report.md", "out/run.sarif", "out/report.html" }.Select(p => File.ReadAllBytes(cli.Path_(p))).ToList();
        Assert.True(File.Exists(cli.Path_("out/report-plots/e2e-no-cf.loop-gain.svg")));
        cli.Run("check", "hw", "--report", "out/report.md", "--sarif", "out/run.sarif", "--html", "out/report.html");
        var second = new[] { "out/report.md", "out/run.sarif", "out/report.html" }.Select(p => File.ReadAllBytes(cli.Path_(p))).ToList();
        for (var i = 0; i < first.Count; i++)
        {
            Assert.Equal(first[i], second[i]);
        }

        Assert.Contains("<svg", File.ReadAllText(cli.Path_("out/report.html")), StringComparison.Ordinal);
    }

    [Fact]
    public void A_report_path_that_would_overwrite_a_spec_is_refused()
    {
        using var cli = new CliHarness();
        var spec = cli.Write("hw/a.tia.yaml", Specs.Clean);
        var (exit, _, error) = cli.Run("check", "hw", "--report", "hw/a.tia.yaml");
        Assert.Equal(2, exit);
        Assert.Contains("--report", error, StringComparison.Ordinal);
        Assert.Equal(Specs.Clean, File.ReadAllText(spec));
    }

    [Fact]
    public void Github_format_prints_workflow_annotations()
    {
        using var cli = new CliHarness();
        cli.Write("hw/x.tia.yaml", Specs.NoCf);
        var (exit, output, _) = cli.Run("check", "hw", "--format", "github");
        Assert.Equal(1, exit);
        Assert.Matches(@"::error file=hw/x\.tia\.yaml,line=\d+,col=\d+,title=[^:]*phase-margin[^:]*::phase margin", output);
    }

    [Fact]
    public void Github_format_appends_the_report_to_the_job_summary()
    {
        using var cli = new CliHarness();
        cli.Write("hw/x.tia.yaml", Specs.NoCf);
        var summary = cli.Write("summary.md", "earlier step\n");
        Environment.SetEnvironmentVariable("GITHUB_STEP_SUMMARY", summary);
        try
        {
            cli.Run("check", "hw", "--format", "github");
        }
        finally
        {
            Environment.SetEnvironmentVariable("GITHUB_STEP_SUMMARY", null);
        }

        var text = File.ReadAllText(summary);
        Assert.StartsWith("earlier step\n", text, StringComparison.Ordinal);
        Assert.Contains("| Spec | Result |", text, StringComparison.Ordinal);
        Assert.Contains("phase-margin", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Expired_waiver_is_an_error_as_of_the_given_day()
    {
        using var cli = new CliHarness();
        cli.Write("hw/x.tia.yaml", Specs.WarningOnly + "\nwaivers:\n  - rule: capacitor-tolerance\n    reason: \"X7R accepted for the prototype\"\n    expires: 2027-03-31\n");
        Assert.Equal(0, cli.Run("check", "hw", "--as-of", "2027-03-31").Exit);
        var (exit, output, _) = cli.Run("check", "hw", "--as-of", "2027-04-01");
        Assert.Equal(1, exit);
        Assert.Contains("error waiver-expired", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Missing_path_and_bad_options_are_unusable_input()
    {
        using var cli = new CliHarness();
        Assert.Equal(2, cli.Run("check", "nowhere").Exit);
        Directory.CreateDirectory(cli.Path_("empty"));
        var (exit, output, _) = cli.Run("check", "empty");
        Assert.Equal(2, exit);
        Assert.Contains("error no-specs: no spec files matching **/*.tia.yaml", output, StringComparison.Ordinal);
        Assert.Equal(2, cli.Run("check", "--format", "xml").Exit);
        Assert.Equal(2, cli.Run("check", "--as-of", "31/03/2027").Exit);
    }
}
