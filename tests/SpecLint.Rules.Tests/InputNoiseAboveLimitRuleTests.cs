using System.Globalization;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests;

public sealed class InputNoiseAboveLimitRuleTests
{
    private const string Id = "noise-floor";

    private static string Channel(string maxInput) => $$"""
        {{Parts.Header}}
        conditions: { temperature: 25 °C, supply: { positive: 15 V, negative: -15 V } }
        bias: 0 V
        input: { type: photodiode, capacitance: 10 pF, current: { min: 1 pA, max: 1 nA } }
        {{Parts.IdealAmp}}
        feedback:
          resistance: 1 GΩ
          capacitance: 1 pF
        requirements:
          noise: { band: 1 Hz .. 10 Hz, max-input: {{maxInput}} }
        """;

    /// <summary>
    /// Input-referred rms over 1–10 Hz by hand: S = 4kT/Rf [J][N] + 2q·Imin [S] + in², shaped by the feedback pole
    /// |ZT(f)/ZT(0)|² = 1/(1 + (f/fz)²), fz = 1/(2π·Rf·Cf) = 159 Hz, integrated in closed form (references.md §1 rows 8–10).
    /// The op-amp's e_n adds (en·NG/Rf)² ≈ 1e-34 A²/Hz, 1e-5 of the total, and the loop's own pole at ~MHz nothing.
    /// </summary>
    private static double HandInputRms()
    {
        const double t = 298.15, rf = 1e9, cf = 1e-12, imin = 1e-12, inoise = 1e-15;
        var s = (4 * Reference.K * t / rf) + (2 * Reference.Q * imin) + (inoise * inoise);
        var fz = 1 / (2 * Math.PI * rf * cf);
        return Math.Sqrt(s * fz * (Math.Atan(10 / fz) - Math.Atan(1 / fz)));
    }

    private static string Femtoamps(double amperes) => string.Create(CultureInfo.InvariantCulture, $"{amperes * 1e15:0.000} fA");

    [Fact]
    public void Accepts_noise_under_the_limit()
    {
        Lint.Check(Channel(Femtoamps(HandInputRms() * 1.02))).Clean(Id);
    }

    [Fact]
    public void Flags_noise_over_the_limit_at_the_limit()
    {
        var f = Lint.Check(Channel("[|" + Femtoamps(HandInputRms() * 0.98) + "|]")).SingleAtMark(Id, Severity.Error);

        Assert.Equal("/requirements/noise/max-input", f.Pointer);
        Assert.Contains("25 °C", f.Message, StringComparison.Ordinal);
        Assert.Contains("Rf's noise dominates", f.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Checks_nothing_without_a_limit()
    {
        var spec = Channel("1 fA").Replace(", max-input: 1 fA", "", StringComparison.Ordinal);

        Lint.Check(spec).Clean(Id);
    }

    [Fact]
    public void Uses_the_configured_severity_and_can_be_turned_off()
    {
        var spec = Channel("[|1 fA|]");

        Lint.Check(spec, "rules:\n  noise-floor: { severity: warning }").SingleAtMark(Id, Severity.Warning);
        Lint.Check(spec, "rules:\n  noise-floor: { severity: off }").Clean(Id);
    }

    [Fact]
    public void Offers_no_single_value_as_a_fix()
    {
        Assert.Null(Lint.Check(Channel("1 fA")).Single(Id).Fix);
    }
}
