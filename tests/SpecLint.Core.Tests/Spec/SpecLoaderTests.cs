using SpecLint.Core.Spec;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Spec;

public sealed class SpecLoaderTests
{
    private static string DesignExample => File.ReadAllText(TestPaths.Output("Spec", "Resources", "design-example.tia.yaml"));

    [Fact]
    public void Design_example_loads_with_no_diagnostic()
    {
        var result = SpecLoader.LoadText(DesignExample, "ch2.tia.yaml");

        Assert.Empty(result.Diagnostics);
        Assert.True(result.IsValid);
        var spec = result.Spec!;
        Assert.Equal("fluor-ch2", spec.Name);
        Assert.Equal(new[] { "optical", "low-light" }, spec.Tags.ToArray());
        Assert.Equal(2.2e-12, spec.Feedback.Capacitance!.Value.Typ.Farads);
        Assert.Equal(1.95e-12, spec.Feedback.Capacitance!.Value.Min.Farads, 1e-27);
        Assert.Equal(1e6, spec.Feedback.Resistance.Typ.Ohms);
        Assert.Equal(-10, spec.Conditions.Temperature.Min.Celsius, 1e-9);
        Assert.Equal(60, spec.Conditions.Temperature.Max.Celsius, 1e-9);
        Assert.Equal(5.25, spec.Conditions.SupplyPositive.Max.Volts, 1e-12);
        Assert.Equal(2e-9, spec.Input.CurrentMin.Amperes);
        Assert.Equal(1.5e-6, spec.Input.CurrentMax.Amperes);
        Assert.Equal(CurrentDirection.OutOfNode, spec.Input.Direction);
        Assert.Equal(115, spec.Amplifier.OpenLoopGain.Decibels, 1e-9);
        Assert.Equal(1, spec.Amplifier.MinStableGain!.Value.Linear);
        Assert.Equal(1, spec.Requirements.PeakingDb!.Value, 1e-12);
        Assert.Equal(1, spec.Requirements.Noise!.BandLow!.Value.Hertz);
        Assert.Equal(1e5, spec.Requirements.Noise!.BandHigh!.Value.Hertz);
        var waiver = Assert.Single(spec.Waivers);
        Assert.Equal(new DateOnly(2027, 3, 31), waiver.Expires);
        Assert.Equal("/waivers/0", waiver.Pointer);
        Assert.Equal(37, spec.Locations.Locate("/feedback/capacitance").Line);
    }

    [Fact]
    public void Optional_keys_take_their_defaults()
    {
        var text = DesignExample
            .Replace("  open-loop-gain: 115 dB         # optional, default 120 dB\n", "", StringComparison.Ordinal)
            .Replace("  dark-current: 50 pA            # optional\n", "", StringComparison.Ordinal)
            .Replace("  shunt-resistance: 2 GΩ         # optional, default infinite\n", "", StringComparison.Ordinal)
            .Replace("  current-direction: out-of-node # default; see Orientation below\n", "", StringComparison.Ordinal)
            .Replace("  parasitic-capacitance: 0.15 pF # across Rf, from layout; optional\n", "", StringComparison.Ordinal)
            .Replace("  capacitance: 2.2 pF ±0.25 pF\n", "", StringComparison.Ordinal);
        var cut = text.IndexOf("board:", StringComparison.Ordinal);
        text = text[..cut];

        var result = SpecLoader.LoadText(text, "min.tia.yaml");

        Assert.Empty(result.Diagnostics);
        var spec = result.Spec!;
        Assert.Equal(120, spec.Amplifier.OpenLoopGain.Decibels, 1e-9);
        Assert.Equal(0, spec.Input.DarkCurrent.Typ.Amperes);
        Assert.Null(spec.Input.ShuntResistance);
        Assert.Null(spec.Feedback.Capacitance);
        Assert.Equal(0, spec.Feedback.ParasiticCapacitance.Typ.Farads);
        Assert.Equal(0, spec.Board.StrayCapacitance.Typ.Farads);
        Assert.Equal(Requirements.None, spec.Requirements);
        Assert.Empty(spec.Waivers);
    }

