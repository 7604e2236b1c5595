using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Tolerance;

public sealed class DielectricTests
{
    private static (double Low, double High) Factors(string code, double lowCelsius, double highCelsius)
    {
        Assert.True(Dielectric.TryParse(code, out var d), code);
        return d.TemperatureFactors(Temperature.FromCelsius(lowCelsius), Temperature.FromCelsius(highCelsius));
    }

    [Fact]
    public void C0G_over_its_rated_range_moves_about_three_tenths_of_a_percent()
    {
        // references.md §3.6 (EIA-198, from memory): 0 ± 30 ppm/K, ≈ ±0.3 % at 100 K from 25 °C; 125 °C is the far end.
        var (lo, hi) = Factors("C0G", -55, 125);
        Assert.Equal(0.997, lo, 1e-12);
        Assert.Equal(1.003, hi, 1e-12);
    }

    [Fact]
    public void C0G_is_scaled_by_the_distance_from_25_degrees_to_the_farther_end()
    {
        // references.md §3.6: 30 ppm/K × 35 K (−10 °C is 35 K from 25 °C, 60 °C also 35 K).
        var (lo, hi) = Factors("C0G", -10, 60);
        Assert.Equal(1 - (30e-6 * 35), lo, 1e-12);
        Assert.Equal(1 + (30e-6 * 35), hi, 1e-12);
    }

    [Fact]
    public void NP0_and_the_misspelling_NPO_read_as_C0G()
    {
        // references.md §3.6: C0G (NP0); NPO with a letter O is a common misspelling (common practice).
        Assert.Equal(Factors("C0G", 0, 85), Factors("NP0", 0, 85));
        Assert.Equal(Factors("C0G", 0, 85), Factors("npo", 0, 85));
    }

    [Theory]
    [InlineData("X7R", 0.85, 1.15)] // references.md §3.6: X7R ±15 %.
    [InlineData("X5R", 0.85, 1.15)] // references.md §3.6: X5R ±15 %.
    [InlineData("Y5V", 0.18, 1.22)] // references.md §3.6: Y5V +22 % / −82 %.
    [InlineData("Z5U", 0.44, 1.22)] // references.md §3.6 code letters: U = +22/−56 %.
    [InlineData("X6S", 0.78, 1.22)] // references.md §3.6 code letters: S = ±22 %.
    [InlineData("X7T", 0.67, 1.22)] // EIA-198 T = +22/−33 % (from memory).
    public void Class_2_codes_use_their_full_change_as_the_bound(string code, double low, double high)
    {
        Assert.True(Dielectric.TryParse(code, out var d));
        Assert.Equal(2, d.Class);
        var (lo, hi) = d.TemperatureFactors(Temperature.FromCelsius(20), Temperature.FromCelsius(30));
        Assert.Equal(low, lo, 1e-12);
        Assert.Equal(high, hi, 1e-12);
    }

    [Fact]
    public void Class_2_letters_give_the_rated_temperature_range()
    {
        // references.md §3.6 code letters: X = −55 °C, Y = −30 °C; 5 = +85 °C, 7 = +125 °C.
        Assert.True(Dielectric.TryParse("Y5V", out var y5v));
        Assert.Equal(-30, y5v.RatedLow.Celsius, 1e-9);
        Assert.Equal(85, y5v.RatedHigh.Celsius, 1e-9);
        Assert.True(Dielectric.TryParse("X7R", out var x7r));
        Assert.True(x7r.IsRatedFor(Temperature.FromCelsius(-55), Temperature.FromCelsius(125)));
        Assert.False(y5v.IsRatedFor(Temperature.FromCelsius(-40), Temperature.FromCelsius(85)));
    }

    [Theory]
    [InlineData("U2J", -750, 120)] // EIA-198 class 1: U = 7.5, 2 = −100, J = ±120 ppm/K (from memory).
    [InlineData("P2H", -150, 60)] // EIA-198 class 1: P = 1.5, 2 = −100, H = ±60 ppm/K (from memory).
    [InlineData("C0G", 0, 30)] // references.md §3.6: 0 ± 30 ppm/K.
    public void Class_1_codes_give_their_coefficient_and_tolerance(string code, double ppm, double tolerance)
    {
        Assert.True(Dielectric.TryParse(code, out var d));
        Assert.Equal(1, d.Class);
        Assert.Equal(ppm, d.CoefficientPpmPerKelvin, 1e-9);
        Assert.Equal(tolerance, d.CoefficientTolerancePpmPerKelvin, 1e-9);
    }

    [Fact]
    public void A_class_1_coefficient_moves_the_capacitance_in_its_own_direction()
    {
        // U2J −750 ± 120 ppm/K (from memory): at 85 °C, 60 K above 25 °C, −870..−630 ppm/K × 60 K; colder ends rise.
        var (lo, hi) = Factors("U2J", 25, 85);
        Assert.Equal(1 - (870e-6 * 60), lo, 1e-12);
        Assert.Equal(1, hi, 1e-12);
    }

    [Fact]
    public void At_25_degrees_alone_nothing_moves()
    {
        Assert.Equal((1.0, 1.0), Factors("Y5V", 25, 25));
        Assert.Equal((1.0, 1.0), Factors("C0G", 25, 25));
    }

    [Theory]
    [InlineData("ABC")]
    [InlineData("X7")]
    [InlineData("X3R")]
    [InlineData("")]
    [InlineData(null)]
    public void Unknown_codes_are_not_parsed(string? code)
    {
        Assert.False(Dielectric.TryParse(code, out _));
    }
}
