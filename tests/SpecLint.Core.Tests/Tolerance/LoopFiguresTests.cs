using System.Collections.Immutable;
using System.Globalization;
using SpecLint.Core.Analysis;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Spec;
using SpecLint.Core.Tests.Ngspice;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Tolerance;

/// <summary>
/// The loop-only path corners and Monte Carlo use (<see cref="TiaAnalyzer.LoopFigures(Circuit, int)"/>: the
/// polynomial fast path <see cref="PlainLoop"/>, else the scan) against the full analysis: phase margin, bandwidth
/// and peaking agree to 1e-11 relative (peaking also to 1e-12 dB, the rounding noise of a flat response), and a
/// figure is absent on one path exactly when it is absent on the other. The worst disagreement seen is about 1e-12
/// (a margin of a fraction of a degree, with the scan's refinement tolerance of 1e-14 in ln ω); the JSON output
/// tests allow 1e-9.
/// </summary>
public sealed class LoopFiguresTests
{
    private const double Relative = 1e-11;
    private const double PeakingNoiseDb = 1e-12;

    [Fact]
    public void Agrees_with_the_full_analysis_on_the_ngspice_circuits()
    {
        foreach (var (name, circuit) in NgspiceCases.All)
        {
            AssertAgree(circuit, name);
        }
    }

    [Fact]
    public void Agrees_with_the_full_analysis_over_the_tolerance_boxes_of_the_example_and_demo_specs()
    {
        var files = Directory.GetFiles(TestPaths.Repo("examples"), "*.tia.yaml")
            .Concat(Directory.GetFiles(TestPaths.Repo("src", "SpecLint.Cli", "Demo"), "*.tia.yaml"))
            .Order(StringComparer.Ordinal)
            .ToList();
        Assert.True(files.Count >= 10, $"{files.Count} spec files found");
        var points = 0;
        foreach (var file in files)
        {
            var loaded = SpecLoader.LoadFile(file);
            Assert.True(loaded.IsValid, file);
            var box = new ToleranceBox(loaded.Spec!, ToleranceOptions.CornersOnly);
            var typical = box.TypicalPoint();
            AssertAgree(box.Build(typical), $"{Path.GetFileName(file)} typical");
            points++;
            // Every vertex of the first axes (up to 64), then random points inside the box.
            var axes = Math.Min(box.Axes.Length, 6);
            for (var mask = 0; mask < 1 << axes; mask++)
            {
                var x = (double[])typical.Clone();
                for (var j = 0; j < axes; j++)
                {
                    x[j] = ((mask >> j) & 1) == 0 ? box.Axes[j].Low : box.Axes[j].High;
                }

                AssertAgree(box.Build(x), $"{Path.GetFileName(file)} vertex {mask}");
                points++;
            }

            // Monte Carlo's path: read from the point with the typical point's roots as the start, the same to the bit
            // as the built circuit's figures.
            var hint = TiaAnalyzer.LoopHintOf(box.Build(typical));
            var sample = new double[box.Axes.Length];
            for (var i = 0; i < 100; i++)
            {
                MonteCarloRunner.Draw(box.Axes, 42, i, normal: false, sample);
                var full = AssertAgree(box.Build(sample), $"{Path.GetFileName(file)} sample {i}");
                AssertSame(full, LoopMetrics.At(box, sample, hint), $"{Path.GetFileName(file)} sample {i} from the point");
                Assert.Equal(LoopMetrics.Of(box.Build(sample), hint), LoopMetrics.At(box, sample, hint));
                points++;
            }
        }

        Assert.True(points > 1000, $"{points} points compared");
    }

    [Fact]
    public void Agrees_with_the_full_analysis_on_random_circuits()
    {
        // Log-uniform values over ranges wider than any spec uses; every figure kind appears (checked below).
        var random = new Random(20261202);
        int withMargin = 0, withoutMargin = 0, peaking = 0;
        for (var i = 0; i < 3000; i++)
        {
            var circuit = RandomPlain(random);
            var full = AssertAgree(circuit, string.Create(CultureInfo.InvariantCulture, $"random circuit {i}"));
            withMargin += full.PhaseMarginDeg is null ? 0 : 1;
            withoutMargin += full.PhaseMarginDeg is null ? 1 : 0;
            peaking += full.PeakingDb > 0.1 ? 1 : 0;
        }

        Assert.True(withMargin > 100 && withoutMargin > 10 && peaking > 100, $"{withMargin} with a margin, {withoutMargin} without, {peaking} peaking");
    }

    [Fact]
    public void The_scan_agrees_with_the_full_analysis_on_random_circuits()
    {
        // The path a network circuit, or a plain one the fast path declines, takes (common practice: random inputs).
        var random = new Random(20261203);
        for (var i = 0; i < 1000; i++)
        {
            var circuit = RandomPlain(random);
            var full = LoopMetrics.OfFullAnalysis(circuit);
            var (pm, bw, peak) = TiaAnalyzer.ScanLoopFigures(circuit);
            AssertSame(full, new LoopMetrics(pm, bw, peak), string.Create(CultureInfo.InvariantCulture, $"random circuit {i}"));
        }
    }

