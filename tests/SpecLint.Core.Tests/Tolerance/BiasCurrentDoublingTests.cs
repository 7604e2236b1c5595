using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Spec;

namespace SpecLint.Core.Tests.Tolerance;

public sealed class BiasCurrentDoublingTests
{
    private static string DesignExample => File.ReadAllText(TestPaths.Output("Spec", "Resources", "design-example.tia.yaml"));

    private static string WithDoubling(string value) =>
        DesignExample.Replace("  bias-current: 1 pA\n", $"  bias-current: 1 pA\n  bias-current-doubling: {value}\n", StringComparison.Ordinal);

    [Fact]
    public void The_spec_can_set_its_op_amps_doubling_interval()
    {
        var loaded = SpecLoader.LoadText(WithDoubling("7 K"), "x.tia.yaml");
        Assert.True(loaded.IsValid, string.Join("; ", loaded.Diagnostics));
        var spec = loaded.Spec!;
        Assert.Equal(7, spec.Amplifier.BiasCurrentDoubling!.Value.Kelvin, 1e-12);

        var r = ToleranceAnalyzer.Analyze(spec, ToleranceOptions.CornersOnly)!;
        var hot = r.PhaseMarginMinAt with
        {
            Settings = [.. r.PhaseMarginMinAt.Settings.Select(s => s.Pointer == "/conditions/temperature" ? s with { End = CornerEnd.High, SiValue = 333.15 } : s)],
        };
        // The design example runs to 60 °C: 35 K above 25 °C is five doublings of 7 K (common practice model, 2^(ΔT/T2)).
        var c = ToleranceAnalyzer.CircuitAt(spec, hot);
        Assert.Equal(1e-12 * Math.Pow(2, 35.0 / 7), c.Ib.Amperes, 1e-22);
    }

    [Fact]
    public void Zero_kelvin_keeps_the_bias_current_constant()
    {
        var spec = SpecLoader.LoadText(WithDoubling("0 K"), "x.tia.yaml").Spec!;
        var r = ToleranceAnalyzer.Analyze(spec, ToleranceOptions.CornersOnly)!;
        var hot = r.PhaseMarginMinAt with
        {
            Settings = [.. r.PhaseMarginMinAt.Settings.Select(s => s.Pointer == "/conditions/temperature" ? s with { End = CornerEnd.High, SiValue = 333.15 } : s)],
        };
        Assert.Equal(1e-12, ToleranceAnalyzer.CircuitAt(spec, hot).Ib.Amperes, 1e-24);
    }

    [Fact]
    public void A_doubling_interval_in_celsius_is_rejected_at_its_value()
    {
        var loaded = SpecLoader.LoadText(WithDoubling("10 °C"), "x.tia.yaml");
        var d = Assert.Single(loaded.Diagnostics);
        Assert.Equal("/amplifier/bias-current-doubling", d.Pointer);
        Assert.Contains("write it in K", d.Message, StringComparison.Ordinal);
    }
}
