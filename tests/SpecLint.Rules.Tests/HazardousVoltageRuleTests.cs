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

    // The 60 V DC threshold is the limit the rule page names from IEC 62368-1 (ES1) and IEC 61010-1
    // (hazardous live, normal conditions); both limits from memory, see docs/references.md [IEC62368], [IEC61010].
    [Fact]
    public void Stays_quiet_just_below_60_volts()
    {
        Lint.Check(Channel("59.9 V")).Clean(Id);
    }

    [Fact]
    public void Cautions_on_plus_and_minus_35_volt_rails_for_the_70_volts_between_them()
    {
        var f = Lint.Check(Channel("[|35 V|]", negative: "-35 V", bias: "0 V")).SingleAtMark(Id, Severity.Warning);

        Assert.Equal("/conditions/supply/positive", f.Pointer);
        Assert.Contains("rail to rail 70 V", f.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("positive rail to ground", f.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Stays_quiet_on_plus_and_minus_29_volt_rails()
    {
        Lint.Check(Channel("29.9 V", negative: "-29.9 V", bias: "0 V")).Clean(Id);
    }

    [Fact]
    public void Cautions_on_the_voltage_between_the_bias_and_a_rail()
    {
        // 40 V of detector bias against a −25 V rail: 65 V across the board, neither node 60 V from ground.
        var f = Lint.Check(Channel("5 V", negative: "-25 V", bias: "[|40 V|]")).SingleAtMark(Id, Severity.Warning);

        Assert.Equal("/bias", f.Pointer);
        Assert.Contains("the bias to the negative rail 65 V", f.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Gives_one_caution_per_spec_listing_every_voltage_over_the_threshold()
    {
        var r = Lint.Check(Channel("100 V", negative: "-100 V", bias: "70 V"));

        var f = r.Single(Id);
        Assert.Equal("/conditions/supply/positive", f.Pointer);
        foreach (var part in new[] { "the positive rail to ground 100 V", "the negative rail to ground 100 V", "the bias to ground 70 V", "rail to rail 200 V", "the bias to the negative rail 170 V" })
        {
            Assert.Contains(part, f.Message, StringComparison.Ordinal);
        }

        Assert.DoesNotContain("safe to touch", f.Message, StringComparison.Ordinal);
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
        var f = Lint.Check(Channel("5 V", bias: "[|70 V|]")).SingleAtMark(Id, Severity.Warning);

        Assert.Equal("/bias", f.Pointer);
        Assert.Contains("the bias to ground 70 V", f.Message, StringComparison.Ordinal);
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
