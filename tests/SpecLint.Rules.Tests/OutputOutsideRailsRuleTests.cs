using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests;

public sealed class OutputOutsideRailsRuleTests
{
    private const string Id = "output-headroom";

    // Hand computation (references.md §1 row 12, common practice): Vout,max = Vbias + Imax·Rf + |Vos|·(1 + Rf/Rsh) + |Ib|·Rf
    // (Rsh = ∞, Ib = 0, no dark current) must stay ≤ V+min − swing − margin = 4.75 V − 50 mV − 100 mV = 4.6 V.
    private const double Bias = 0.5, Imax = 10e-6, Vos = 1e-3, HighLimit = (5 * 0.95) - 0.05 - 0.1;

    private static string Channel(string rf, string supply = "5 V ±5%", string bias = "0.5 V", string direction = "out-of-node") => $$"""
        {{Parts.Header}}
        conditions: { temperature: 25 °C, supply: { positive: {{supply}}, negative: 0 V } }
        bias: {{bias}}
        input: { type: photodiode, capacitance: 10 pF, current: { min: 1 µA, max: 10 µA }, current-direction: {{direction}} }
        amplifier:
          gbw: 10 MHz
          open-loop-gain: 180 dB
          voltage-noise: 10 nV/√Hz
          current-noise: 1 fA/√Hz
          input-capacitance: { common-mode: 0 pF, differential: 0 pF }
          bias-current: 0 A
          offset-voltage: 1 mV
          output-swing: { to-negative: 50 mV, to-positive: 50 mV }
        feedback:
          resistance: {{rf}}
          capacitance: 10 pF
        """;

    [Fact]
    public void Accepts_an_output_that_fits_inside_the_rails()
    {
        Lint.Check(Channel("390 kΩ ±5%")).Clean(Id);
    }

