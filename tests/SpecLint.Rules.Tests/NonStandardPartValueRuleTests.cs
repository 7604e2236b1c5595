using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests;

public sealed class NonStandardPartValueRuleTests
{
    private const string Id = "standard-values";

    private static string Channel(string rf, string cf) => $$"""
        {{Parts.Header}}
        conditions: { temperature: 25 °C, supply: { positive: 15 V, negative: -15 V } }
        bias: 0 V
        input: { type: photodiode, capacitance: 10 pF, current: { min: 10 µA, max: 100 µA } }
        {{Parts.IdealAmp}}
        feedback:
          resistance: {{rf}}
          capacitance: {{cf}}
        """;

    // Series membership from references.md §3.4 (IEC 60063, values from memory): the tolerance picks the series.
    [Theory]
    [InlineData("4.3 kΩ ±5%", true)]        // E24 (the round(10^(i/24)) formula would give 4.2)
    [InlineData("4.3 kΩ ±10%", false)]      // not E12
    [InlineData("47.5 kΩ ±5%", false)]      // not E24
    [InlineData("47.5 kΩ ±1%", true)]       // E96
    [InlineData("8.2 kΩ ±10%", true)]       // E12
    [InlineData("3.01 kΩ ±1%", true)]       // E96
    [InlineData("3 kΩ ±1%", false)]         // E24 but not E96
    [InlineData("1.1 kΩ", true)]            // no tolerance: E96
    [InlineData("1.12 kΩ", false)]
    public void Agrees_with_the_IEC_60063_series_for_the_feedback_resistor(string rf, bool standard)
    {
        var r = Lint.Check(Channel("[|" + rf + "|]", "3.3 pF"));

        var ohms = QuantityParser.Parse(rf, Dimension.Resistance).Typ;
        var series = rf.Contains("±10%", StringComparison.Ordinal) ? Reference.E12 : rf.Contains("±5%", StringComparison.Ordinal) ? Reference.E24 : Reference.E96;
        Assert.Equal(standard, Reference.IsIn(series, ohms));
        if (standard)
        {
            r.Clean(Id);
        }
        else
        {
            var f = r.SingleAtMark(Id, Severity.Note);
            Assert.Equal("/feedback/resistance", f.Pointer);
            Reference.AssertClose(Reference.Nearest(series, ohms), QuantityParser.Parse(f.Fix!.Value, Dimension.Resistance).Typ);
        }
    }

    // Capacitor rows: E12/E24 lists of references.md §3.4 ([IEC60063], from memory).
    [Theory]
    [InlineData("2.7 pF ±10%", true)]
    [InlineData("2.5 pF ±10%", false)]
    [InlineData("2.4 pF ±5%", true)]
    [InlineData("1.02 pF ±1%", false)]     // capacitors stop at E24 whatever the tolerance (standard-values page)
    [InlineData("0.3 pF", true)]           // sub-picofarad 0.1 pF steps (common practice)
    [InlineData("0.25 pF", false)]
    public void Checks_the_feedback_capacitor_against_E12_or_E24(string cf, bool standard)
    {
        var r = Lint.Check(Channel("10 kΩ ±1%", "[|" + cf + "|]"));

        if (standard)
        {
            r.Clean(Id);
        }
        else
        {
            var f = r.SingleAtMark(Id, Severity.Note);
            Assert.Equal("/feedback/capacitance", f.Pointer);
            var farads = QuantityParser.Parse(cf, Dimension.Capacitance).Typ;
            var series = cf.Contains("±5%", StringComparison.Ordinal) || cf.Contains("±1%", StringComparison.Ordinal) ? Reference.E24 : Reference.E12;
            Reference.AssertClose(Reference.Nearest(series, farads), QuantityParser.Parse(f.Fix!.Value, Dimension.Capacitance).Typ);
        }
    }

    [Fact]
    public void Reports_the_resistor_and_the_capacitor_each_at_its_value()
    {
        var r = Lint.Check(Channel("[|47.5 kΩ ±5%|]", "[|2.5 pF ±10%|]"));

        var found = r.Of(Id);
        Assert.Equal(r.Spec.Marks, found.Select(f => (f.Line, f.Column)).ToList());
    }

    [Fact]
    public void Uses_the_configured_severity_and_can_be_turned_off()
    {
        var spec = Channel("[|47.5 kΩ ±5%|]", "3.3 pF");

        Lint.Check(spec, "rules:\n  standard-values: { severity: warning }").SingleAtMark(Id, Severity.Warning);
        Lint.Check(spec, "rules:\n  standard-values: { severity: off }").Clean(Id);
    }

    [Fact]
    public void Applying_the_suggested_value_makes_it_standard()
    {
        var r = Lint.Check(Channel("47.5 kΩ ±5%", "3.3 pF"));
        var f = r.Single(Id);

        r.ApplyFixAndRecheck(f);

        Assert.Equal("47 kΩ ±5%", f.Fix!.Value);
    }
}
