using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests;

public sealed class HazardousVoltageRuleTests
{
    private const string Id = "high-voltage";

    private static string Channel(string positive, string negative = "0 V", string bias = "1 V") => $$"""
        {{Parts.Header}}
        conditions: { temperature: 25 °C, supply: { positive: {{positive}}, negative: {{negative}} } }
        bias: {{bias}}
        input: { type: photodiode, capacitance: 10 pF, current: { min: 10 µA, max: 100 µA } }
        {{Parts.IdealAmp}}
        feedback:
          resistance: 10 kΩ
          capacitance: 3.3 pF
        """;

    [Fact]
    public void Stays_quiet_just_below_60_volts()
    {
        // 60 V DC: the usual low-voltage safety limit (DESIGN §7; common practice).
        Lint.Check(Channel("59.9 V")).Clean(Id);
    }

    [Fact]
    public void Cautions_at_60_volts_on_the_positive_supply()
    {
        var f = Lint.Check(Channel("[|60 V|]")).SingleAtMark(Id, Severity.Warning);

        Assert.Equal("/conditions/supply/positive", f.Pointer);
        Assert.Contains("local codes and licensed practice", f.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Cautions_on_a_negative_supply_by_its_magnitude()
    {
        Lint.Check(Channel("5 V", negative: "[|-60 V|]")).SingleAtMark(Id, Severity.Warning);
    }

    [Fact]
    public void Cautions_on_the_bias()
    {
        var r = Lint.Check(Channel("100 V", bias: "[|70 V|]"));

        var f = r.Of(Id).Single(f => f.Pointer == "/bias");
        Assert.Equal(r.Spec.Mark, (f.Line, f.Column));
        Assert.Equal(2, r.Of(Id).Count);
    }

    [Fact]
    public void Judges_the_top_of_the_supply_tolerance()
    {
        // 58 V ±5% reaches 60.9 V.
        Lint.Check(Channel("[|58 V ±5%|]")).SingleAtMark(Id, Severity.Warning);
    }

    [Theory]
    [InlineData("48 V", true)]
    [InlineData("50.1 V", false)]
    public void Takes_the_threshold_from_configuration(string threshold, bool flagged)
    {
        var r = Lint.Check(Channel("50 V"), $"rules:\n  high-voltage: {{ threshold: {threshold} }}");

        Assert.Equal(flagged, r.Of(Id).Count == 1);
    }

    [Fact]
    public void Uses_the_configured_severity_and_can_be_turned_off()
    {
        var spec = Channel("[|60 V|]");

        Lint.Check(spec, "rules:\n  high-voltage: { severity: note }").SingleAtMark(Id, Severity.Note);
        Lint.Check(spec, "rules:\n  high-voltage: { severity: off }").Clean(Id);
    }
}
