using System.Globalization;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests;

public sealed class SlewRateTooLowRuleTests
{
    private const string Id = "slew-rate";

    // Full-scale step ΔV = Imax·Rf = 4 µA · 1 MΩ = 4 V (no dark current, no DC errors); at 200 kHz a sine of
    // that amplitude needs 2π·f·ΔV (common practice; Franco ch. 6 full-power bandwidth, from memory).
    private const double Needed = 2 * Math.PI * 200e3 * 4.0;

    private static string Channel(string slewRate, string requirements = "requirements: { bandwidth: 200 kHz }") => $$"""
        {{Parts.Header}}
        conditions: { temperature: 25 °C, supply: { positive: 15 V, negative: -15 V } }
        bias: 0 V
        input: { type: photodiode, capacitance: 10 pF, current: { min: 1 µA, max: 4 µA } }
        amplifier:
          gbw: 100 MHz
          voltage-noise: 10 nV/√Hz
          current-noise: 1 fA/√Hz
          input-capacitance: { common-mode: 0 pF, differential: 0 pF }
          bias-current: 0 A
          offset-voltage: 0 V
          output-swing: { to-negative: 0 V, to-positive: 0 V }
          slew-rate: {{slewRate}}
        feedback:
          resistance: 1 MΩ
          capacitance: 0.68 pF
        {{requirements}}
        """;

    private static string VoltsPerMicrosecond(double vPerS) => string.Create(CultureInfo.InvariantCulture, $"{vPerS / 1e6:0.000} V/µs");

    [Fact]
    public void Accepts_an_op_amp_just_fast_enough()
    {
        Lint.Check(Channel(VoltsPerMicrosecond(Needed * 1.02))).Clean(Id);
    }

    [Fact]
    public void Flags_an_op_amp_just_too_slow_at_its_slew_rate()
    {
        var f = Lint.Check(Channel("[|" + VoltsPerMicrosecond(Needed * 0.98) + "|]")).SingleAtMark(Id, Severity.Warning);

        Assert.Equal("/amplifier/slew-rate", f.Pointer);
        Assert.Contains("5.03 V/µs", f.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Uses_the_computed_bandwidth_without_a_requirement()
    {
        var r = Lint.Check(Channel("[|0.1 V/µs|]", requirements: ""));

        var bw = r.Outcome.Analysis!.Bandwidth!.Value.Hertz;
        var needed = 2 * Math.PI * bw * 4.0;
        Assert.True(needed > 0.1e6);
        Assert.Contains("computed", r.SingleAtMark(Id, Severity.Warning).Message, StringComparison.Ordinal);
        Lint.Check(Channel(VoltsPerMicrosecond(needed * 1.02), requirements: "")).Clean(Id);
    }

    [Fact]
    public void Checks_nothing_without_a_slew_rate()
    {
        var spec = Channel("1 V/µs").Replace("  slew-rate: 1 V/µs\n", "", StringComparison.Ordinal);

        Lint.Check(spec).Clean(Id);
    }

    [Fact]
    public void Uses_the_configured_severity_and_can_be_turned_off()
    {
        var spec = Channel("[|1 V/µs|]");

        Lint.Check(spec, "rules:\n  slew-rate: { severity: error }").SingleAtMark(Id, Severity.Error);
        Lint.Check(spec, "rules:\n  slew-rate: { severity: off }").Clean(Id);
    }
}
