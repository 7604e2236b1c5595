using SpecLint.Core.Analysis;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Analysis;

public sealed class DesignHelpersTests
{
    [Theory]
    [InlineData(45)]
    [InlineData(60)]
    [InlineData(70)]
    public void Cf_solved_for_a_phase_margin_really_gives_it(double targetDeg)
    {
        var c = TestCircuits.WorkedExample(Capacitance.Zero);
        var cf = DesignHelpers.FeedbackCapacitanceForPhaseMargin(c, Angle.FromDegrees(targetDeg));
        Assert.NotNull(cf);
        var pm = TiaAnalyzer.Analyze(c with { Cf = cf.Value }, AnalysisOptions.WithoutNoise).PhaseMargin!.Value.Degrees;
        // The solver stops at 1e-10 in ln Cf; the margin it reaches is within 5e-10° of the target.
        Assert.Equal(targetDeg, pm, 1e-8);
    }

    [Fact]
    public void Cf_for_52_degrees_is_close_to_Cf45()
    {
        // references.md §3.2: Cf45 gives 52.14° on the exact model, so solving for 52.14° lands back near Cf45.
        var cf = DesignHelpers.FeedbackCapacitanceForPhaseMargin(TestCircuits.WorkedExample(Capacitance.Zero), Angle.FromDegrees(52.14));
        Assert.Equal(TestCircuits.Cf45.Farads, cf!.Value.Farads, 0.002e-12);
    }

    [Fact]
    public void Cf_counts_the_parasitic_capacitance_already_there()
    {
        var c = TestCircuits.WorkedExample(Capacitance.Zero);
        var bare = DesignHelpers.FeedbackCapacitanceForPhaseMargin(c, Angle.FromDegrees(60))!.Value;
        var withPar = DesignHelpers.FeedbackCapacitanceForPhaseMargin(c with { Cpar = new Capacitance(0.5e-12) }, Angle.FromDegrees(60))!.Value;
        Assert.Equal(bare.Farads - 0.5e-12, withPar.Farads, 1e-17);
        Assert.Equal(Capacitance.Zero, DesignHelpers.FeedbackCapacitanceForPhaseMargin(c with { Cpar = bare * 2 }, Angle.FromDegrees(60)));
    }

    [Fact]
    public void Unreachable_phase_margin_gives_no_Cf()
    {
        // A second pole at 1/20 of GBW caps the margin of this loop well below 89°.
        var c = TestCircuits.WorkedExample(Capacitance.Zero) with { SecondPole = new Frequency(0.5e6) };
        Assert.Null(DesignHelpers.FeedbackCapacitanceForPhaseMargin(c, Angle.FromDegrees(89)));
    }

    [Fact]
    public void Largest_Rf_puts_the_full_scale_output_on_the_limit_minus_margin()
    {
        var c = TestCircuits.Photodiode;
        var margin = new Voltage(0.1);
        var rf = DesignHelpers.LargestRfForHeadroom(c, margin)!.Value;
        var r = TiaAnalyzer.Analyze(c with { Rf = rf }, AnalysisOptions.WithoutNoise);
        Assert.Equal(r.Output.HighLimit.Volts - margin.Volts, r.Output.Max.Volts, 1e-9);
        Assert.True(r.Output.Min.Volts >= r.Output.LowLimit.Volts + margin.Volts);
    }

    [Fact]
    public void Largest_Rf_for_a_current_into_the_node_is_set_by_the_low_side()
    {
        var c = TestCircuits.Photodiode with { Direction = SpecLint.Core.Spec.Model.CurrentDirection.IntoNode, Vbias = new Voltage(4) };
        var rf = DesignHelpers.LargestRfForHeadroom(c, Voltage.Zero)!.Value;
        var r = TiaAnalyzer.Analyze(c with { Rf = rf }, AnalysisOptions.WithoutNoise);
        Assert.Equal(r.Output.LowLimit.Volts, r.Output.Min.Volts, 1e-9);
    }

    [Fact]
    public void Bias_outside_the_swing_has_no_Rf_that_fits()
    {
        var c = TestCircuits.Photodiode with { Vbias = new Voltage(4.99) };
        Assert.Null(DesignHelpers.LargestRfForHeadroom(c, Voltage.Zero));
    }

    [Fact]
    public void Smallest_shot_limited_Rf_is_two_kT_over_q_per_ampere()
    {
        // 2kT/q = 51.704 mV at 300 K (references.md §3.1), so 1 nA needs 51.704 MΩ.
        var rf = DesignHelpers.SmallestShotLimitedRf(new Current(1e-9), new Temperature(300));
        Assert.Equal(51.704e6, rf.Ohms, 0.0005e6);
        var r = TiaAnalyzer.Analyze(TestCircuits.Photodiode with { Rf = rf, Imin = new Current(1e-9), Idark = Current.Zero, Temperature = new Temperature(300) }, AnalysisOptions.WithoutNoise);
        Assert.Equal(1, r.ShotToRfThermalRatio, 1e-12);
    }
}
