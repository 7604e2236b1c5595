using BenchmarkDotNet.Attributes;
using SpecLint.Core.Analysis;
using SpecLint.Core.Units;

namespace SpecLint.Benchmarks;

/// <summary>
/// One nominal analysis of a typical photodiode channel, with and without noise. Targets: &lt; 20 µs without
/// noise (corners and Monte Carlo run it thousands of times), &lt; 200 µs with noise.
/// </summary>
[MemoryDiagnoser]
public class AnalysisBenchmarks
{
    private readonly Circuit _circuit = new()
    {
        Rf = new Resistance(10e6),
        Cf = new Capacitance(1e-12),
        Cpar = new Capacitance(0.15e-12),
        SensorCapacitance = new Capacitance(12e-12),
        CommonModeCapacitance = new Capacitance(3e-12),
        DifferentialCapacitance = new Capacitance(2e-12),
        StrayCapacitance = new Capacitance(0.8e-12),
        Rsh = new Resistance(2e9),
        A0 = Gain.FromDecibels(115),
        Gbw = new Frequency(8e6),
        SecondPole = new Frequency(40e6),
        En = new VoltageNoiseDensity(7e-9),
        EnCorner = new Frequency(200),
        In = new CurrentNoiseDensity(0.6e-15),
        Ib = new Current(1e-12),
        Vos = new Voltage(0.3e-3),
        Idark = new Current(50e-12),
        Imin = new Current(2e-9),
        Imax = new Current(150e-9),
        Vbias = new Voltage(0.2),
        SwingToPositive = new Voltage(0.04),
        SwingToNegative = new Voltage(0.02),
    };

    private readonly AnalysisOptions _withNoise = AnalysisOptions.Default with
    {
        NoiseBandLow = new Frequency(1),
        NoiseBandHigh = new Frequency(100e3),
    };

    /// <summary>Small-signal and DC figures only.</summary>
    [Benchmark(Baseline = true)]
    public AnalysisResult WithoutNoise() => TiaAnalyzer.Analyze(_circuit, AnalysisOptions.WithoutNoise);

    /// <summary>Everything, noise over 1 Hz .. 100 kHz.</summary>
    [Benchmark]
    public AnalysisResult WithNoise() => TiaAnalyzer.Analyze(_circuit, _withNoise);

    /// <summary>Everything, noise over the default band 1 Hz .. 10·f−3dB.</summary>
    [Benchmark]
    public AnalysisResult WithNoiseDefaultBand() => TiaAnalyzer.Analyze(_circuit, AnalysisOptions.Default);
}
