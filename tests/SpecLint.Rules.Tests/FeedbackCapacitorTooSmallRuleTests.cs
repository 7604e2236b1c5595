using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests;

public sealed class FeedbackCapacitorTooSmallRuleTests
{
    private const string Id = "feedback-capacitor-size";

    private static string Channel(string feedback) => $$"""
        {{Parts.Header}}
        conditions: { temperature: 25 °C, supply: { positive: 15 V, negative: -15 V } }
        bias: 0 V
        input: { type: photodiode, capacitance: 10 pF, current: { min: 1 nA, max: 10 nA } }
        {{Parts.IdealAmp}}
        feedback:
        {{feedback}}
        """;

    [Fact]
    public void Accepts_a_capacitor_at_the_minimum_with_a_small_parasitic()
    {
        // 0.2/(0.5 + 0.2) = 29 % ≤ 30 %.
        Lint.Check(Channel("  resistance: 100 MΩ\n  capacitance: 0.5 pF\n  parasitic-capacitance: 0.2 pF")).Clean(Id);
    }

    [Fact]
    public void Flags_a_capacitor_below_the_minimum_at_its_value()
    {
        var f = Lint.Check(Channel("  resistance: 100 MΩ\n  capacitance: [|0.47 pF|]")).SingleAtMark(Id, Severity.Warning);

        Assert.Equal("/feedback/capacitance", f.Pointer);
    }

    [Fact]
    public void Flags_a_parasitic_share_above_the_limit()
    {
        // 0.25/(0.5 + 0.25) = 33 % > 30 %.
        var f = Lint.Check(Channel("  resistance: 100 MΩ\n  capacitance: [|0.5 pF|]\n  parasitic-capacitance: 0.25 pF")).SingleAtMark(Id, Severity.Warning);

        Assert.Contains("33%", f.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Flags_a_parasitic_only_design_at_the_feedback_block()
    {
        // No capacitance key: the finding falls back to the feedback block and points at its key.
        var spec = Channel("  resistance: 100 MΩ\n  parasitic-capacitance: 0.2 pF").Replace("\nfeedback:", "\n[|feedback|]:", StringComparison.Ordinal);
        var f = Lint.Check(spec).SingleAtMark(Id, Severity.Warning);

        Assert.Equal("/feedback", f.Pointer);
        Assert.Contains("only the 0.2 pF parasitic", f.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("min: 0.3 pF", "capacitance: 0.47 pF", false)]
    [InlineData("min: 1 pF", "capacitance: 0.82 pF", true)]
    [InlineData("max-parasitic-share: 50 %", "capacitance: 0.5 pF\n  parasitic-capacitance: 0.25 pF", false)]
    [InlineData("max-parasitic-share: 10 %", "capacitance: 1 pF\n  parasitic-capacitance: 0.2 pF", true)]
    public void Takes_the_thresholds_from_configuration(string option, string feedback, bool flagged)
    {
        var r = Lint.Check(Channel("  resistance: 100 MΩ\n  " + feedback), $"rules:\n  feedback-capacitor-size: {{ {option} }}");

        Assert.Equal(flagged, r.Of(Id).Count == 1);
    }

    [Fact]
    public void Uses_the_configured_severity_and_can_be_turned_off()
    {
        var spec = Channel("  resistance: 100 MΩ\n  capacitance: [|0.47 pF|]");

        Lint.Check(spec, "rules:\n  feedback-capacitor-size: { severity: error }").SingleAtMark(Id, Severity.Error);
        Lint.Check(spec, "rules:\n  feedback-capacitor-size: { severity: off }").Clean(Id);
    }
}
