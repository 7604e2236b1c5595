using SpecLint.Core.Analysis;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Analysis;

/// <summary>The integrated noise: kT/C, the e_n noise-gain plateau, the band and accuracy on a peak.</summary>
public sealed class NoiseIntegrationTests
{
    [Fact]
    public void Rf_noise_of_an_ideal_TIA_is_kT_over_C()
    {
        // Rf = 1 GΩ, Cf = 1 pF at 300 K with an op-amp fast enough to be ideal. The kT/C value 64.358 µV and the
        // exact-model 64.355 µV over 1 µHz–1 MHz are references.md §3.1 ([MC]/[H], from memory). references.md does not
        // name its Rf: 1 GΩ reproduces the band-limited figure (the 1 MHz cut loses (2/π)·fc/fhi of the power).
        var c = new Circuit
        {
            Rf = new Resistance(1e9),
            Cf = new Capacitance(1e-12),
            Gbw = new Frequency(1e12),
            A0 = new Gain(1e12),
            Temperature = new Temperature(300),
        };
        var kTc = Math.Sqrt(PhysicalConstants.BoltzmannJoulesPerKelvin * 300 / 1e-12);
        Assert.Equal(64.358e-6, kTc, 0.0005e-6);

        var r = TiaAnalyzer.Analyze(c, AnalysisOptions.Default with
        {
            NoiseBandLow = new Frequency(1e-6),
            NoiseBandHigh = new Frequency(1e6),
        });
        Assert.Equal(64.355e-6, r.Noise!.Output.RfThermal.Volts, 0.0005e-6);
        Assert.False(r.Noise.BandIsDefault);
    }

    [Fact]
    public void Voltage_noise_gain_reaches_the_one_plus_Cin_over_Cf_plateau()
    {
        // Cin = 99 pF, Cf = 1 pF: plateau 100 (references.md §3.1, [G], [F] ch. 7); exact model at 1 MHz 99.81 (same
        // table). references.md does not give Rf and the op-amp; Rf = 1 MΩ, GBW = 1 GHz, A0 = 1e9 reproduce 99.81.
        var c = new Circuit
        {
            Rf = new Resistance(1e6),
            Cf = new Capacitance(1e-12),
            SensorCapacitance = new Capacitance(99e-12),
            Gbw = new Frequency(1e9),
            A0 = new Gain(1e9),
        };
        var ng = new TiaModel(c).NoiseGain(new Frequency(1e6)).Magnitude;
        Assert.Equal(99.81, ng, 0.005);
        Assert.Equal(100, TiaAnalyzer.Analyze(c, AnalysisOptions.WithoutNoise).NoiseGainHighFrequency, 1e-12);
    }

    [Fact]
    public void Default_band_is_1_Hz_to_ten_times_the_bandwidth_and_is_reported()
    {
        var r = TiaAnalyzer.Analyze(TestCircuits.Photodiode, AnalysisOptions.Default);
        Assert.True(r.Noise!.BandIsDefault);
        Assert.Equal(1, r.Noise.BandLow.Hertz);
        Assert.Equal(10 * r.Bandwidth!.Value.Hertz, r.Noise.BandHigh.Hertz, 1e-6);
        Assert.Equal(TestCircuits.Photodiode.Temperature, r.Noise.Temperature);
    }

    [Fact]
    public void Noise_temperature_option_changes_only_the_thermal_terms()
    {
        var c = TestCircuits.Photodiode;
        var band = AnalysisOptions.Default with { NoiseBandLow = new Frequency(1), NoiseBandHigh = new Frequency(1e5) };
        var cold = TiaAnalyzer.Analyze(c, band with { NoiseTemperature = new Temperature(300) }).Noise!;
        var hot = TiaAnalyzer.Analyze(c, band with { NoiseTemperature = new Temperature(330) }).Noise!;

        // Thermal noise power ∝ T (references.md §1 row 8), so rms scales with √(330/300); shot and e_n do not.
        Assert.Equal(Math.Sqrt(1.1), hot.Output.RfThermal.Volts / cold.Output.RfThermal.Volts, 1e-12);
        Assert.Equal(cold.Output.Shot, hot.Output.Shot);
        Assert.Equal(cold.Output.VoltageNoise, hot.Output.VoltageNoise);
        Assert.Equal(new Temperature(330), hot.Temperature);
    }

    [Theory]
    // 0.1·Cf45 gives Q ≈ 10, about 20 dB of peaking (references.md §1 row 15); 1.0 and 1.41 are the usual designs.
    // 0 is the parasitic-free Cf = 0 case: Q ≈ 80, a 38 dB spike.
    [InlineData(0.0)]
    [InlineData(0.1)]
    [InlineData(1.0)]
    [InlineData(1.41)]
    public void Integrated_noise_matches_a_very_dense_reference_on_a_peaked_response(double cfFactor)
    {
        var c = TestCircuits.WorkedExample(TestCircuits.Cf45 * cfFactor) with
        {
            En = new VoltageNoiseDensity(5e-9),
            EnCorner = new Frequency(100),
            In = new CurrentNoiseDensity(10e-15),
            InCorner = new Frequency(1e3),
            Imin = new Current(1e-9),
            Rsh = new Resistance(1e8),
        };
        var opts = AnalysisOptions.Default with { NoiseBandLow = new Frequency(0.1), NoiseBandHigh = new Frequency(20e6) };
        var r = TiaAnalyzer.Analyze(c, opts);
        if (cfFactor is > 0 and < 0.2)
        {
            Assert.InRange(r.PeakingDb, 18, 22);
        }

        var reference = DenseSimpson(new TiaModel(c), 0.1, 20e6, 20000);
        // Target ±0.5 % (the brief); the default panels give far better, so 1e-4 guards against regressions.
        Assert.Equal(1, r.Noise!.OutputRms.Volts / reference, 1e-4);
    }

    [Fact]
    public void Input_referred_noise_and_snr_follow_their_definitions()
    {
        var r = TiaAnalyzer.Analyze(TestCircuits.Photodiode, AnalysisOptions.Default);
        var n = r.Noise!;

        // Input-referred = output rms / |Zt(0)| (references.md §1 row 10); SNR = Imin·|Zt(0)|/rms; NEP = I_rms/R.
        Assert.Equal(n.OutputRms.Volts / r.Transimpedance.Ohms, n.InputRms.Amperes, 1e-24);
        Assert.Equal(20 * Math.Log10(2e-9 / n.InputRms.Amperes), n.SnrAtMinimumDb!.Value, 1e-9);
        Assert.Equal(n.InputRms.Amperes / 0.42, n.NoiseEquivalentPower!.Value.Watts, 1e-24);
        Assert.Equal(n.OutputRms.Volts, n.Output.Total.Volts, 1e-15);
    }

    /// <summary>Composite Simpson in ln f with <paramref name="perDecade"/> intervals per decade (even count).</summary>
    private static double DenseSimpson(TiaModel m, double fLo, double fHi, int perDecade)
    {
        var uLo = Math.Log(fLo);
        var uHi = Math.Log(fHi);
        var n = (int)Math.Ceiling((uHi - uLo) / Math.Log(10) * perDecade);
        n += n % 2;
        var h = (uHi - uLo) / n;
        double sum = 0;
        for (var i = 0; i <= n; i++)
        {
            var f = Math.Exp(uLo + (i * h));
            var g = m.OutputNoise(new Frequency(f)).Total * f;
            sum += (i == 0 || i == n ? 1 : (i % 2 == 1 ? 4 : 2)) * g;
        }

        return Math.Sqrt(sum * h / 3);
    }
}
