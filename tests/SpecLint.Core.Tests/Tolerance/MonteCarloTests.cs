using System.Globalization;
using System.Text;
using SpecLint.Core.Analysis;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Config;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;
using static SpecLint.Core.Tests.Tolerance.TolerantSpecs;

namespace SpecLint.Core.Tests.Tolerance;

public sealed class MonteCarloTests
{
    private static TiaSpec Spreads(Requirements? requirements = null, double cf = 2.2e-12) => Channel(
        rf: Rel<Resistance>(1e6, 1),
        cf: Rel<Capacitance>(cf, 10),
        dielectric: "X7R",
        sensor: Rel<Capacitance>(12e-12, 20),
        gbw: Rel<Frequency>(8e6, 30),
        secondPole: Rel<Frequency>(40e6, 20),
        temperature: Range(-10, 60),
        requirements: requirements);

    private static MonteCarloResult Run(TiaSpec spec, MonteCarloSettings settings, int threads) =>
        ToleranceAnalyzer.Analyze(spec, new ToleranceOptions { MonteCarlo = settings, MaxDegreeOfParallelism = threads })!.MonteCarlo!;

    /// <summary>Every number of the result in round-trip form, so equal text means equal bits.</summary>
    private static string Dump(MonteCarloResult r)
    {
        var sb = new StringBuilder();
        sb.Append(CultureInfo.InvariantCulture, $"{r.Samples} {r.Seed} {r.Distribution} {r.Yield:R}\n");
        foreach (var kv in r.YieldByCheck)
        {
            sb.Append(CultureInfo.InvariantCulture, $"{kv.Key} {kv.Value:R}\n");
        }

        foreach (var kv in r.PhaseMarginPercentilesDeg)
        {
            sb.Append(CultureInfo.InvariantCulture, $"pm{kv.Key} {kv.Value:R}\n");
        }

        foreach (var kv in r.BandwidthPercentilesHz)
        {
            sb.Append(CultureInfo.InvariantCulture, $"bw{kv.Key} {kv.Value:R}\n");
        }

        foreach (var b in r.PhaseMarginHistogram)
        {
            sb.Append(CultureInfo.InvariantCulture, $"[{b.From:R}, {b.To:R}) {b.Count}\n");
        }

        return sb.ToString();
    }

    [Theory]
    [InlineData(MonteCarloDistribution.Uniform)]
    [InlineData(MonteCarloDistribution.Normal)]
    public void The_result_is_bit_identical_on_one_two_and_four_threads(MonteCarloDistribution distribution)
    {
        var spec = Spreads(new Requirements(new Frequency(60e3), Angle.FromDegrees(55), null, null));
        var settings = new MonteCarloSettings(777, 42, distribution);
        var one = Dump(Run(spec, settings, 1));
        Assert.Equal(one, Dump(Run(spec, settings, 2)));
        Assert.Equal(one, Dump(Run(spec, settings, 4)));
        Assert.NotEqual(one, Dump(Run(spec, settings with { Seed = 43 }, 2)));
    }

    [Fact]
    public void A_design_with_a_huge_margin_yields_every_sample()
    {
        // Cf = 10 pF on 12 pF + 5.8 pF at 1 MΩ and 8 MHz is heavily overcompensated: PM near 90° everywhere.
        var r = Run(Spreads(cf: 10e-12), new MonteCarloSettings(500, 1, MonteCarloDistribution.Uniform), -1);
        Assert.Equal(1.0, r.Yield);
        Assert.True(r.PhaseMarginPercentilesDeg[1] > 70, r.PhaseMarginPercentilesDeg[1].ToString(CultureInfo.InvariantCulture));
    }

    [Fact]
    public void A_design_that_fails_at_nominal_yields_less_than_half()
    {
        // 0.3 pF (+ 0.15 pF Cpar) on ~18 pF: PM far below a 60° floor at nominal.
        var spec = Spreads(new Requirements(null, Angle.FromDegrees(60), null, null), cf: 0.3e-12);
        var nominal = TiaAnalyzer.Analyze(CircuitFactory.Nominal(spec), AnalysisOptions.WithoutNoise);
        Assert.True(nominal.PhaseMargin!.Value.Degrees < 60);
        var r = Run(spec, new MonteCarloSettings(500, 1, MonteCarloDistribution.Normal), -1);
        Assert.True(r.Yield < 0.5, r.Yield.ToString(CultureInfo.InvariantCulture));
        Assert.Equal(r.Yield, r.YieldByCheck["phase-margin"], 1e-12);
    }

