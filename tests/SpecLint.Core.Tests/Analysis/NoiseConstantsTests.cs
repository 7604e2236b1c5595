using SpecLint.Core.Analysis;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Analysis;

/// <summary>references.md §3.1: Johnson, shot and thermal-voltage check values, evaluated through the model.</summary>
public sealed class NoiseConstantsTests
{
    private static readonly Frequency Low = new(1);

    // A TIA whose output noise below any pole is exactly the source density times Rf: an op-amp so fast and
    // with so much gain that |Zt(1 Hz)| = Rf to better than 1e-9.
    private static Circuit Ideal(double rfOhm, double kelvin) => new()
    {
        Rf = new Resistance(rfOhm),
        Gbw = new Frequency(1e12),
        A0 = new Gain(1e15),
        Temperature = new Temperature(kelvin),
    };

    [Theory]
    // √(4kTR) of 1 kΩ: 4.0704 nV/√Hz at 300 K, 4.0019 at 290 K, 4.0363 at 295 K — references.md §3.1, [J][N] with CODATA 2018 [C].
    [InlineData(300, 4.0704e-9)]
    [InlineData(290, 4.0019e-9)]
    [InlineData(295, 4.0363e-9)]
    public void Johnson_noise_of_1_kiloohm_at_the_output(double kelvin, double expectedVoltsPerRootHertz)
    {
        var psd = new TiaModel(Ideal(1e3, kelvin)).OutputNoise(Low).RfThermal;
        Assert.Equal(expectedVoltsPerRootHertz, Math.Sqrt(psd), 0.00005e-9);
    }

    [Fact]
    public void Johnson_current_noise_of_1_gigaohm()
    {
        var c = Ideal(1e9, 300);
        var m = new TiaModel(c);
        var inputReferred = Math.Sqrt(m.OutputNoise(Low).RfThermal) / m.Transimpedance(Low).Magnitude;

        // √(4kT/R) = 4.0704 fA/√Hz at 300 K: references.md §3.1, [J][N], [C].
        Assert.Equal(4.0704e-15, inputReferred, 0.00005e-15);
    }

    [Theory]
    // √(2qI): 0.56607 pA/√Hz at 1 µA, 17.9007 pA/√Hz at 1 mA, 5.6607 fA/√Hz at 100 pA — references.md §3.1, [S], [C].
    [InlineData(1e-6, 0.56607e-12, 0.000005e-12)]
    [InlineData(1e-3, 17.9007e-12, 0.00005e-12)]
    [InlineData(100e-12, 5.6607e-15, 0.00005e-15)]
    public void Shot_noise_of_the_minimum_current(double amperes, double expected, double tolerance)
    {
        var m = new TiaModel(Ideal(1e3, 300) with { Imin = new Current(amperes) });
        var inputReferred = Math.Sqrt(m.OutputNoise(Low).Shot) / m.Transimpedance(Low).Magnitude;
        Assert.Equal(expected, inputReferred, tolerance);
    }

    [Fact]
    public void Shot_noise_counts_the_dark_current_too()
    {
        var m = new TiaModel(Ideal(1e3, 300) with { Imin = new Current(0.6e-6), Idark = new Current(0.4e-6) });
        var inputReferred = Math.Sqrt(m.OutputNoise(Low).Shot) / m.Transimpedance(Low).Magnitude;

        // 2q(Isig + Idark), references.md §4 item 11; 1 µA in total gives 0.56607 pA/√Hz (§3.1).
        Assert.Equal(0.56607e-12, inputReferred, 0.000005e-12);
    }

    [Theory]
    // kT/q = 25.852 mV at 300 K; 2kT/q = 51.704 mV (300 K), 50.842 mV (295 K), 53.453 mV (310.15 K) — references.md §3.1, [C].
    [InlineData(300, 51.704e-3)]
    [InlineData(295, 50.842e-3)]
    [InlineData(310.15, 53.453e-3)]
    public void Two_kT_over_q(double kelvin, double expectedVolts)
    {
        Assert.Equal(expectedVolts, 2 * PhysicalConstants.ThermalVoltage(new Temperature(kelvin)).Volts, 0.0005e-3);
    }

    [Fact]
    public void kT_over_q_at_300_K()
    {
        // 25.852 mV: references.md §3.1, [C].
        Assert.Equal(25.852e-3, PhysicalConstants.ThermalVoltage(new Temperature(300)).Volts, 0.0005e-3);
    }

    [Fact]
    public void Constants_are_the_exact_CODATA_2018_values()
    {
        // SI Brochure 9th ed. / CODATA 2018 [C]: exact by definition.
        Assert.Equal(1.380649e-23, PhysicalConstants.BoltzmannJoulesPerKelvin);
        Assert.Equal(1.602176634e-19, PhysicalConstants.ElementaryChargeCoulombs);
    }

    [Fact]
    public void Shot_to_thermal_ratio_is_one_at_two_kT_over_q()
    {
        // Imin·Rf = 2kT/q makes 2qI = 4kT/Rf (references.md §1 row 11): ratio 1 by construction of the definition.
        var t = new Temperature(300);
        var rf = 1e6;
        var imin = 2 * PhysicalConstants.ThermalVoltage(t).Volts / rf;
        var r = TiaAnalyzer.Analyze(Ideal(rf, 300) with { Imin = new Current(imin) }, AnalysisOptions.Default);
        Assert.Equal(1, r.ShotToRfThermalRatio, 1e-12);
        Assert.Equal(r.Noise!.Output.Shot.Volts, r.Noise.Output.RfThermal.Volts, 1e-12);
    }
}