    [Fact]
    public void The_fast_path_takes_most_random_circuits_and_agrees_with_the_full_analysis()
    {
        // Common practice: random inputs over ranges wider than any spec uses, no hint.
        var random = new Random(20261204);
        var fast = 0;
        const int Count = 3000;
        for (var i = 0; i < Count; i++)
        {
            fast += AssertFastAgrees(RandomPlain(random), LoopHint.None, string.Create(CultureInfo.InvariantCulture, $"random circuit {i}")) ? 1 : 0;
        }

        Assert.True(fast > Count * 9 / 10, $"{fast} of {Count} on the fast path");
    }

    [Fact]
    public void Perturbed_circuits_started_from_the_nominal_roots_agree_with_the_full_analysis()
    {
        // Common practice: a random nominal circuit gives the hint, samples vary every loop part by ±1 % .. ±50 %.
        var random = new Random(20261205);
        double[] tolerances = [0.01, 0.05, 0.2, 0.5];
        int fast = 0, samples = 0;
        for (var i = 0; i < 400; i++)
        {
            var nominal = RandomPlain(random);
            var hint = TiaAnalyzer.LoopHintOf(nominal);
            for (var k = 0; k < 12; k++)
            {
                var sample = Perturb(nominal, tolerances[k % tolerances.Length], random);
                fast += AssertFastAgrees(sample, hint, string.Create(CultureInfo.InvariantCulture, $"circuit {i} sample {k}")) ? 1 : 0;
                samples++;
            }
        }

        Assert.True(fast > samples * 9 / 10, $"{fast} of {samples} on the fast path");
    }

    [Fact]
    public void Perturbed_switched_and_electrode_circuits_agree_with_the_full_analysis()
    {
        // Common practice: random switched, adjustable and electrode networks, perturbed like the plain ones; the
        // hint of the plain circuit underneath is passed too, and must not change the figures.
        var random = new Random(20261206);
        double LogUniform(double lo, double hi) => lo * Math.Pow(hi / lo, random.NextDouble());
        var networks = 0;
        for (var i = 0; i < 150; i++)
        {
            var plain = RandomPlain(random);
            var off = RandomOffBranches(random, 0, 3);
            var nominal = plain with
            {
                FeedbackSeriesResistance = new Resistance(random.NextDouble() < 0.3 ? 0 : LogUniform(1, 1e3)),
                SeriesResistance = new Resistance(random.NextDouble() < 0.5 ? 0 : LogUniform(10, 1e6)),
                OffBranches = off,
            };
            var hint = TiaAnalyzer.LoopHintOf(plain);
            for (var k = 0; k < 4; k++)
            {
                var sample = Perturb(nominal, 0.05, random) with
                {
                    SeriesResistance = nominal.SeriesResistance * (1 + (0.05 * ((2 * random.NextDouble()) - 1))),
                };
                networks += sample.HasNetwork ? 1 : 0;
                var what = string.Create(CultureInfo.InvariantCulture, $"network {i} sample {k}");
                var full = LoopMetrics.OfFullAnalysis(sample);
                AssertSame(full, LoopMetrics.Of(sample, hint), what);
                AssertSame(full, LoopMetrics.Of(sample), what);
            }
        }

        Assert.True(networks > 400, $"{networks} network samples");
    }

    [Fact]
    public void A_networks_loop_gain_and_transimpedance_from_one_evaluation_equal_each_to_the_last_bit()
    {
        // The loop-only scan evaluates a network's admittances once for |T|² and |Zt|²; the sums must be added in
        // the same order as the separate functions, so that the scan's decisions cannot change (common practice).
        var random = new Random(20261207);
        double LogUniform(double lo, double hi) => lo * Math.Pow(hi / lo, random.NextDouble());
        for (var i = 0; i < 200; i++)
        {
            var off = RandomOffBranches(random, 1, 4);
            var circuit = RandomPlain(random) with
            {
                FeedbackSeriesResistance = new Resistance(LogUniform(1, 1e3)),
                SeriesResistance = new Resistance(random.NextDouble() < 0.5 ? 0 : LogUniform(10, 1e6)),
                OffBranches = off,
            };
            var model = new TiaModel(circuit);
            for (var w = 1.0; w < 1e12; w *= 1.7)
            {
                var (loop, zt) = model.LoopAndTransimpedanceSquared(w);
                Assert.Equal(model.LoopGainMagnitudeSquared(w), loop);
                Assert.Equal(model.TransimpedanceMagnitudeSquared(w), zt);
            }
        }
    }

    [Fact]
    public void The_comparison_fails_on_a_figure_off_by_more_than_the_tolerance()
    {
        Assert.True(Close(100, 100 * (1 + 1e-12), 0));
        Assert.False(Close(100, 100 * (1 + 1e-10), 0));
        Assert.True(Close(0, 1e-13, PeakingNoiseDb));
        Assert.False(Close(0, 1e-9, PeakingNoiseDb));
    }

