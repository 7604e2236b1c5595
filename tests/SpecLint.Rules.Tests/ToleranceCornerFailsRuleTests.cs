using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests;

// The corner half of this rule needs tolerance corners, which CheckRunner does not compute yet (its delegate
// is null); those cases belong with the corners work. These tests cover the class 2 dielectric check.
public sealed class ToleranceCornerFailsRuleTests
{
    private const string Id = "capacitor-tolerance";

    private static string Channel(string dielectric) => $$"""
        {{Parts.Header}}
        conditions: { temperature: 25 °C, supply: { positive: 15 V, negative: -15 V } }
        bias: 0 V
        input: { type: photodiode, capacitance: 10 pF, current: { min: 10 µA, max: 100 µA } }
        {{Parts.IdealAmp}}
        feedback:
          resistance: 10 kΩ
          capacitance: 3.3 pF ±5%
          dielectric: {{dielectric}}
        """;

    // EIA-198 class codes (references.md §3.6, from memory): C0G/NP0 are class 1, X7R/X5R/Y5V class 2.
    [Theory]
    [InlineData("C0G")]
    [InlineData("NP0")]
    public void Accepts_a_class_1_dielectric(string dielectric)
    {
        Lint.Check(Channel(dielectric)).Clean(Id);
    }

    [Theory]
    [InlineData("X7R")]
    [InlineData("X5R")]
    [InlineData("Y5V")]
    public void Warns_about_a_class_2_dielectric_at_the_dielectric(string dielectric)
    {
        var f = Lint.Check(Channel("[|" + dielectric + "|]")).SingleAtMark(Id, Severity.Warning);

        Assert.Equal("/feedback/dielectric", f.Pointer);
        Assert.Contains("class 2", f.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Uses_the_configured_severity_and_can_be_turned_off()
    {
        var spec = Channel("[|X7R|]");

        Lint.Check(spec, "rules:\n  capacitor-tolerance: { severity: error }").SingleAtMark(Id, Severity.Error);
        Lint.Check(spec, "rules:\n  capacitor-tolerance: { severity: off }").Clean(Id);
    }

    [Fact]
    public void Suggests_C0G_and_the_warning_goes()
    {
        var r = Lint.Check(Channel("X7R"));
        var f = r.Single(Id);

        r.ApplyFixAndRecheck(f);

        Assert.Equal("C0G", f.Fix!.Value);
    }
}
