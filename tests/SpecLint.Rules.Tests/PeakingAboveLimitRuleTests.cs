using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests;

public sealed class PeakingAboveLimitRuleTests
{
    private const string Id = "peaking";

    // references.md §3.2 worked example: Cin = 100 pF, Rf = 1 MΩ, GBW = 10 MHz, A0 = 1e9.
    private static string WorkedExample(string cf, string requirements = "") => $$"""
        {{Parts.Header}}
        conditions: { temperature: 25 °C, supply: { positive: 15 V, negative: -15 V } }
        bias: 0 V
        input: { type: photodiode, capacitance: 100 pF, current: { min: 1 µA, max: 10 µA } }
        {{Parts.IdealAmp}}
        feedback:
          resistance: 1 MΩ
          capacitance: {{cf}}
        {{requirements}}
        """;

    [Fact]
    public void Accepts_the_Butterworth_compensation()
    {
        // references.md §3.2: Cf = 1.7841 pF gives 0 dB of peaking.
        Lint.Check(WorkedExample("1.7841 pF")).Clean(Id);
    }

    [Fact]
    public void Flags_the_peaking_of_the_45_degree_capacitor_above_the_default_1_dB()
    {
        // references.md §3.2: Cf45 = 1.2616 pF peaks 1.213 dB on the exact model.
        var f = Lint.Check(WorkedExample("[|1.2616 pF|]")).SingleAtMark(Id, Severity.Warning);

        Assert.Equal("/feedback/capacitance", f.Pointer);
        Assert.Contains("1.2 dB", f.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Names_the_rule_that_rejects_the_capacitor_that_would_remove_the_peak()
    {
        // references.md §3.2 worked example. On the exact model 1.2616 pF gives 159 kHz and 1.21 dB; 1.5 pF, the
        // next E12 value up, gives 0.38 dB but 144 kHz, below a 150 kHz requirement that 1.2616 pF meets.
        var f = Lint.Check(WorkedExample("1.2616 pF", "requirements: { bandwidth: 150 kHz }")).Of(Id).Single();

        Assert.Null(f.Fix);
        Assert.Contains("Cf = 1.5 pF would keep it within the limit, but bandwidth rejects it", f.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("1.3 dB", false)]
    [InlineData("1.1 dB", true)]
    public void Takes_the_limit_from_configuration(string max, bool flagged)
    {
        var r = Lint.Check(WorkedExample("1.2616 pF"), $"rules:\n  peaking: {{ max: {max} }}");

        Assert.Equal(flagged, r.Of(Id).Count == 1);
    }

    [Theory]
    [InlineData("1.3 dB", "1 dB", false)]
    [InlineData("1.1 dB", "2 dB", true)]
    public void Takes_the_limit_from_the_spec_requirements_over_configuration(string requirement, string configured, bool flagged)
    {
        var r = Lint.Check(WorkedExample("1.2616 pF", $"requirements: {{ peaking: {requirement} }}"), $"rules:\n  peaking: {{ max: {configured} }}");

        Assert.Equal(flagged, r.Of(Id).Count == 1);
    }

    [Fact]
    public void Uses_the_configured_severity_and_can_be_turned_off()
    {
        var spec = WorkedExample("[|1.2616 pF|]");

        Lint.Check(spec, "rules:\n  peaking: { severity: error }").SingleAtMark(Id, Severity.Error);
        Lint.Check(spec, "rules:\n  peaking: { severity: off }").Clean(Id);
    }

    [Fact]
    public void Suggests_a_capacitor_that_brings_the_peaking_within_the_limit_and_it_does()
    {
        var r = Lint.Check(WorkedExample("0.5 pF"));

        var fixedRun = r.ApplyFixAndRecheck(r.Single(Id));

        Assert.True(fixedRun.Outcome.Analysis!.PeakingDb <= 1);
    }
}
