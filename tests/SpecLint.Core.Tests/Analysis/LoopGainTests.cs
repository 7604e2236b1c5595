using SpecLint.Core.Analysis;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Analysis;

/// <summary>Phase margin, crossings and peaking: the second-order table and the pitfalls of references.md §4.</summary>
public sealed class LoopGainTests
{
    [Theory]
    // ζ, PM, Mr (dB), f−3dB/fn: references.md §3.3, formulas [DB], [O] (row 17), values computed there and reproduced by
    // the exact model with Cin = 0 (β = 1) and fp2 = 4ζ²·GBW, which makes T = ωn²/(s(s + 2ζωn)) with ωn = 2ζ·ωt.
    [InlineData(0.3, 33.27, 4.847, 1.4537)]
    [InlineData(0.5, 51.83, 1.249, 1.2720)]
    [InlineData(0.6, 59.19, 0.355, 1.1482)]
    [InlineData(0.707, 65.52, 0.0, 1.0002)]
    [InlineData(1.0, 76.35, 0.0, 0.6436)]
    public void Second_order_loop_reproduces_the_damping_table(double zeta, double pmDeg, double mrDb, double bwOverFn)
    {
        var gbw = 1e6;
        var c = new Circuit
        {
            Rf = new Resistance(1e3),
            Gbw = new Frequency(gbw),
            SecondPole = new Frequency(4 * zeta * zeta * gbw),
            A0 = new Gain(1e13),
        };
        var r = TiaAnalyzer.Analyze(c, AnalysisOptions.WithoutNoise);
        var fn = 2 * zeta * gbw;

        Assert.Equal(pmDeg, r.PhaseMargin!.Value.Degrees, 0.005);
        Assert.Equal(mrDb, r.PeakingDb, 0.0005);
        Assert.Equal(bwOverFn, r.Bandwidth!.Value.Hertz / fn, 0.00005);
        Assert.Equal(PhaseMarginFormula(zeta), r.PhaseMargin.Value.Degrees, 1e-6);
    }

    [Fact]
    public void Zero_feedback_capacitance_gives_a_few_degrees_and_large_peaking()
    {
        var r = TiaAnalyzer.Analyze(TestCircuits.WorkedExample(Capacitance.Zero), AnalysisOptions.WithoutNoise);

        // references.md §4 item 4: a pure two-pole loop T ≈ ωt/(s(1 + s·Rf·Cin)), so ωn² = ωt/(Rf·Cin),
        // 2ζωn = 1/(Rf·Cin), and PM follows row 17 ([DB], [O]).
        var wt = 2 * Math.PI * 10e6;
        var tau = 1e6 * 100e-12;
        var wn = Math.Sqrt(wt / tau);
        var zeta = 1 / (2 * wn * tau);
        Assert.Equal(PhaseMarginFormula(zeta), r.PhaseMargin!.Value.Degrees, 0.01);
        Assert.InRange(r.PhaseMargin.Value.Degrees, 0, 10);
        Assert.True(r.PeakingDb > 15, $"peaking {r.PeakingDb} dB");
        Assert.Equal(double.PositiveInfinity, r.NoiseGainHighFrequency);
        Assert.Null(r.BetaZero);
        Assert.NotNull(r.BetaPole);
    }

    [Fact]
    public void Loop_that_never_reaches_one_has_no_phase_margin()
    {
        // references.md §4 item 1: A0·Rsh/(Rsh + Rf) < 1 (here 5/11) gives |T| < 1 everywhere: PM undefined, not 0 or 180.
        var c = new Circuit
        {
            Rf = new Resistance(1e6),
            Rsh = new Resistance(1e5),
            Cf = new Capacitance(1e-12),
            SensorCapacitance = new Capacitance(100e-12),
            A0 = new Gain(5),
            Gbw = new Frequency(1e6),
        };
        var r = TiaAnalyzer.Analyze(c, AnalysisOptions.Default);
        Assert.Null(r.PhaseMargin);
        Assert.Null(r.Crossover);
        Assert.Empty(r.Crossings);
        Assert.Equal(5.0 / 11, r.LoopGainDc, 1e-12);
        Assert.NotNull(r.Noise);
    }

