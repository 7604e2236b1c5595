using System.Collections.Immutable;
using System.Globalization;
using SpecLint.Core.Analysis;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Analysis;

/// <summary>
/// The network model (switch, unselected branches, electrode access resistance; references.md §D8) on random circuits:
/// it reduces to the plain model as the network vanishes, its fast loop figures agree with its full analysis, and the
/// zeros it finds are zeros. The ngspice cross-checks hold it to an independent simulator.
/// </summary>
public sealed class NetworkModelTests
{
    private readonly Random _random = new(20261202);

    private double LogUniform(double lo, double hi) => lo * Math.Pow(hi / lo, _random.NextDouble());

    private Circuit Plain()
    {
        var gbw = LogUniform(1e4, 1e8);
        return new Circuit
        {
            Rf = new Resistance(LogUniform(1e3, 1e10)),
            Cf = new Capacitance(_random.NextDouble() < 0.2 ? 0 : LogUniform(1e-13, 1e-10)),
            Cpar = new Capacitance(LogUniform(1e-15, 1e-13)),
            SensorCapacitance = new Capacitance(LogUniform(1e-12, 1e-8)),
            CommonModeCapacitance = new Capacitance(LogUniform(1e-12, 1e-11)),
            Rsh = _random.NextDouble() < 0.3 ? null : new Resistance(LogUniform(1e4, 1e12)),
            A0 = Gain.FromDecibels(80 + (random() * 60)),
            Gbw = new Frequency(gbw),
            SecondPole = _random.NextDouble() < 0.3 ? null : new Frequency(gbw * LogUniform(1, 100)),
            En = new VoltageNoiseDensity(LogUniform(2e-9, 30e-9)),
            In = new CurrentNoiseDensity(LogUniform(1e-16, 1e-13)),
            Imin = new Current(LogUniform(1e-12, 1e-6)),
        };

        double random() => _random.NextDouble();
    }

    [Fact]
    public void A_vanishing_network_gives_the_plain_models_figures()
    {
        // A 1 nΩ switch, a 1 nΩ access resistance and an unselected branch behind 1e-24 F change every figure by
        // far less than 1e-9 (common practice: first-order perturbation); the two code paths must agree that far.
        var compared = 0;
        for (var i = 0; i < 400; i++)
        {
            var plain = Plain();
            var network = plain with
            {
                FeedbackSeriesResistance = new Resistance(1e-9),
                SeriesResistance = new Resistance(1e-9),
                OffBranches = [new OffBranch(new Resistance(1e6), new Capacitance(1e-12), new Capacitance(1e-24))],
            };
            Assert.True(network.HasNetwork);
            AnalysisResult a, b;
            try
            {
                a = TiaAnalyzer.Analyze(plain, AnalysisOptions.Default);
            }
            catch (AnalysisFailedException)
            {
                continue;
            }

            b = TiaAnalyzer.Analyze(network, AnalysisOptions.Default);
            var what = string.Create(CultureInfo.InvariantCulture, $"circuit {i}");
            Assert.True(a.PhaseMargin.HasValue == b.PhaseMargin.HasValue, what);
            Assert.Equal(a.PhaseMargin?.Degrees ?? 0, b.PhaseMargin?.Degrees ?? 0, 1e-7);
            Assert.True(Close(a.Bandwidth?.Hertz, b.Bandwidth?.Hertz, 1e-8), $"{what}: bandwidth {a.Bandwidth} vs {b.Bandwidth}");
            Assert.Equal(a.PeakingDb, b.PeakingDb, 1e-7);
            Assert.True(Close(a.Transimpedance.Ohms, b.Transimpedance.Ohms, 1e-9), what);
            Assert.True(Close(a.Noise!.OutputRms.Volts, b.Noise!.OutputRms.Volts, 1e-6), $"{what}: noise {a.Noise.OutputRms} vs {b.Noise.OutputRms}");
            Assert.True(Close(a.Output.Max.Volts, b.Output.Max.Volts, 1e-9), what);
            compared++;
        }

        Assert.True(compared > 300, $"{compared} circuits compared");
    }

