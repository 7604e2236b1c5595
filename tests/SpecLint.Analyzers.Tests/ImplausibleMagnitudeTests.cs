namespace SpecLint.Analyzers.Tests;

public sealed class ImplausibleMagnitudeTests
{
    [Fact]
    public Task Flags_picofarad_and_megaohm_numbers_given_in_SI_units() => Verify.Analyzer<ImplausibleMagnitudeAnalyzer>("""
        class C
        {
            Capacitance Cf => {|SLU0001:new Capacitance(2.2)|};
            Resistance Rf => {|SLU0001:Resistance.FromOhms(4.7e-6)|};
            SlewRate Sr => {|SLU0001:SlewRate.FromSi(10)|};
            Angle Pm => {|SLU0001:new Angle(45)|};
            Temperature T => {|SLU0001:new Temperature(25)|};
            Capacitance Twice => {|SLU0001:Capacitance.FromPicofarads(2.2e-12)|};
        }
        """);

    [Fact]
    public Task Stays_silent_on_plausible_literals_computed_values_and_unchecked_quantities() => Verify.Analyzer<ImplausibleMagnitudeAnalyzer>("""
        class C
        {
            Capacitance A => Capacitance.FromPicofarads(2.2);
            Capacitance B => new Capacitance(2.2e-12);
            Capacitance Z => new Capacitance(0);
            Resistance R => Resistance.FromMegaohms(4.7);
            Voltage V => new Voltage(-2.5);
            Temperature T => Temperature.FromCelsius(25);
            Angle P => Angle.FromDegrees(45);
            Gain G => new Gain(1e6);
            Capacitance Computed(double pf) => new Capacitance(pf);
            double NotAQuantity => Math.Sqrt(2.2);
        }
        """);

    [Fact]
    public Task Fix_reads_the_number_with_the_usual_prefix() => Verify.Fix<ImplausibleMagnitudeAnalyzer>(
        "class C { Capacitance Cf => {|SLU0001:new Capacitance(2.2)|}; }",
        "class C { Capacitance Cf => Capacitance.FromPicofarads(2.2); }");

    [Fact]
    public Task Fix_offers_the_other_plausible_prefixes_too() => Verify.Fix<ImplausibleMagnitudeAnalyzer>(
        "class C { Capacitance Cf => {|SLU0001:new Capacitance(2.2)|}; }",
        "class C { Capacitance Cf => Capacitance.FromNanofarads(2.2); }",
        actionIndex: 1);

    [Fact]
    public Task Fix_keeps_the_mantissa_of_an_exponent_literal() => Verify.Fix<ImplausibleMagnitudeAnalyzer>(
        "class C { Resistance Rf => {|SLU0001:Resistance.FromOhms(4.7e-6)|}; }",
        "class C { Resistance Rf => Resistance.FromMegaohms(4.7); }");
}
