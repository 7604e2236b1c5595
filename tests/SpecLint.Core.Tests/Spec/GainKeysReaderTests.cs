using SpecLint.Core.Analysis;
using SpecLint.Core.Spec;
using SpecLint.Core.Spec.Model;

namespace SpecLint.Core.Tests.Spec;

/// <summary>Reading switched settings, adjustable resistances and electrodes, and refusing spreads no part has.</summary>
public sealed class GainKeysReaderTests
{
    private static string Spec(string input, string feedback) => $"""
        spec: 1
        kind: transimpedance
        name: probe
        conditions:
          temperature: 25 °C
          supply: {"{"} positive: 5 V, negative: 0 V {"}"}
        bias: 1 V
        input:
        {input}
        amplifier:
          gbw: 1 MHz
          voltage-noise: 15 nV/√Hz
          current-noise: 1 fA/√Hz
          input-capacitance: {"{"} common-mode: 4 pF, differential: 2 pF {"}"}
          bias-current: 1 pA
          offset-voltage: 0.5 mV
          output-swing: {"{"} to-negative: 20 mV, to-positive: 20 mV {"}"}
        feedback:
        {feedback}
        """;

    private const string Photodiode = """
          type: photodiode
          capacitance: 20 pF
          current: { min: 10 pA, max: 100 nA }
        """;

    private const string Fixed = """
          resistance: 10 MΩ ±1%
          capacitance: 10 pF ±5%
        """;

    [Fact]
    public void An_electrode_divides_its_current_between_its_shunt_and_the_access_resistance()
    {
        var loaded = SpecLoader.LoadText(Spec("""
              type: electrode
              series-resistance: 100 kΩ
              capacitance: 20 nF
              shunt-resistance: 400 kΩ
              current: { min: 10 pA, max: 100 nA }
            """, Fixed), "probe.tia.yaml");
        Assert.True(loaded.IsValid, string.Join("; ", loaded.Diagnostics));
        var spec = loaded.Spec!;
        Assert.Equal(SensorType.Electrode, spec.Input.Type);

        // Current divider at DC (common practice): Rsh/(Rsh + Rs) of the source current reaches the node, so the
        // DC transimpedance is Rf·Rsh/(Rsh + Rs) = 10 MΩ·0.8 = 8 MΩ, less 1/A0·(1 + Rf/(Rsh + Rs)) ≈ 2.1e-5.
        var r = TiaAnalyzer.Analyze(spec);
        Assert.Equal(8e6 * (1 - (21e-6 / 1.0)), r.Transimpedance.Ohms, 8e6 * 2e-7);
    }

