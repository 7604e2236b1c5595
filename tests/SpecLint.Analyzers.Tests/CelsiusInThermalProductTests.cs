namespace SpecLint.Analyzers.Tests;

public sealed class CelsiusInThermalProductTests
{
    [Fact]
    public Task Flags_celsius_beside_the_Boltzmann_constant() => Verify.Analyzer<CelsiusInThermalProductAnalyzer>("""
        class C
        {
            const double Boltzmann = 1.380649e-23;
            void M(Temperature t, Resistance r)
            {
                var a = Boltzmann * {|SLU0004:t.Celsius|};
                var b = Math.Sqrt(4 * PhysicalConstants.BoltzmannJoulesPerKelvin * {|SLU0004:t.Celsius|} * r.Ohms);
                var c = 1.38e-23 * {|SLU0004:t.Celsius|} / 1.602e-19;
            }
        }
        """);

    [Fact]
    public Task Stays_silent_on_kelvin_and_celsius_outside_a_kT_product() => Verify.Analyzer<CelsiusInThermalProductAnalyzer>("""
        class C
        {
            const double Boltzmann = 1.380649e-23;
            void M(Temperature t, Resistance r)
            {
                var a = Boltzmann * t.Kelvin;
                var b = 4 * PhysicalConstants.BoltzmannJoulesPerKelvin * t.Kelvin * r.Ohms;
                var rise = t.Celsius - 25;
                var scaled = 2 * t.Celsius;
                var sum = Boltzmann + t.Celsius;
            }
        }
        """);

    [Fact]
    public Task Fix_uses_kelvin() => Verify.Fix<CelsiusInThermalProductAnalyzer>(
        "class C { double M(Temperature t) => PhysicalConstants.BoltzmannJoulesPerKelvin * {|SLU0004:t.Celsius|}; }",
        "class C { double M(Temperature t) => PhysicalConstants.BoltzmannJoulesPerKelvin * t.Kelvin; }");
}