    [Fact]
    public void Yield_by_check_lists_bandwidth_only_when_it_is_required_and_the_total_is_no_better_than_any_check()
    {
        var without = Run(Spreads(), new MonteCarloSettings(300, 1, MonteCarloDistribution.Uniform), -1);
        Assert.Equal(["peaking", "phase-margin"], without.YieldByCheck.Keys);
        var with = Run(Spreads(new Requirements(new Frequency(80e3), null, null, null)), new MonteCarloSettings(300, 1, MonteCarloDistribution.Uniform), -1);
        Assert.Equal(["bandwidth", "peaking", "phase-margin"], with.YieldByCheck.Keys);
        Assert.All(with.YieldByCheck.Values, v => Assert.True(with.Yield <= v));
    }

    [Fact]
    public void Percentiles_are_ordered_and_the_histogram_counts_every_sample()
    {
        var r = Run(Spreads(), new MonteCarloSettings(1000, 7, MonteCarloDistribution.Uniform), -1);
        Assert.Equal([1, 5, 50, 95, 99], r.PhaseMarginPercentilesDeg.Keys);
        var pm = r.PhaseMarginPercentilesDeg.Values.ToArray();
        var bw = r.BandwidthPercentilesHz.Values.ToArray();
        Assert.Equal(pm.Order(), pm);
        Assert.Equal(bw.Order(), bw);
        Assert.Equal(1000, r.PhaseMarginHistogram.Sum(b => b.Count));
        Assert.InRange(r.PhaseMarginHistogram.Length, 2, 24);
        Assert.True(r.PhaseMarginHistogram[0].From <= pm[0] && r.PhaseMarginHistogram[^1].To > pm[^1]);
    }

    [Fact]
    public void Monte_Carlo_stays_inside_the_corner_extremes()
    {
        var t = ToleranceAnalyzer.Analyze(Spreads(), new ToleranceOptions { MonteCarlo = new MonteCarloSettings(1000, 3, MonteCarloDistribution.Uniform) })!;
        var mc = t.MonteCarlo!;
        Assert.True(mc.PhaseMarginPercentilesDeg[1] >= t.PhaseMarginMin!.Value.Degrees - 1e-9);
        Assert.True(mc.PhaseMarginPercentilesDeg[99] <= t.PhaseMarginMax!.Value.Degrees + 1e-9);
        Assert.True(mc.BandwidthPercentilesHz[1] >= t.BandwidthMin!.Value.Hertz * (1 - 1e-12));
        Assert.True(mc.BandwidthPercentilesHz[99] <= t.BandwidthMax!.Value.Hertz * (1 + 1e-12));
    }

    [Fact]
    public void Normal_draws_put_the_limits_at_three_sigma_and_never_leave_the_box()
    {
        var axes = new ToleranceBox(Spreads(), ToleranceOptions.CornersOnly).Axes;
        var x = new double[axes.Length];
        var inner = 0;
        const int n = 20000;
        for (var i = 0; i < n; i++)
        {
            MonteCarloRunner.Draw(axes, 5, i, normal: true, x);
            var gbw = axes.IndexOf(axes.Single(a => a.Label == "GBW"));
            Assert.All(Enumerable.Range(0, axes.Length), j => Assert.InRange(x[j], axes[j].Low, axes[j].High));
            // Within ±1σ = ±10 % of 8 MHz (the ±30 % limit is 3σ).
            inner += Math.Abs(x[gbw] - 8e6) <= 0.8e6 ? 1 : 0;
        }

        // P(|z| ≤ 1) = 0.6827 for a normal distribution (common practice); uniform would give 1/3.
        Assert.Equal(0.6827, (double)inner / n, 0.015);
    }

    [Fact]
    public void SplitMix64_reproduces_the_reference_sequence()
    {
        // Seed 1234567, first outputs of S. Vigna's splitmix64.c as listed on Rosetta Code "Pseudo-random numbers/Splitmix64" (from memory).
        var g = new SplitMix64(1234567);
        Assert.Equal(6457827717110365317UL, g.Next());
        Assert.Equal(3203168211198807973UL, g.Next());
        Assert.Equal(9817491932198370423UL, g.Next());
        Assert.Equal(4593380528125082431UL, g.Next());
        Assert.Equal(16408922859458223821UL, g.Next());
    }
}
