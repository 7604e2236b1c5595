using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests;

public sealed class NoiseGainBelowMinimumStableRuleTests
{
    private const string Id = "min-stable-gain";

    // Cin = sensor 6 pF + common-mode 2 pF + differential 1 pF + board stray 1 pF = 10 pF (references.md §1 row 2).
    private const double Cin = 10e-12;

    private static string Channel(string cf, string gmin = "5", string cpar = "0 pF") => $$"""
        {{Parts.Header}}
        conditions: { temperature: 25 °C, supply: { positive: 5 V, negative: -5 V } }
        bias: 0 V
        input: { type: photodiode, capacitance: 6 pF, current: { min: 10 µA, max: 100 µA } }
        amplifier:
          gbw: 100 MHz
          voltage-noise: 5 nV/√Hz
          current-noise: 1 pA/√Hz
          input-capacitance: { common-mode: 2 pF, differential: 1 pF }
          bias-current: 0 A
          offset-voltage: 0 V
          output-swing: { to-negative: 0 V, to-positive: 0 V }
          min-stable-gain: {{gmin}}
        feedback:
          resistance: 10 kΩ
          capacitance: {{cf}}
          parasitic-capacitance: {{cpar}}
        board:
          stray-capacitance: 1 pF
        """;

    [Fact]
    public void Accepts_a_noise_gain_above_the_minimum()
    {
        // 1 + 10 pF/2.2 pF = 5.5 ≥ 5.
        Lint.Check(Channel("2.2 pF")).Clean(Id);
    }

    [Fact]
    public void Flags_a_noise_gain_below_the_minimum_at_the_feedback_capacitance()
    {
        // 1 + 10 pF/2.7 pF = 4.7 < 5.
        var f = Lint.Check(Channel("[|2.7 pF|]")).SingleAtMark(Id, Severity.Error);

        Assert.Equal("/feedback/capacitance", f.Pointer);
        Assert.Contains("4.7", f.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("1.8 pF", "0 pF", "5")]
    [InlineData("2.2 pF", "0 pF", "5")]
    [InlineData("2.2 pF", "0.5 pF", "5")]
    [InlineData("2.7 pF", "0 pF", "5")]
    [InlineData("2.7 pF", "0 pF", "4.5")]
    [InlineData("1 pF", "0.1 pF", "10")]
    [InlineData("1.2 pF", "0 pF", "10")]
    public void Agrees_with_one_plus_Cin_over_Cf_plus_Cpar_by_hand(string cf, string cpar, string gmin)
    {
        var r = Lint.Check(Channel(cf, gmin, cpar));

        // references.md §1 row 7: the high-frequency noise gain plateau is 1 + Cin/(Cf + Cpar).
        var noiseGain = 1 + (Cin / (QuantityParser.ParseSingle(cf, Dimension.Capacitance) + QuantityParser.ParseSingle(cpar, Dimension.Capacitance)));
        Assert.Equal(noiseGain < double.Parse(gmin, System.Globalization.CultureInfo.InvariantCulture), r.Of(Id).Count == 1);
    }

    [Fact]
    public void Ignores_a_unity_gain_stable_op_amp()
    {
        Lint.Check(Channel("10 pF", gmin: "1")).Clean(Id);
    }

    [Fact]
    public void Uses_the_configured_severity_and_can_be_turned_off()
    {
        var spec = Channel("[|2.7 pF|]");

        Lint.Check(spec, "rules:\n  min-stable-gain: { severity: warning }").SingleAtMark(Id, Severity.Warning);
        Lint.Check(spec, "rules:\n  min-stable-gain: { severity: off }").Clean(Id);
    }

    [Fact]
    public void Suggests_the_largest_E12_capacitor_that_reaches_the_minimum_and_it_does()
    {
        var r = Lint.Check(Channel("2.7 pF"));
        var f = r.Single(Id);

        r.ApplyFixAndRecheck(f);

        // Independent: Cf ≤ Cin/(Gmin − 1) = 2.5 pF, the largest E12 value below it (references.md §3.4).
        var expected = Reference.AtOrBelow(Reference.E12, Cin / (5 - 1));
        Reference.AssertClose(expected, QuantityParser.Parse(f.Fix!.Value, Dimension.Capacitance).Typ);
    }

    [Fact]
    public void Says_no_capacitor_helps_when_the_parasitic_alone_keeps_the_noise_gain_low()
    {
        // 1 + 10 pF/(Cf + 3 pF) < 1 + 10/3 = 4.3 < 5 for any Cf ≥ 0.
        var f = Lint.Check(Channel("[|1 pF|]", cpar: "3 pF")).SingleAtMark(Id, Severity.Error);

        Assert.Null(f.Fix);
        Assert.Contains("No standard Cf reaches it", f.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Names_the_rule_that_rejects_the_capacitor_that_would_reach_the_minimum()
    {
        // Cf ≤ Cin/(Gmin − 1) = 2.5 pF reaches the minimum (references.md §3.4); on the exact model 2.2 pF leaves
        // 73.3° of phase margin and 2.7 pF 78.2°, so a 75° floor rejects every value that would reach it.
        var f = Lint.Check(Channel("2.7 pF"), "rules:\n  phase-margin: { floor: 75 deg }").Single(Id);

        Assert.Null(f.Fix);
        Assert.Contains("Cf = 2.2 pF would reach it, but phase-margin rejects it (phase margin ≥ 75°)", f.Message, StringComparison.Ordinal);
    }
}