    [Fact]
    public void Flags_a_full_scale_output_beyond_the_positive_limit_at_the_feedback_resistor()
    {
        var r = Lint.Check(Channel("[|1 MΩ ±5%|]"));

        var f = r.SingleAtMark(Id, Severity.Error);
        Assert.Equal("/feedback/resistance", f.Pointer);
        Assert.Contains("the output clips", f.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("390 kΩ ±5%", 390e3)]
    [InlineData("430 kΩ ±5%", 430e3)]
    [InlineData("402 kΩ ±1%", 402e3)]
    [InlineData("412 kΩ ±1%", 412e3)]
    [InlineData("409 kΩ ±0.1%", 409e3)]
    [InlineData("411 kΩ ±0.1%", 411e3)]
    public void Agrees_with_the_hand_computed_full_scale_output(string rf, double ohms)
    {
        var r = Lint.Check(Channel(rf));

        var vmax = Bias + (Imax * ohms) + Vos;
        Assert.Equal(vmax > HighLimit, r.Of(Id).Count == 1);
    }

    [Fact]
    public void Uses_the_low_end_of_the_supply_tolerance()
    {
        // 0.5 V + 10 µA·430 kΩ + 1 mV = 4.801 V: inside 5 V − 150 mV = 4.85 V, outside 4.75 V − 150 mV = 4.6 V.
        Lint.Check(Channel("430 kΩ ±5%", supply: "5 V")).Clean(Id);
        Lint.Check(Channel("[|430 kΩ ±5%|]", supply: "5 V ±5%")).SingleAtMark(Id, Severity.Error);
    }

    [Theory]
    [InlineData("300 mV", true)]
    [InlineData("298 mV", false)]
    public void Takes_the_margin_from_configuration(string margin, bool flagged)
    {
        // 390 kΩ: 0.5 V + 3.9 V + 1 mV = 4.401 V against 4.75 V − 50 mV − margin (4.4 V or 4.402 V).
        var r = Lint.Check(Channel("[|390 kΩ ±5%|]"), $$"""
            rules:
              output-headroom: { margin: {{margin}} }
            """);

        Assert.Equal(flagged, r.Of(Id).Count == 1);
        if (flagged)
        {
            r.SingleAtMark(Id, Severity.Error);
        }
    }

    [Fact]
    public void Flags_an_output_pulled_below_the_negative_limit_when_the_current_flows_into_the_node()
    {
        // references.md §D3 orientation: into-node moves the output down from bias: 4.5 V − 10 µA·470 kΩ − 1 mV < 0.15 V.
        var r = Lint.Check(Channel("[|470 kΩ ±5%|]", bias: "4.5 V", direction: "into-node"));

        Assert.Contains("goes down to", r.SingleAtMark(Id, Severity.Error).Message, StringComparison.Ordinal);
        Lint.Check(Channel("390 kΩ ±5%", bias: "4.5 V", direction: "into-node")).Clean(Id);
    }

    [Fact]
    public void Uses_the_configured_severity()
    {
        var r = Lint.Check(Channel("[|1 MΩ ±5%|]"), """
            rules:
              output-headroom: { severity: note }
            """);

        r.SingleAtMark(Id, Severity.Note);
    }

    [Fact]
    public void Reports_nothing_when_turned_off()
    {
        var r = Lint.Check(Channel("1 MΩ ±5%"), """
            rules:
              output-headroom: { severity: off }
            """);

        r.Clean(Id);
    }

    [Theory]
    [InlineData("1 MΩ ±5%")]
    [InlineData("1 MΩ ±1%")]
    public void Suggests_the_largest_standard_resistor_that_fits_and_it_does(string rf)
    {
        var r = Lint.Check(Channel(rf));
        var f = r.Single(Id);

        r.ApplyFixAndRecheck(f);

        // Independent: the largest value of the tolerance's series (references.md §3.4) with 0.5 V + 10 µA·R + 1 mV ≤ 4.6 V.
        var series = rf.EndsWith("±5%", StringComparison.Ordinal) ? Reference.E24 : Reference.E96;
        var expected = Reference.AtOrBelow(series, (HighLimit - Bias - Vos) / Imax);
        Reference.AssertClose(expected, QuantityParser.Parse(f.Fix!.Value, Dimension.Resistance).Typ);
        Assert.EndsWith(rf[rf.IndexOf('±', StringComparison.Ordinal)..], f.Fix.Value, StringComparison.Ordinal);
    }

    [Fact]
    public void Says_no_resistor_fits_when_the_bias_itself_is_outside_the_span()
    {
        // Zero signal already sits at 4.9 V > 4.6 V: no Rf, however small, brings the output inside.
        var r = Lint.Check(Channel("[|1 MΩ ±5%|]", bias: "4.9 V"));

        var f = r.SingleAtMark(Id, Severity.Error);
        Assert.Null(f.Fix);
        Assert.Contains("No standard Rf fits", f.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Names_the_rule_that_rejects_the_resistor_that_would_fit()
    {
        // With Cf fixed, a smaller Rf moves the feedback zero up and the phase margin down (references.md §3.2
        // worked example's circuit, 10 µA full scale on ±5 V rails): on the exact model 1 MΩ leaves 72.6° and
        // 487 kΩ, the largest E96 value that fits, leaves less than a 65° floor.
        const string Spec = """
            spec: 1
            kind: transimpedance
            name: channel
            conditions: { temperature: 25 °C, supply: { positive: 5 V, negative: -5 V } }
            bias: 0 V
            input: { type: photodiode, capacitance: 100 pF, current: { min: 1 µA, max: 10 µA } }
            amplifier:
              gbw: 10 MHz
              open-loop-gain: 180 dB
              voltage-noise: 10 nV/√Hz
              current-noise: 1 fA/√Hz
              input-capacitance: { common-mode: 0 pF, differential: 0 pF }
              bias-current: 0 A
              offset-voltage: 0 V
              output-swing: { to-negative: 0 V, to-positive: 0 V }
            feedback:
              resistance: 1 MΩ
              capacitance: 2.2 pF
            """;

        var f = Lint.Check(Spec, "rules:\n  phase-margin: { floor: 65 deg }").Single(Id);

        Assert.Null(f.Fix);
        Assert.True(f.Message.Contains("Rf = 487 kΩ would fit, but phase-margin rejects it", StringComparison.Ordinal), f.Message);
    }
}