    [Fact]
    public void A_series_resistance_needs_an_electrode()
    {
        var loaded = SpecLoader.LoadText(Spec("""
              type: photodiode
              series-resistance: 100 kΩ
              capacitance: 20 pF
              current: { min: 10 pA, max: 100 nA }
            """, Fixed), "probe.tia.yaml");
        var d = Assert.Single(loaded.Diagnostics);
        Assert.Equal("/input/series-resistance", d.Pointer);
        Assert.Equal((10, 22), (d.Line, d.Column));
        Assert.Contains("type: electrode", d.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("  resistance: 10 kΩ .. 10 MΩ\n  capacitance: 2 pF", "/feedback/resistance", 21, 15, "adjustable: 10 kΩ .. 10 MΩ")]
    [InlineData("  resistance: 1 MΩ ±60%\n  capacitance: 2 pF", "/feedback/resistance", 21, 15, "spans a factor of 4")]
    [InlineData("  resistance: 1 MΩ +60%/-10%\n  capacitance: 2 pF", "/feedback/resistance", 21, 15, "reaches 60 % from its typical value")]
    [InlineData("  resistance: 1 MΩ\n  capacitance: { min: 1 pF, max: 5 pF }", "/feedback/capacitance", 22, 16, "feedback.settings")]
    public void A_spread_no_part_has_is_refused_where_it_is_written(string feedback, string pointer, int line, int column, string hint)
    {
        var loaded = SpecLoader.LoadText(Spec(Photodiode, feedback), "probe.tia.yaml");
        var d = Assert.Single(loaded.Diagnostics);
        Assert.Equal(pointer, d.Pointer);
        Assert.Equal((line, column), (d.Line, d.Column));
        Assert.Contains(hint, d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Fifty_percent_is_still_a_tolerance()
    {
        // ±50 % and max/min = 3 are the widest spreads read as one part (references.md §D8).
        var loaded = SpecLoader.LoadText(Spec(Photodiode, "  resistance: 1 GΩ ±1%\n  capacitance: 0.1 pF ±0.05 pF"), "probe.tia.yaml");
        Assert.True(loaded.IsValid, string.Join("; ", loaded.Diagnostics));
    }

    [Fact]
    public void Settings_are_read_with_their_own_ranges_and_the_switch()
    {
        var loaded = SpecLoader.LoadText(Spec(Photodiode, """
              settings:
                - { name: low, resistance: 10 kΩ ±1%, capacitance: 22 pF ±5% }
                - { name: high, resistance: 10 MΩ ±1%, capacitance: 0.5 pF ±0.05 pF, input: { current: { min: 20 pA, max: 200 nA } }, requirements: { bandwidth: 2 kHz } }
              switch: { on-resistance: 35 Ω, off-capacitance: 4 pF }
            """), "probe.tia.yaml");
        Assert.True(loaded.IsValid, string.Join("; ", loaded.Diagnostics));
        var views = GainViews.All(loaded.Spec!);
        Assert.Equal(["low", "high"], views.Select(v => v.Setting));
        var high = views[1];
        Assert.Equal(10e6, high.Feedback.Resistance.Typ.Ohms);
        Assert.Equal(200e-9, high.Input.CurrentMax.Amperes);
        Assert.Equal(2e3, high.Requirements.Bandwidth!.Value.Hertz);
        Assert.Equal(100e-9, views[0].Input.CurrentMax.Amperes);
        Assert.Equal("/feedback/settings/1/capacitance", GainViews.ToFilePointer(high, "/feedback/capacitance"));
        Assert.Equal(high.Locations.Locate("/feedback/settings/1/capacitance"), high.Locations.Locate("/feedback/capacitance"));

        var circuit = CircuitFactory.Nominal(high);
        Assert.Equal(35, circuit.FeedbackSeriesResistance.Ohms);
        var off = Assert.Single(circuit.OffBranches);
        Assert.Equal(10e3, off.Rf.Ohms);
        Assert.Equal(4e-12, off.OffCapacitance.Farads);
    }

    [Fact]
    public void A_waiver_must_name_a_setting_the_spec_has()
    {
        var loaded = SpecLoader.LoadText(Spec(Photodiode, """
              settings:
                - { name: low, resistance: 10 kΩ, capacitance: 22 pF }
                - { name: high, resistance: 10 MΩ, capacitance: 0.5 pF }
            waivers:
              - { rule: bandwidth, reason: survey mode, expires: 2027-01-31, setting: hi }
            """), "probe.tia.yaml");
        var d = Assert.Single(loaded.Diagnostics);
        Assert.Equal("/waivers/0/setting", d.Pointer);
        Assert.Contains("low, high", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Settings_and_a_single_resistance_do_not_mix()
    {
        var loaded = SpecLoader.LoadText(Spec(Photodiode, """
              resistance: 1 MΩ
              settings:
                - { name: low, resistance: 10 kΩ, capacitance: 22 pF }
                - { name: high, resistance: 10 MΩ, capacitance: 0.5 pF }
            """), "probe.tia.yaml");
        var d = Assert.Single(loaded.Diagnostics);
        Assert.Equal("/feedback/resistance", d.Pointer);
    }
}
