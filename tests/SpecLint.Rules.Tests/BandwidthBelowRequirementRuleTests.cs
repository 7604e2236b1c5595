using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests;

public sealed class BandwidthBelowRequirementRuleTests
{
    private const string Id = "bandwidth";

    // references.md §3.2 worked example: Cin = 100 pF, Rf = 1 MΩ, GBW = 10 MHz, A0 = 1e9.
    private static string WorkedExample(string cf, string requirements) => $$"""
        {{Parts.Header}}
        conditions: { temperature: 25 °C, supply: { positive: 15 V, negative: -15 V } }
        bias: 0 V
        input: { type: photodiode, capacitance: 100 pF, current: { min: 1 µA, max: 10 µA } }
        {{Parts.IdealAmp}}
        feedback:
          resistance: 1 MΩ
          capacitance: {{cf}}
        requirements:
        {{requirements}}
        """;

    [Fact]
    public void Accepts_a_bandwidth_above_the_requirement()
    {
        // references.md §3.2: the Butterworth Cf 1.7841 pF gives f−3dB = 125.04 kHz.
        Lint.Check(WorkedExample("1.7841 pF", "  bandwidth: 120 kHz")).Clean(Id);
    }

    [Fact]
    public void Checks_nothing_without_a_requirement()
    {
        Lint.Check(WorkedExample("10 pF", "  phase-margin: 45 deg")).Clean(Id);
    }

    [Fact]
    public void Flags_a_bandwidth_below_the_requirement_at_the_requirement()
    {
        // 125.04 kHz < 130 kHz (references.md §3.2).
        var f = Lint.Check(WorkedExample("1.7841 pF", "  bandwidth: [|130 kHz|]")).SingleAtMark(Id, Severity.Error);

        Assert.Equal("/requirements/bandwidth", f.Pointer);
        Assert.Contains("125 kHz", f.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Uses_the_configured_severity_and_can_be_turned_off()
    {
        var spec = WorkedExample("1.7841 pF", "  bandwidth: [|130 kHz|]");

        Lint.Check(spec, "rules:\n  bandwidth: { severity: warning }").SingleAtMark(Id, Severity.Warning);
        Lint.Check(spec, "rules:\n  bandwidth: { severity: off }").Clean(Id);
    }

    [Fact]
    public void Suggests_a_smaller_capacitor_that_keeps_the_floor_and_it_does()
    {
        var r = Lint.Check(WorkedExample("1.7841 pF", "  bandwidth: 130 kHz\n  phase-margin: 50 deg"));
        var f = r.Single(Id);

        var fixedRun = r.ApplyFixAndRecheck(f);

        var cf = QuantityParser.Parse(f.Fix!.Value, Dimension.Capacitance).Typ;
        Assert.True(cf < 1.7841e-12);
        Assert.True(fixedRun.Outcome.Analysis!.PhaseMargin!.Value.Degrees >= 50);
        // Independent: the floor holds on the closed-form loop too (references.md §1 rows 1–5, A0 → ∞).
        Assert.True(Reference.PhaseMarginDeg(100e-12, 1e6, cf, 10e6) >= 50);
    }

    [Fact]
    public void Says_no_capacitor_works_when_the_op_amp_is_too_slow()
    {
        // f−3dB ≈ √(GBW/(2π·Rf·Cin)) = 126 kHz at best (references.md §1 row 16): 1 MHz is out of reach with 45° kept.
        var f = Lint.Check(WorkedExample("1.7841 pF", "  bandwidth: [|1 MHz|]")).SingleAtMark(Id, Severity.Error);

        Assert.Null(f.Fix);
        // The bandwidth itself is out of reach: the message does not blame the phase-margin floor.
        Assert.Contains("No standard Cf meets it, whatever the phase margin", f.Message, StringComparison.Ordinal);
    }

    // A 1 GΩ channel: Cf 1 pF gives 1/(2π·1 GΩ·1 pF) = 159 Hz (references.md §1); 1 kHz needs Cf ≲ 0.16 pF,
    // below feedback-capacitor-size's 0.5 pF minimum.
    private static string GigaohmChannel(string cf) => $$"""
        {{Parts.Header}}
        conditions: { temperature: 25 °C, supply: { positive: 12 V, negative: -12 V } }
        bias: 0 V
        input: { type: photodiode, capacitance: 5 pF, current: { min: 100 pA, max: 5 nA } }
        {{Parts.IdealAmp}}
        feedback:
          resistance: 1 GΩ
          capacitance: {{cf}}
        requirements:
          bandwidth: [|1 kHz|]
          phase-margin: 50°
        """;

    [Fact]
    public void A_failed_fix_search_names_the_rule_that_rejected_the_candidates()
    {
        var f = Lint.Check(GigaohmChannel("1 pF")).SingleAtMark(Id, Severity.Error);

        // 0.15 pF meets 1 kHz with the floor kept, but it is not a real part by feedback-capacitor-size's measure.
        Assert.Null(f.Fix);
        Assert.Contains("Cf = 0.15 pF would meet it with the 50° phase-margin floor kept, but feedback-capacitor-size rejects it (Cf ≥ 0.5 pF)", f.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("No standard Cf meets it", f.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void The_same_search_suggests_the_capacitor_once_the_minimum_allows_it()
    {
        var r = Lint.Check(GigaohmChannel("1 pF"), "rules:\n  feedback-capacitor-size: { min: 0.1 pF }");
        var f = r.Single(Id);

        Assert.Equal("0.15 pF", f.Fix!.Value);
        r.ApplyFixAndRecheck(f);
    }

    [Fact]
    public void Never_suggests_a_capacitor_below_the_size_minimum()
    {
        // 1 MHz is out of reach (see above); on the 1 GΩ channel 1 kHz is reachable only below the minimum.
        foreach (var f in new[] { Lint.Check(GigaohmChannel("1 pF")).Single(Id), Lint.Check(WorkedExample("1.7841 pF", "  bandwidth: 130 kHz")).Single(Id) })
        {
            Assert.True(f.Fix is null || QuantityParser.Parse(f.Fix.Value, Dimension.Capacitance).Typ >= 0.5e-12, f.Message);
        }
    }
}
