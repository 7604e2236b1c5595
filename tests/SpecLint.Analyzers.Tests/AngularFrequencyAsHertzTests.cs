namespace SpecLint.Analyzers.Tests;

public sealed class AngularFrequencyAsHertzTests
{
    [Fact]
    public Task Flags_one_over_RC_and_root_LC_used_as_hertz() => Verify.Analyzer<AngularFrequencyAsHertzAnalyzer>("""
        class C
        {
            void M(Resistance r, Capacitance c, double l)
            {
                var f = Frequency.FromHertz({|SLU0006:1 / (r.Ohms * c.Farads)|});
                var g = new Frequency({|SLU0006:1 / Math.Sqrt(l * c.Farads)|});
                double poleHz = {|SLU0006:1.0 / (r.Ohms * c.Farads)|};
            }
        }
        """);

    [Fact]
    public Task Stays_silent_with_two_pi_in_rad_per_second_and_on_other_reciprocals() => Verify.Analyzer<AngularFrequencyAsHertzAnalyzer>("""
        class C
        {
            const double TwoPi = 2 * Math.PI;
            void M(Resistance r, Capacitance c, Frequency gbw)
            {
                var f = Frequency.FromHertz(1 / (2 * Math.PI * r.Ohms * c.Farads));
                var g = Frequency.FromHertz(1 / (TwoPi * r.Ohms * c.Farads));
                var h = Frequency.FromRadiansPerSecond(1 / (r.Ohms * c.Farads));
                double omega = 1 / (r.Ohms * c.Farads);
                double tauSeconds = r.Ohms * c.Farads;
                var k = Frequency.FromHertz(1 / (r.Ohms * 1e-3));
                var q = Frequency.FromHertz(Math.Sqrt(gbw.Hertz / (2 * Math.PI * r.Ohms * c.Farads)));
            }
        }
        """);

    [Fact]
    public Task Fix_builds_the_frequency_from_rad_per_second() => Verify.Fix<AngularFrequencyAsHertzAnalyzer>(
        "class C { Frequency M(Resistance r, Capacitance c) => Frequency.FromHertz({|SLU0006:1 / (r.Ohms * c.Farads)|}); }",
        "class C { Frequency M(Resistance r, Capacitance c) => Frequency.FromRadiansPerSecond(1 / (r.Ohms * c.Farads)); }");

    [Fact]
    public Task Fix_can_divide_by_two_pi_instead() => Verify.Fix<AngularFrequencyAsHertzAnalyzer>(
        "class C { Frequency M(Resistance r, Capacitance c) => Frequency.FromHertz({|SLU0006:1 / (r.Ohms * c.Farads)|}); }",
        "class C { Frequency M(Resistance r, Capacitance c) => Frequency.FromHertz(1 / (r.Ohms * c.Farads) / (2 * Math.PI)); }",
        actionIndex: 1);

    [Fact]
    public Task Fix_divides_a_hertz_variable_by_two_pi() => Verify.Fix<AngularFrequencyAsHertzAnalyzer>(
        "class C { void M(Resistance r, Capacitance c) { double poleHz = {|SLU0006:1 / (r.Ohms * c.Farads)|}; } }",
        "class C { void M(Resistance r, Capacitance c) { double poleHz = 1 / (r.Ohms * c.Farads) / (2 * Math.PI); } }");
}
