using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests.Engine;

public sealed class WaiverTests
{
    // The worked example of references.md §3.2 with Cf = 0.5 pF: phase margin 23°, below the 45° floor.
    private static string Channel(string waivers) => $$"""
        {{Parts.Header}}
        conditions: { temperature: 25 °C, supply: { positive: 15 V, negative: -15 V } }
        bias: 0 V
        input: { type: photodiode, capacitance: 100 pF, current: { min: 1 µA, max: 10 µA } }
        {{Parts.IdealAmp}}
        feedback:
          resistance: 1 MΩ
          capacitance: 0.5 pF
        waivers:
        {{waivers}}
        """;

    private static CheckRun Run(LintResult r) => new([r.Outcome], [], Severity.Error, []);

    [Fact]
    public void A_live_waiver_marks_the_finding_waived_with_its_reason_and_keeps_it()
    {
        var r = Lint.Check(Channel("""
              - rule: phase-margin
                reason: accepted for the prototype run
                expires: 2027-03-31
            """));

        var f = r.Single("phase-margin");
        Assert.True(f.Waived);
        Assert.Equal("accepted for the prototype run", f.WaiverReason);
        Assert.Equal(Severity.Error, f.Severity);
        Assert.DoesNotContain(r.Findings, x => x.RuleId is RuleIds.WaiverExpired or RuleIds.WaiverUnmatched);
        Assert.DoesNotContain(r.Findings, x => x.Severity == Severity.Error && !x.Waived);
        Assert.Equal(ExitCodes.Clean, Run(r).ExitCode);
    }

    [Fact]
    public void A_waiver_holds_through_its_expiry_day()
    {
        var r = Lint.Check(Channel($"""
              - rule: phase-margin
                reason: last day
                expires: {Lint.Today:yyyy-MM-dd}
            """));

        Assert.True(r.Single("phase-margin").Waived);
    }

    [Fact]
    public void An_expired_waiver_is_an_error_at_its_date_and_waives_nothing()
    {
        var r = Lint.Check(Channel($"""
              - rule: phase-margin
                reason: accepted for the prototype run
                expires: [|{Lint.Today.AddDays(-1):yyyy-MM-dd}|]
            """));

        var expired = r.SingleAtMark(RuleIds.WaiverExpired, Severity.Error);
        Assert.Contains("phase-margin", expired.Message, StringComparison.Ordinal);
        Assert.False(r.Single("phase-margin").Waived);
        Assert.Equal(ExitCodes.FindingsAtFailLevel, Run(r).ExitCode);
    }

    [Fact]
    public void A_waiver_that_matches_nothing_is_a_warning_at_its_rule()
    {
        var r = Lint.Check(Channel("""
              - rule: [|slew-rate|]
                reason: no longer needed
                expires: 2027-03-31
            """));

        var f = r.SingleAtMark(RuleIds.WaiverUnmatched, Severity.Warning);
        Assert.Contains("matches no finding", f.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_waiver_naming_an_unknown_rule_suggests_the_closest_id()
    {
        var r = Lint.Check(Channel("""
              - rule: [|phase-margn|]
                reason: typo
                expires: 2027-03-31
            """));

        var f = r.SingleAtMark(RuleIds.WaiverUnmatched, Severity.Warning);
        Assert.Contains("did you mean 'phase-margin'?", f.Message, StringComparison.Ordinal);
        Assert.False(r.Single("phase-margin").Waived);
    }
}
