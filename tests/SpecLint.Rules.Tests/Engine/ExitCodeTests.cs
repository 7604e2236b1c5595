using System.Collections.Immutable;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests.Engine;

public sealed class ExitCodeTests
{
    private static Finding F(Severity severity, bool waived = false, string rule = "peaking") =>
        new(rule, severity, "a.tia.yaml", "/feedback", 1, 1, "m", Waived: waived);

    private static CheckRun Run(Severity failOn, params Finding[] findings)
    {
        var spec = Lint.Load($"{Parts.Header}\nconditions: {{ temperature: 25 °C, supply: {{ positive: 5 V, negative: -5 V }} }}\nbias: 0 V\ninput: {{ type: photodiode, capacitance: 10 pF, current: {{ min: 1 nA, max: 1 µA }} }}\n{Parts.IdealAmp}\nfeedback:\n  resistance: 1 MΩ\n");
        return new CheckRun([new SpecOutcome("a.tia.yaml", spec, null, null, null, [.. findings])], [], failOn, []);
    }

    [Fact]
    public void Is_0_with_no_findings() => Assert.Equal(0, Run(Severity.Error).ExitCode);

    [Fact]
    public void Is_0_with_only_warnings_by_default() => Assert.Equal(0, Run(Severity.Error, F(Severity.Warning), F(Severity.Note)).ExitCode);

    [Fact]
    public void Is_1_with_an_error() => Assert.Equal(1, Run(Severity.Error, F(Severity.Warning), F(Severity.Error)).ExitCode);

    [Fact]
    public void Is_1_with_a_warning_when_failing_on_warnings() => Assert.Equal(1, Run(Severity.Warning, F(Severity.Warning)).ExitCode);

    [Fact]
    public void Is_0_with_a_note_when_failing_on_warnings() => Assert.Equal(0, Run(Severity.Warning, F(Severity.Note)).ExitCode);

    [Fact]
    public void Is_0_when_the_only_error_is_waived() => Assert.Equal(0, Run(Severity.Error, F(Severity.Error, waived: true)).ExitCode);

    [Fact]
    public void Is_2_when_a_spec_is_unusable()
    {
        var run = new CheckRun(
            [new SpecOutcome("bad.tia.yaml", null, null, null, null, [F(Severity.Error, rule: RuleIds.SpecInvalid)])],
            [], Severity.Error, []);

        Assert.Equal(2, run.ExitCode);
    }

    [Fact]
    public void Is_2_when_the_run_has_a_problem_outside_any_spec()
    {
        var run = new CheckRun([], [F(Severity.Error, rule: RuleIds.ConfigInvalid)], Severity.Error, ImmutableArray<string>.Empty);

        Assert.Equal(2, run.ExitCode);
    }

    [Fact]
    public void Takes_fail_on_from_the_repository_configuration_and_reports_a_bad_configuration()
    {
        using var repo = new TempRepo();
        // 59.9 V < 60 V, no caution; 10 nA·1 MΩ = 10 mV < 2kT/q: a thermal-vs-shot-noise warning only.
        repo.Write("hw/ch1.tia.yaml", $"{Parts.Header}\nconditions: {{ temperature: 25 °C, supply: {{ positive: 5 V, negative: -5 V }} }}\nbias: 0 V\ninput: {{ type: photodiode, capacitance: 10 pF, current: {{ min: 10 nA, max: 1 µA }} }}\n{Parts.IdealAmp}\nfeedback:\n  resistance: 1 MΩ\n  capacitance: 2.2 pF\n");

        var byDefault = CheckRunner.Run(new CheckOptions { Paths = [repo.Root], Today = Lint.Today });
        Assert.Contains(byDefault.AllFindings, f => f.Severity == Severity.Warning);
        Assert.DoesNotContain(byDefault.AllFindings, f => f.Severity == Severity.Error);
        Assert.Equal(0, byDefault.ExitCode);

        repo.Write(".speclint.yaml", "fail-on: warning\n");
        Assert.Equal(1, CheckRunner.Run(new CheckOptions { Paths = [repo.Root], Today = Lint.Today }).ExitCode);
        Assert.Equal(0, CheckRunner.Run(new CheckOptions { Paths = [repo.Root], Today = Lint.Today, FailOn = Severity.Error }).ExitCode);

        repo.Write(".speclint.yaml", "rules:\n  phase-margn: { floor: 50 deg }\n");
        var bad = CheckRunner.Run(new CheckOptions { Paths = [repo.Root], Today = Lint.Today });
        Assert.Contains(bad.RunProblems, f => f.RuleId == RuleIds.ConfigInvalid);
        Assert.Single(bad.Specs);
        Assert.Equal(2, bad.ExitCode);
    }

    [Fact]
    public void Is_2_for_a_path_that_does_not_exist_while_other_files_are_still_checked()
    {
        using var repo = new TempRepo();
        var good = repo.Write("ch1.tia.yaml", $"{Parts.Header}\nconditions: {{ temperature: 25 °C, supply: {{ positive: 5 V, negative: -5 V }} }}\nbias: 0 V\ninput: {{ type: photodiode, capacitance: 10 pF, current: {{ min: 1 µA, max: 1 µA }} }}\n{Parts.IdealAmp}\nfeedback:\n  resistance: 1 MΩ\n  capacitance: 2.2 pF\n");

        var run = CheckRunner.Run(new CheckOptions { Paths = [good, Path.Combine(repo.Root, "missing.tia.yaml")], Today = Lint.Today });

        Assert.Single(run.Specs);
        Assert.Equal(2, run.ExitCode);
    }
}
