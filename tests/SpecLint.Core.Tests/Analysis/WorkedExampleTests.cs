using SpecLint.Core.Analysis;

namespace SpecLint.Core.Tests.Analysis;

/// <summary>references.md §3.2: Cin = 100 pF, Rf = 1 MΩ, GBW = 10 MHz, A0 = 1e9, single-pole op-amp.</summary>
public sealed class WorkedExampleTests
{
    [Fact]
    public void Cf45_is_the_formula_value()
    {
        // 1.2616 pF: references.md §3.2, formula from [G] (from memory).
        Assert.Equal(1.2616e-12, TestCircuits.Cf45.Farads, 0.00005e-12);
    }

    [Fact]
    public void The_45_degree_formula_gives_52_degrees_of_margin_with_peaking()
    {
        var r = TiaAnalyzer.Analyze(TestCircuits.WorkedExample(TestCircuits.Cf45), AnalysisOptions.WithoutNoise);

        // PM 52.14°, peaking 1.213 dB, f−3dB 159.0 kHz: references.md §3.2, exact model (computed there, ngspice-checked).
        Assert.NotNull(r.PhaseMargin);
        Assert.Equal(52.14, r.PhaseMargin.Value.Degrees, 0.01);
        Assert.Equal(1.213, r.PeakingDb, 0.001);
        Assert.NotNull(r.Bandwidth);
        Assert.Equal(159.0e3, r.Bandwidth.Value.Hertz, 0.05e3);
    }

    [Fact]
    public void The_45_degree_formula_does_not_give_45_degrees()
    {
        var r = TiaAnalyzer.Analyze(TestCircuits.WorkedExample(TestCircuits.Cf45), AnalysisOptions.WithoutNoise);

        // references.md §4 item 6: the asymptotic "45°" design has ~52°; a tool must not report 45° ± 1°.
        Assert.True(r.PhaseMargin!.Value.Degrees > 50, $"PM {r.PhaseMargin.Value.Degrees}°");
    }

    [Fact]
    public void Root_two_Cf45_is_the_Butterworth_design()
    {
        var r = TiaAnalyzer.Analyze(TestCircuits.WorkedExample(TestCircuits.Cf45 * Math.Sqrt(2)), AnalysisOptions.WithoutNoise);

        // PM 65.67°, 0 dB peaking, f−3dB 125.04 kHz: references.md §3.2, exact model. Peaking is tiny but may exceed 0 with finite A0.
        Assert.Equal(65.67, r.PhaseMargin!.Value.Degrees, 0.01);
        Assert.Equal(125.04e3, r.Bandwidth!.Value.Hertz, 0.01e3);
        Assert.True(r.PeakingDb < 0.001, $"peaking {r.PeakingDb} dB");
    }

    [Fact]
    public void Two_Cf45_is_critically_damped()
    {
        var r = TiaAnalyzer.Analyze(TestCircuits.WorkedExample(TestCircuits.Cf45 * 2), AnalysisOptions.WithoutNoise);

        // PM 76.38°, f−3dB 80.89 kHz, no peaking: references.md §3.2, exact model.
        Assert.Equal(76.38, r.PhaseMargin!.Value.Degrees, 0.01);
        Assert.Equal(80.89e3, r.Bandwidth!.Value.Hertz, 0.01e3);
        Assert.Equal(0, r.PeakingDb);
        Assert.Null(r.PeakFrequency);
    }

    [Fact]
    public void Bandwidth_estimate_formula_is_close_to_the_Butterworth_result()
    {
        // f−3dB ≈ √(GBW/(2π·Rf·Cin)) = 126.16 kHz: references.md §3.2, [G] (from memory); exact 125.04 kHz.
        var estimate = Math.Sqrt(10e6 / (2 * Math.PI * 1e6 * 100e-12));
        var r = TiaAnalyzer.Analyze(TestCircuits.WorkedExample(TestCircuits.Cf45 * Math.Sqrt(2)), AnalysisOptions.WithoutNoise);
        Assert.Equal(126.16e3, estimate, 0.01e3);
        Assert.InRange(r.Bandwidth!.Value.Hertz / estimate, 0.985, 0.995);
    }

    [Fact]
    public void Dc_transimpedance_includes_the_finite_open_loop_gain()
    {
        var r = TiaAnalyzer.Analyze(TestCircuits.WorkedExample(TestCircuits.Cf45), AnalysisOptions.WithoutNoise);

        // ZT(0) = Rf·T0/(1 + T0) with T0 = A0 (Rsh infinite): references.md §1 row 6.
        Assert.Equal(1e6 * 1e9 / (1 + 1e9), r.Transimpedance.Ohms, 1e-6);
        Assert.Equal(1e9, r.LoopGainDc);
    }
}
