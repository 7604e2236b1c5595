using System.Globalization;
using SpecLint.Core.Analysis;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Spec;
using SpecLint.Core.Tests.Ngspice;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Tolerance;

/// <summary>
/// The loop-only path corners and Monte Carlo use (<see cref="TiaAnalyzer.LoopFigures"/>) against the full
/// analysis: phase margin, bandwidth and peaking agree to 1e-9 relative (peaking also to 1e-12 dB, the rounding
/// noise of a flat response), and a figure is absent on one path exactly when it is absent on the other.
/// </summary>
public sealed class LoopFiguresTests
{
    private const double Relative = 1e-9;
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

            var sample = new double[box.Axes.Length];
            for (var i = 0; i < 100; i++)
            {
                MonteCarloRunner.Draw(box.Axes, 42, i, normal: false, sample);
                AssertAgree(box.Build(sample), $"{Path.GetFileName(file)} sample {i}");
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
        double LogUniform(double lo, double hi) => lo * Math.Pow(hi / lo, random.NextDouble());
        int withMargin = 0, withoutMargin = 0, peaking = 0;
        for (var i = 0; i < 3000; i++)
        {
            var gbw = LogUniform(1e4, 1e9);
            var circuit = new Circuit
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
            var full = AssertAgree(circuit, string.Create(CultureInfo.InvariantCulture, $"random circuit {i}"));
            withMargin += full.PhaseMarginDeg is null ? 0 : 1;
            withoutMargin += full.PhaseMarginDeg is null ? 1 : 0;
            peaking += full.PeakingDb > 0.1 ? 1 : 0;
        }

        Assert.True(withMargin > 100 && withoutMargin > 10 && peaking > 100, $"{withMargin} with a margin, {withoutMargin} without, {peaking} peaking");
    }

    [Fact]
    public void The_comparison_fails_on_a_figure_off_by_more_than_the_tolerance()
    {
        Assert.True(Close(100, 100 * (1 + 1e-10), 0));
        Assert.False(Close(100, 100 * (1 + 1e-8), 0));
        Assert.True(Close(0, 1e-13, PeakingNoiseDb));
        Assert.False(Close(0, 1e-9, PeakingNoiseDb));
    }

    private static LoopMetrics AssertAgree(Circuit circuit, string what)
    {
        var full = LoopMetrics.OfFullAnalysis(circuit);
        var fast = LoopMetrics.Of(circuit);
        Assert.True(full.PhaseMarginDeg.HasValue == fast.PhaseMarginDeg.HasValue, $"{what}: margin {full.PhaseMarginDeg} vs {fast.PhaseMarginDeg}");
        Assert.True(full.BandwidthHz.HasValue == fast.BandwidthHz.HasValue, $"{what}: bandwidth {full.BandwidthHz} vs {fast.BandwidthHz}");
        Assert.True(Close(full.PhaseMarginDeg ?? 0, fast.PhaseMarginDeg ?? 0, 0), $"{what}: margin {full.PhaseMarginDeg:R} vs {fast.PhaseMarginDeg:R}");
        Assert.True(Close(full.BandwidthHz ?? 0, fast.BandwidthHz ?? 0, 0), $"{what}: bandwidth {full.BandwidthHz:R} vs {fast.BandwidthHz:R}");
        Assert.True(Close(full.PeakingDb, fast.PeakingDb, PeakingNoiseDb), $"{what}: peaking {full.PeakingDb:R} vs {fast.PeakingDb:R}");
        return full;
    }

    private static bool Close(double a, double b, double absolute) =>
        Math.Abs(a - b) <= (Relative * Math.Max(Math.Abs(a), Math.Abs(b))) + absolute;
}
