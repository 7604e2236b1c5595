using SpecLint.Core.Analysis;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests;

/// <summary>
/// The rules that judge the spread a build will see (phase-margin and bandwidth at their worst corner,
/// capacitor-tolerance), with the standard corner analysis switched on. The worst corner is checked
/// against a brute-force evaluation of the tolerance box's vertices here, independent of the tool's search.
/// </summary>
public sealed class ToleranceCornerRuleTests
{
    // references.md §3.2's worked example (Cin = 100 pF, Rf = 1 MΩ, GBW = 10 MHz) with real-world spreads:
    // GBW ±30 % (common practice for op-amp lots), sensor ±10 %, and a small Cf with an absolute ±0.25 pF.
    private static string Channel(string cf, string requirements = "") => $$"""
        {{Parts.Header}}
        conditions: { temperature: 25 °C, supply: { positive: 15 V, negative: -15 V } }
        bias: 0 V
        input: { type: photodiode, capacitance: 100 pF ±10%, current: { min: 1 nA, max: 1 µA } }
        amplifier:
          gbw: 10 MHz ±30%
          open-loop-gain: 180 dB
          voltage-noise: 10 nV/√Hz
          current-noise: 1 fA/√Hz
          input-capacitance: { common-mode: 0 pF, differential: 0 pF }
          bias-current: 0 A
          offset-voltage: 0 V
          output-swing: { to-negative: 0 V, to-positive: 0 V }
        feedback:
          resistance: 1 MΩ
          capacitance: {{cf}}
          dielectric: C0G
        {{requirements}}
        """;

    /// <summary>The smallest phase margin over the 2³ vertices of (GBW, Csensor, Cf), by direct evaluation.</summary>
    private static double BruteForceMinimumPhaseMarginDeg(double cfTyp, double cfDelta)
    {
        var min = double.PositiveInfinity;
        foreach (var gbw in new[] { 7e6, 13e6 })
        {
            foreach (var cin in new[] { 90e-12, 110e-12 })
            {
                foreach (var cf in new[] { cfTyp - cfDelta, cfTyp + cfDelta })
                {
                    var c = new Circuit { Rf = new Resistance(1e6), Cf = new Capacitance(cf), SensorCapacitance = new Capacitance(cin), Gbw = new Frequency(gbw), A0 = new Gain(1e9) };
                    min = Math.Min(min, TiaAnalyzer.Analyze(c, AnalysisOptions.WithoutNoise).PhaseMargin!.Value.Degrees);
                }
            }
        }

        return min;
    }

    private static double NominalPhaseMarginDeg(double cf) =>
        TiaAnalyzer.Analyze(new Circuit { Rf = new Resistance(1e6), Cf = new Capacitance(cf), SensorCapacitance = new Capacitance(100e-12), Gbw = new Frequency(10e6), A0 = new Gain(1e9) }, AnalysisOptions.WithoutNoise).PhaseMargin!.Value.Degrees;

    [Fact]
    public void A_design_that_passes_at_nominal_but_rings_at_a_corner_is_flagged_by_phase_margin_and_capacitor_tolerance()
    {
        // Preconditions computed independently: nominal above the 45° floor, the worst vertex below it.
        Assert.True(NominalPhaseMarginDeg(1.5e-12) > 45);
        var worst = BruteForceMinimumPhaseMarginDeg(1.5e-12, 0.25e-12);
        Assert.True(worst < 45);

        var r = Lint.CheckWithCorners(Channel("[|1.5 pF ±0.25 pF|]"));
        Assert.NotNull(r.Outcome.Tolerances);
        // The tool's worst corner is at least as bad as the vertices (it also searches inside the box).
        Assert.True(r.Outcome.Tolerances!.PhaseMarginMin!.Value.Degrees <= worst + 1e-6);

        var pm = r.SingleAtMark("phase-margin", Severity.Error);
        Assert.Contains("at nominal but", pm.Message, StringComparison.Ordinal);
        Assert.Contains("GBW low", pm.Message, StringComparison.Ordinal);
        var ct = r.SingleAtMark("capacitor-tolerance", Severity.Error);
        Assert.Contains("passes at nominal", ct.Message, StringComparison.Ordinal);
        Assert.Contains("Monte Carlo", ct.Message, StringComparison.Ordinal);

        // The suggested Cf holds at every corner when re-checked with corners.
        var again = r.ApplyFixAndRecheck(pm);
        again.Clean("capacitor-tolerance");
    }

    [Fact]
    public void A_design_that_fails_at_nominal_is_left_to_phase_margin()
    {
        Assert.True(NominalPhaseMarginDeg(0.5e-12) < 45);
        var r = Lint.CheckWithCorners(Channel("[|0.5 pF ±0.25 pF|]"));
        r.SingleAtMark("phase-margin", Severity.Error);
        r.Clean("capacitor-tolerance");
    }

    [Fact]
    public void A_comfortable_design_is_clean_at_every_corner()
    {
        // 2.7 pF: twice the "45°" Cf of references.md §3.2, critically damped or better at every vertex.
        Assert.True(BruteForceMinimumPhaseMarginDeg(2.7e-12, 0.25e-12) > 45);
        var r = Lint.CheckWithCorners(Channel("2.7 pF ±0.25 pF"));
        r.Clean("phase-margin");
        r.Clean("capacitor-tolerance");
        Assert.Equal(1.0, r.Outcome.Tolerances!.MonteCarlo!.Yield);
    }

    [Fact]
    public void Bandwidth_is_judged_at_the_slowest_corner()
    {
        // With Cf = 1.8 pF the nominal bandwidth is 125 kHz (references.md §3.2: √2·Cf45 gives 125.04 kHz with 1.784 pF);
        // the low-GBW, high-Cf corner is slower than 110 kHz.
        var r = Lint.CheckWithCorners(Channel("1.8 pF ±0.25 pF", "requirements: { bandwidth: [|110 kHz|] }"));
        var nominal = r.Outcome.Analysis!.Bandwidth!.Value.Hertz;
        Assert.True(nominal > 110e3);
        Assert.True(r.Outcome.Tolerances!.BandwidthMin!.Value.Hertz < 110e3);
        var f = r.SingleAtMark("bandwidth", Severity.Error);
        Assert.Contains("at nominal but", f.Message, StringComparison.Ordinal);
    }
}