    [Fact]
    public void The_fast_loop_figures_agree_with_the_full_analysis_on_switched_and_electrode_circuits()
    {
        for (var i = 0; i < 800; i++)
        {
            var off = ImmutableArray.CreateBuilder<OffBranch>();
            var branches = _random.Next(0, 4);
            for (var k = 0; k < branches; k++)
            {
                off.Add(new OffBranch(new Resistance(LogUniform(1e3, 1e10)), new Capacitance(LogUniform(1e-13, 1e-10)), new Capacitance(LogUniform(1e-13, 1e-11))));
            }

            var circuit = Plain() with
            {
                FeedbackSeriesResistance = new Resistance(_random.NextDouble() < 0.3 ? 0 : LogUniform(1, 1e3)),
                SeriesResistance = new Resistance(_random.NextDouble() < 0.5 ? 0 : LogUniform(10, 1e6)),
                OffBranches = off.ToImmutable(),
            };
            var full = LoopMetrics.OfFullAnalysis(circuit);
            var fast = LoopMetrics.Of(circuit);
            var what = string.Create(CultureInfo.InvariantCulture, $"circuit {i}");
            Assert.True(full.PhaseMarginDeg.HasValue == fast.PhaseMarginDeg.HasValue, what);
            Assert.True(Close(full.PhaseMarginDeg, fast.PhaseMarginDeg, 1e-9), $"{what}: {full.PhaseMarginDeg:R} vs {fast.PhaseMarginDeg:R}");
            Assert.True(Close(full.BandwidthHz, fast.BandwidthHz, 1e-9), $"{what}: {full.BandwidthHz:R} vs {fast.BandwidthHz:R}");
            Assert.Equal(full.PeakingDb, fast.PeakingDb, 1e-9);
        }
    }

    [Fact]
    public void The_zeros_of_an_rc_admittance_are_zeros_and_alternate_with_its_poles()
    {
        for (var i = 0; i < 500; i++)
        {
            var branches = new List<RcBranch>
            {
                new(1 / LogUniform(1e3, 1e10), LogUniform(1e-13, 1e-10), _random.NextDouble() < 0.5 ? 0 : LogUniform(1, 1e4), 0),
                new(0, LogUniform(1e-12, 1e-9), 0, 0),
            };
            for (var k = _random.Next(0, 4); k > 0; k--)
            {
                branches.Add(new(1 / LogUniform(1e3, 1e10), LogUniform(1e-13, 1e-10), 0, LogUniform(1e-13, 1e-11)));
            }

            var y = new RcAdmittance(branches);
            Assert.Equal(y.Poles.Length + 1, y.Zeros.Length);
            for (var k = 0; k < y.Poles.Length; k++)
            {
                // RC driving-point admittance: zero, pole, zero, ... from the origin outwards (references.md §D8).
                Assert.True(y.Zeros[k] < y.Poles[k] && y.Poles[k] < y.Zeros[k + 1], $"network {i}: zeros and poles do not alternate");
            }

            // A zero within 1e-6 of a pole is a doublet: the two cancel in |Y| (and in the slope bounds), and double
            // precision cannot place the zero closer than the pole's own rounding; the others must be zeros.
            foreach (var z in y.Zeros.Where(z => z > 0 && !y.Poles.Any(p => Math.Abs(p - z) <= 1e-6 * p)))
            {
                var scale = branches.Sum(b => Math.Abs(b.OnNegativeAxis(z)));
                Assert.True(Math.Abs(y.At(new System.Numerics.Complex(-z, 0)).Real) <= 1e-9 * scale, $"network {i}: Y(−{z:G6}) is not 0: {y.At(new System.Numerics.Complex(-z, 0)).Real:G6} vs {scale:G6}; zeros {string.Join(", ", y.Zeros.Select(x => x.ToString("G6", CultureInfo.InvariantCulture)))} poles {string.Join(", ", y.Poles.Select(x => x.ToString("G6", CultureInfo.InvariantCulture)))}; {string.Join("; ", branches)}");
            }
        }
    }

    private static bool Close(double? a, double? b, double relative) =>
        a is null || b is null ? a is null && b is null : Math.Abs(a.Value - b.Value) <= relative * Math.Max(Math.Abs(a.Value), Math.Abs(b.Value));
}