    [Fact]
    public void Loop_lifted_through_one_by_the_feedback_zero_lists_both_crossings()
    {
        // references.md §4 item 2: T0 = 1000·1e-4 = 0.1 < 1; the β zero (159 Hz) lifts |T| to ≈ GBW·β0/fz ≈ 6 before
        // the β pole (1.6 MHz) brings it down again: one rising and one falling crossing.
        var c = new Circuit
        {
            Rf = new Resistance(1e9),
            Rsh = new Resistance(1e5),
            Cf = new Capacitance(1e-12),
            A0 = new Gain(1e3),
            Gbw = new Frequency(10e6),
        };
        var r = TiaAnalyzer.Analyze(c, AnalysisOptions.WithoutNoise);
        var m = new TiaModel(c);

        Assert.Equal(2, r.Crossings.Length);
        Assert.Equal(CrossingDirection.Rising, r.Crossings[0].Direction);
        Assert.Equal(CrossingDirection.Falling, r.Crossings[1].Direction);
        Assert.True(r.Crossings[0].Frequency < r.Crossings[1].Frequency);
        Assert.Equal(r.Crossings[1].Frequency, r.Crossover);
        Assert.Equal(r.Crossings[1].Margin, r.PhaseMargin);
        // The rising crossing's "margin" is the meaningless > 180° value the pitfall warns about.
        Assert.True(r.Crossings[0].Margin.Degrees > 180);
        foreach (var x in r.Crossings)
        {
            Assert.Equal(1, m.LoopGain(x.Frequency).Magnitude, 1e-9);
        }
    }

    [Fact]
    public void Phase_past_minus_180_degrees_gives_a_negative_margin_not_300()
    {
        // references.md §4 item 3: with Cf = 0 and a second pole below the crossover, ∠T passes −180°.
        var c = TestCircuits.WorkedExample(Capacitance.Zero) with { SecondPole = new Frequency(200e3) };
        var r = TiaAnalyzer.Analyze(c, AnalysisOptions.WithoutNoise);
        var f = r.Crossover!.Value.Hertz;

        // Phase as a sum of pole angles: op-amp pole fa = GBW/A0, second pole, β pole 1/(2π·Rf·Cin).
        var phaseDeg = -(Math.Atan(f / (10e6 / 1e9)) + Math.Atan(f / 200e3) + Math.Atan(f / (1 / (2 * Math.PI * 1e-4)))) * 180 / Math.PI;
        Assert.Equal(180 + phaseDeg, r.PhaseMargin!.Value.Degrees, 1e-6);
        Assert.InRange(r.PhaseMargin.Value.Degrees, -90, 0);
        var wrapped = new TiaModel(c).LoopGain(r.Crossover.Value).Phase * 180 / Math.PI;
        Assert.True(wrapped > 0, "atan2 wraps the same phase to a positive angle, which is why the model sums angles");
    }

    [Fact]
    public void Crossover_is_where_the_loop_gain_magnitude_is_one()
    {
        var r = TiaAnalyzer.Analyze(TestCircuits.Photodiode, AnalysisOptions.WithoutNoise);
        var t = new TiaModel(TestCircuits.Photodiode).LoopGain(r.Crossover!.Value);
        Assert.Equal(1, t.Magnitude, 1e-9);
        Assert.Equal(r.PhaseMargin!.Value.Degrees, 180 + (t.Phase * 180 / Math.PI), 1e-6);
    }

    [Fact]
    public void Bandwidth_is_the_fall_after_the_peak()
    {
        var c = TestCircuits.WorkedExample(TestCircuits.Cf45 * 0.3);
        var r = TiaAnalyzer.Analyze(c, AnalysisOptions.WithoutNoise);
        var m = new TiaModel(c);

        // references.md §1 definitions: f−3dB is where |Zt| falls through |Zt(0)|/√2 after the peak.
        Assert.True(r.PeakingDb > 3);
        Assert.True(r.Bandwidth > r.PeakFrequency);
        Assert.Equal(r.Transimpedance.Ohms / Math.Sqrt(2), m.Transimpedance(r.Bandwidth!.Value).Magnitude, 1e-6 * r.Transimpedance.Ohms);
        Assert.Equal(r.PeakingDb, 20 * Math.Log10(m.Transimpedance(r.PeakFrequency!.Value).Magnitude / r.Transimpedance.Ohms), 1e-9);
    }

    [Fact]
    public void Beta_zero_and_pole_and_noise_gains_follow_their_formulas()
    {
        var c = TestCircuits.Photodiode;
        var r = TiaAnalyzer.Analyze(c, AnalysisOptions.WithoutNoise);

        // references.md §1 rows 4 and 7.
        var cfb = 1.15e-12;
        var cin = 17.8e-12;
        Assert.Equal(1 / (2 * Math.PI * 10e6 * cfb), r.BetaZero!.Value.Hertz, 1e-6);
        Assert.Equal(((1 / 10e6) + (1 / 2e9)) / (2 * Math.PI * (cin + cfb)), r.BetaPole!.Value.Hertz, 1e-6);
        Assert.Equal(1 + (cin / cfb), r.NoiseGainHighFrequency, 1e-9);
        Assert.Equal(1 + (10e6 / 2e9), r.NoiseGainDc, 1e-12);
    }

    /// <summary>PM = atan(2ζ/√(√(1 + 4ζ⁴) − 2ζ²)), references.md §1 row 17 ([DB], [O]).</summary>
    private static double PhaseMarginFormula(double zeta) =>
        Math.Atan(2 * zeta / Math.Sqrt(Math.Sqrt(1 + (4 * Math.Pow(zeta, 4))) - (2 * zeta * zeta))) * 180 / Math.PI;
}
