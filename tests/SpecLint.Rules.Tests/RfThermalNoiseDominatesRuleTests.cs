using System.Globalization;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests;

public sealed class RfThermalNoiseDominatesRuleTests
{
    private const string Id = "thermal-vs-shot-noise";

    private const double Hottest = 273.15 + 60;

    private static string Channel(string imin, string rf = "[|1 MΩ ±1%|]", string imax = "1 µA", string temperature = "-10 °C .. 60 °C", string supply = "15 V") => $$"""
        {{Parts.Header}}
        conditions: { temperature: {{temperature}}, supply: { positive: {{supply}}, negative: -{{supply}} } }
        bias: 0 V
        input: { type: photodiode, capacitance: 10 pF, current: { min: {{imin}}, max: {{imax}} } }
        {{Parts.IdealAmp}}
        feedback:
          resistance: {{rf}}
          capacitance: 2.2 pF
        """;

    private static string Nanoamps(double amperes) => string.Create(CultureInfo.InvariantCulture, $"{amperes * 1e9:0.000} nA");

    [Theory]
    [InlineData(1.01, false)]
    [InlineData(0.99, true)]
    public void Draws_the_line_at_Imin_times_Rf_equal_to_2kT_over_q_at_the_hottest_temperature(double factor, bool flagged)
    {
        // Imin·Rf = 2kT/q at 60 °C, with CODATA k and q (references.md §1 row 11 and [C]).
        var boundary = Reference.TwoKtOverQ(Hottest) / 1e6;

        var r = Lint.Check(Channel(Nanoamps(boundary * factor)));

        if (flagged)
        {
            var f = r.SingleAtMark(Id, Severity.Warning);
            Assert.Equal("/feedback/resistance", f.Pointer);
        }
        else
        {
            r.Clean(Id);
        }
    }

    [Fact]
    public void Judges_at_the_hottest_temperature_not_at_25_degrees()
    {
        // Halfway between 2kT/q at 25 °C (51.4 mV) and at 60 °C (57.4 mV), per MΩ: shot-limited at room
        // temperature, Rf-limited at the hot end.
        var imin = (Reference.TwoKtOverQ(298.15) + Reference.TwoKtOverQ(Hottest)) / 2 / 1e6;

        Lint.Check(Channel(Nanoamps(imin), temperature: "25 °C")).Clean(Id);
        var f = Lint.Check(Channel(Nanoamps(imin))).SingleAtMark(Id, Severity.Warning);
        Assert.Contains("at 60 °C", f.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("2", "80 nA", true)]
    [InlineData("0.5", "40 nA", false)]
    public void Takes_the_ratio_from_configuration(string minRatio, string imin, bool flagged)
    {
        // 80 nA·1 MΩ = 80 mV = 1.39 × 57.4 mV (< 2); 40 nA·1 MΩ = 0.70 × 57.4 mV (≥ 0.5).
        var r = Lint.Check(Channel(imin), $$"""
            rules:
              thermal-vs-shot-noise: { min-ratio: {{minRatio}} }
            """);

        Assert.Equal(flagged, r.Of(Id).Count == 1);
    }

    [Fact]
    public void Uses_the_configured_severity_and_can_be_turned_off()
    {
        var spec = Channel("10 nA");

        Lint.Check(spec, "rules:\n  thermal-vs-shot-noise: { severity: error }").SingleAtMark(Id, Severity.Error);
        Lint.Check(spec, "rules:\n  thermal-vs-shot-noise: { severity: off }").Clean(Id);
    }

    [Fact]
    public void Suggests_the_smallest_E96_resistor_that_is_shot_noise_limited_and_it_is()
    {
        var r = Lint.Check(Channel("1 nA", rf: "100 kΩ ±1%", imax: "5 nA", temperature: "25 °C", supply: "5 V"));
        var f = r.Single(Id);

        r.ApplyFixAndRecheck(f);

        // Independent: Rf ≥ (2kT/q)/Imin at 25 °C = 51.4 MΩ, snapped up to E96 (references.md §3.4); 5 nA·R fits in 5 V.
        var expected = Reference.AtOrAbove(Reference.E96, Reference.TwoKtOverQ(298.15) / 1e-9);
        Reference.AssertClose(expected, QuantityParser.Parse(f.Fix!.Value, Dimension.Resistance).Typ);
    }

    [Fact]
    public void Says_no_resistor_works_when_the_one_needed_would_clip()
    {
        // Rf ≥ 51.4 mV/1 nA = 51.4 MΩ would put 1 µA full scale at 51 V, far beyond a 5 V rail.
        var r = Lint.Check(Channel("1 nA", rf: "[|100 kΩ ±1%|]", temperature: "25 °C", supply: "5 V"));

        var f = r.SingleAtMark(Id, Severity.Warning);
        Assert.Null(f.Fix);
        Assert.Contains("no such standard value keeps the full-scale output inside the rails", f.Message, StringComparison.Ordinal);
        // The ratio Imin·Rf/(2kT/q) = 100 µV/51.4 mV is stated, not rounded away to "0×".
        var ratio = 1e-9 * 100e3 / Reference.TwoKtOverQ(298.15);
        Assert.Contains(string.Create(CultureInfo.InvariantCulture, $"is {ratio:G3}× 2kT/q"), f.Message, StringComparison.Ordinal);
    }
}