    [Fact]
    public void Accepts_range_maps_current_noise_corner_and_into_node()
    {
        var text = DesignExample
            .Replace("gbw: 8 MHz ±30%", "gbw: { min: 6 MHz, typ: 8 MHz, max: 11 MHz }", StringComparison.Ordinal)
            .Replace("  current-noise: 0.6 fA/√Hz\n", "  current-noise: 0.6 fA/rtHz\n  current-noise-corner: 1 kHz\n", StringComparison.Ordinal)
            .Replace("current-direction: out-of-node", "current-direction: into-node", StringComparison.Ordinal)
            .Replace("temperature: -10 °C .. 60 °C", "temperature: 40 °C", StringComparison.Ordinal)
            .Replace("resistance: 1 MΩ ±0.1%", "resistance: 1M0 F", StringComparison.Ordinal);

        var result = SpecLoader.LoadText(text, "maps.tia.yaml");

        Assert.Empty(result.Diagnostics);
        var spec = result.Spec!;
        Assert.Equal(ToleranceForm.Range, spec.Amplifier.Gbw.Form);
        Assert.Equal(6e6, spec.Amplifier.Gbw.Min.Hertz);
        Assert.Equal(8e6, spec.Amplifier.Gbw.Typ.Hertz);
        Assert.Equal(1e3, spec.Amplifier.CurrentNoiseCorner!.Value.Hertz);
        Assert.Equal(CurrentDirection.IntoNode, spec.Input.Direction);
        Assert.Equal(40, spec.Conditions.Nominal.Celsius, 1e-9);
        Assert.Equal(ToleranceForm.LetterCode, spec.Feedback.Resistance.Form);
        Assert.Equal(0.99e6, spec.Feedback.Resistance.Min.Ohms, 1e-6);
    }

    [Fact]
    public void Collects_every_problem_of_a_file_without_cascades()
    {
        var text = DesignExample
            .Replace("capacitance: 2.2 pF ±0.25 pF", "capacitance: 2.2", StringComparison.Ordinal)
            .Replace("gbw: 8 MHz ±30%", "gbw: fast", StringComparison.Ordinal)
            .Replace("  resistance: 1 MΩ ±0.1%", "  resistence: 1 MΩ ±0.1%", StringComparison.Ordinal);

        var result = SpecLoader.LoadText(text, "many.tia.yaml");

        Assert.Equal(3, result.Diagnostics.Length);
        Assert.Equal(["amplifier.gbw", "feedback.resistence", "feedback.capacitance"], result.Diagnostics.Select(d => d.KeyPath));
    }

    [Fact]
    public void Diagnostic_prints_file_line_column_rule_and_key_path()
    {
        var text = DesignExample.Replace("capacitance: 2.2 pF ±0.25 pF", "capacitance: 2.2", StringComparison.Ordinal);

        var d = Assert.Single(SpecLoader.LoadText(text, "hw/rx/ch2.tia.yaml").Diagnostics);

        Assert.Equal("hw/rx/ch2.tia.yaml:37:16: error spec-invalid: feedback.capacitance: \"2.2\" has no unit; a capacitance needs one, e.g. \"2.2 pF\"", d.ToString());
        Assert.Equal("/feedback/capacitance", d.Pointer);
    }

    [Fact]
    public void Missing_file_is_a_diagnostic_not_an_exception()
    {
        var result = SpecLoader.LoadFile(Path.Combine(Path.GetTempPath(), "speclint-no-such-file.tia.yaml"), "gone.tia.yaml");

        var d = Assert.Single(result.Diagnostics);
        Assert.Equal("gone.tia.yaml", d.File);
        Assert.Contains("cannot read the file", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Unknown_key_inside_a_waiver_suggests_the_right_one()
    {
        var text = DesignExample.Replace("    reason:", "    reasn:", StringComparison.Ordinal);

        var d = Assert.Single(SpecLoader.LoadText(text, "w.tia.yaml").Diagnostics);

        Assert.Equal((53, 5), (d.Line, d.Column));
        Assert.Contains("did you mean \"reason\"?", d.Message, StringComparison.Ordinal);
    }
}