    /// <summary>Between <paramref name="min"/> and <paramref name="maxExclusive"/> − 1 unselected branches behind open switches.</summary>
    private static ImmutableArray<OffBranch> RandomOffBranches(Random random, int min, int maxExclusive)
    {
        double LogUniform(double lo, double hi) => lo * Math.Pow(hi / lo, random.NextDouble());
        var off = ImmutableArray.CreateBuilder<OffBranch>();
        for (var k = random.Next(min, maxExclusive); k > 0; k--)
        {
            off.Add(new OffBranch(new Resistance(LogUniform(1e3, 1e10)), new Capacitance(LogUniform(1e-13, 1e-10)), new Capacitance(LogUniform(1e-13, 1e-11))));
        }

        return off.ToImmutable();
    }

    /// <summary>Log-uniform values over ranges wider than any spec uses.</summary>
    private static Circuit RandomPlain(Random random)
    {
        double LogUniform(double lo, double hi) => lo * Math.Pow(hi / lo, random.NextDouble());
        var gbw = LogUniform(1e4, 1e9);
        return new Circuit
        {
            Rf = new Resistance(LogUniform(1e2, 1e11)),
            Cf = new Capacitance(random.NextDouble() < 0.2 ? 0 : LogUniform(1e-14, 1e-9)),
            Cpar = new Capacitance(LogUniform(1e-15, 1e-12)),
            SensorCapacitance = new Capacitance(LogUniform(1e-13, 1e-8)),
            CommonModeCapacitance = new Capacitance(LogUniform(1e-13, 1e-11)),
            Rsh = random.NextDouble() < 0.3 ? null : new Resistance(LogUniform(1e2, 1e13)),
            A0 = Gain.FromDecibels(40 + (random.NextDouble() * 130)),
            Gbw = new Frequency(gbw),
            SecondPole = random.NextDouble() < 0.3 ? null : new Frequency(gbw * LogUniform(0.3, 100)),
        };
    }

    /// <summary>Every part that enters the loop scaled by its own factor in [1 − tolerance, 1 + tolerance].</summary>
    private static Circuit Perturb(Circuit c, double tolerance, Random random)
    {
        double F() => 1 + (tolerance * ((2 * random.NextDouble()) - 1));
        return c with
        {
            Rf = c.Rf * F(),
            Cf = c.Cf * F(),
            Cpar = c.Cpar * F(),
            SensorCapacitance = c.SensorCapacitance * F(),
            CommonModeCapacitance = c.CommonModeCapacitance * F(),
            Rsh = c.Rsh is { } rsh ? rsh * F() : null,
            A0 = new Gain(c.A0.Linear * F()),
            Gbw = c.Gbw * F(),
            SecondPole = c.SecondPole is { } p2 ? p2 * F() : null,
            FeedbackSeriesResistance = c.FeedbackSeriesResistance * F(),
        };
    }

    /// <summary>
    /// Compares the fast path with the full analysis when it takes the circuit, the public path (the scan) when it
    /// declines; true when it took it.
    /// </summary>
    private static bool AssertFastAgrees(Circuit circuit, in LoopHint hint, string what)
    {
        var full = LoopMetrics.OfFullAnalysis(circuit);
        var taken = PlainLoop.TryFigures(circuit, 20, hint, out var f, out _);
        AssertSame(full, taken ? new LoopMetrics(f.PhaseMarginDeg, f.BandwidthHz, f.PeakingDb) : LoopMetrics.Of(circuit, hint), what);
        return taken;
    }

    private static LoopMetrics AssertAgree(Circuit circuit, string what)
    {
        var full = LoopMetrics.OfFullAnalysis(circuit);
        AssertSame(full, LoopMetrics.Of(circuit), what);
        return full;
    }

    private static void AssertSame(LoopMetrics full, LoopMetrics fast, string what)
    {
        Assert.True(full.PhaseMarginDeg.HasValue == fast.PhaseMarginDeg.HasValue, $"{what}: margin {full.PhaseMarginDeg} vs {fast.PhaseMarginDeg}");
        Assert.True(full.BandwidthHz.HasValue == fast.BandwidthHz.HasValue, $"{what}: bandwidth {full.BandwidthHz} vs {fast.BandwidthHz}");
        Assert.True(Close(full.PhaseMarginDeg ?? 0, fast.PhaseMarginDeg ?? 0, 0), $"{what}: margin {full.PhaseMarginDeg:R} vs {fast.PhaseMarginDeg:R}");
        Assert.True(Close(full.BandwidthHz ?? 0, fast.BandwidthHz ?? 0, 0), $"{what}: bandwidth {full.BandwidthHz:R} vs {fast.BandwidthHz:R}");
        Assert.True(Close(full.PeakingDb, fast.PeakingDb, PeakingNoiseDb), $"{what}: peaking {full.PeakingDb:R} vs {fast.PeakingDb:R}");
    }

    private static bool Close(double a, double b, double absolute) =>
        Math.Abs(a - b) <= (Relative * Math.Max(Math.Abs(a), Math.Abs(b))) + absolute;
}
