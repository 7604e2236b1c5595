namespace SpecLint.Analyzers.Tests;

public sealed class DecibelScaleTests
{
    [Fact]
    public Task Flags_wrong_log_factors_and_dB_used_as_a_ratio() => Verify.Analyzer<DecibelScaleAnalyzer>("""
        class C
        {
            void M(Gain aol, Power p, Power p0, Voltage v, Voltage v0)
            {
                var a = Math.Pow(10, {|SLU0007:aol.Decibels / 10|});
                var b = {|SLU0007:20 * Math.Log10(p / p0)|};
                var c = {|SLU0007:Math.Log10(v.Volts / v0.Volts) * 10|};
                var d = new Gain({|SLU0007:aol.Decibels|});
                var e = Gain.FromDecibels({|SLU0007:aol.Linear|});
                var f = {|SLU0007:20 * Math.Log10(v.Volts * v.Volts)|};
            }
        }
        """);

    [Fact]
    public Task Stays_silent_on_the_right_factors_and_unknown_origins() => Verify.Analyzer<DecibelScaleAnalyzer>("""
        class C
        {
            void M(Gain aol, Power p, Power p0, Voltage v, Voltage v0, double x)
            {
                var a = Math.Pow(10, aol.Decibels / 20);
                var b = 10 * Math.Log10(p / p0);
                var c = 20 * Math.Log10(v.Volts / v0.Volts);
                var d = Gain.FromDecibels(aol.Decibels);
                var e = new Gain(aol.Linear);
                var f = Math.Pow(10, x / 10);
                var g = 20 * Math.Log10(x);
            }
        }
        """);

    [Fact]
    public Task Fix_converts_a_voltage_gain_with_twenty() => Verify.Fix<DecibelScaleAnalyzer>(
        "class C { double M(Gain aol) => Math.Pow(10, {|SLU0007:aol.Decibels / 10|}); }",
        "class C { double M(Gain aol) => Math.Pow(10, aol.Decibels / 20); }");

    [Fact]
    public Task Fix_takes_ten_log_of_a_power() => Verify.Fix<DecibelScaleAnalyzer>(
        "class C { double M(Power p, Power p0) => {|SLU0007:20 * Math.Log10(p / p0)|}; }",
        "class C { double M(Power p, Power p0) => 10 * Math.Log10(p / p0); }");

    [Fact]
    public Task Fix_builds_a_gain_from_dB() => Verify.Fix<DecibelScaleAnalyzer>(
        "class C { Gain M(Gain aol) => new Gain({|SLU0007:aol.Decibels|}); }",
        "class C { Gain M(Gain aol) => Gain.FromDecibels(aol.Decibels); }");
}
