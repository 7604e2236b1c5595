using System.Collections.Immutable;
using System.Runtime.ExceptionServices;
using SpecLint.Core.Config;
using SpecLint.Core.Spec.Model;

namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>
/// Seeded Monte Carlo over the tolerance box. Sample i draws from its own generator
/// (<see cref="SplitMix64.ForSample"/>), writes its figures to slot i, and the statistics are reduced in index
/// order afterwards, so the result is byte-identical on any number of threads.
/// </summary>
internal static class MonteCarloRunner
{
    /// <summary>Samples per work item: large enough to keep scheduling cheap, small enough to balance two cores.</summary>
    private const int Chunk = 32;

    private static readonly ImmutableArray<int> PercentileKeys = [1, 5, 50, 95, 99];

    private static readonly double[] HistogramWidthsDeg = [0.1, 0.2, 0.5, 1, 2, 5, 10, 20];

    private const int MaxHistogramBins = 24;

    public static MonteCarloResult Run(ToleranceBox box, TiaSpec spec, ToleranceOptions options, MonteCarloSettings settings)
    {
        if (settings.Samples < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(settings), "Monte Carlo needs at least one sample");
        }

        var n = settings.Samples;
        var pm = new double[n];
        var pmDefined = new bool[n];
        var bw = new double[n];
        var peak = new double[n];
        var normal = settings.Distribution == MonteCarloDistribution.Normal;
        var axes = box.Axes;
        // Every sample starts its root search from the typical point's roots: the same start on any thread.
        var hint = box.Hint;
        var parallel = new ParallelOptions { MaxDegreeOfParallelism = options.MaxDegreeOfParallelism };
        try
        {
            Parallel.For(0, (n + Chunk - 1) / Chunk, parallel, () => new double[axes.Length], (chunk, _, x) =>
            {
                var end = Math.Min(n, (chunk + 1) * Chunk);
                for (var i = chunk * Chunk; i < end; i++)
                {
                    Draw(axes, settings.Seed, i, normal, x);
                    var m = LoopMetrics.At(box, x, hint);
                    pmDefined[i] = m.PhaseMarginDeg is not null;
                    // The contract counts an undefined margin as 0° in the percentiles and histogram.
                    pm[i] = m.PhaseMarginDeg ?? 0;
                    bw[i] = m.BandwidthHz ?? double.NaN;
                    peak[i] = m.PeakingDb;
                }

                return x;
            }, _ => { });
        }
        catch (AggregateException e) when (e.InnerExceptions.Count > 0)
        {
            // Callers catch ArithmeticException from a non-converging analysis; keep its type.
            ExceptionDispatchInfo.Capture(e.InnerExceptions[0]).Throw();
            throw;
        }

        var floor = (spec.Requirements.PhaseMargin ?? options.PhaseMarginFloor).Degrees;
        var peakLimit = spec.Requirements.PeakingDb ?? options.PeakingLimitDb;
        var required = spec.Requirements.Bandwidth?.Hertz;
        int passAll = 0, passPm = 0, passBw = 0, passPeak = 0;
        for (var i = 0; i < n; i++)
        {
            var okPm = pmDefined[i] && pm[i] >= floor;
            var okBw = required is not { } r || (!double.IsNaN(bw[i]) && bw[i] >= r);
            var okPeak = peak[i] <= peakLimit;
            passPm += okPm ? 1 : 0;
            passBw += okBw ? 1 : 0;
            passPeak += okPeak ? 1 : 0;
            passAll += okPm && okBw && okPeak ? 1 : 0;
        }

        var byCheck = ImmutableSortedDictionary.CreateBuilder<string, double>(StringComparer.Ordinal);
        byCheck["phase-margin"] = (double)passPm / n;
        byCheck["peaking"] = (double)passPeak / n;
        if (required is not null)
        {
            byCheck["bandwidth"] = (double)passBw / n;
        }

        var pmSorted = (double[])pm.Clone();
        Array.Sort(pmSorted);
        var bwSorted = bw.Where(v => !double.IsNaN(v)).ToArray();
        Array.Sort(bwSorted);

        return new MonteCarloResult(
            n,
            unchecked((int)settings.Seed),
            normal ? "normal" : "uniform",
            (double)passAll / n,
            byCheck.ToImmutable(),
            Percentiles(pmSorted),
            Percentiles(bwSorted),
            Histogram(pmSorted))
        {
            ConfiguredSeed = settings.Seed,
            PhaseMarginUndefinedCount = pmDefined.Count(d => !d),
        };
    }

    /// <summary>
    /// Fills <paramref name="x"/> with sample <paramref name="index"/>. Uniform: uniform between the limits.
    /// Normal: the limits at ±3σ (σ separately below and above the typical value), clipped at ±3σ.
    /// Every axis consumes the same number of draws, so adding an axis at the end leaves earlier ones alone.
    /// </summary>
    internal static void Draw(ImmutableArray<ToleranceAxis> axes, long seed, int index, bool normal, double[] x)
    {
        var rng = SplitMix64.ForSample(seed, index);
        for (var j = 0; j < axes.Length; j++)
        {
            var a = axes[j];
            if (normal)
            {
                var z = Math.Clamp(rng.NextNormal(), -3, 3);
                x[j] = z < 0 ? a.Typ + (z / 3 * (a.Typ - a.Low)) : a.Typ + (z / 3 * (a.High - a.Typ));
            }
            else
            {
                x[j] = a.At(rng.NextDouble());
            }
        }
    }

    /// <summary>Percentiles by linear interpolation between order statistics (Hyndman–Fan type 7); empty when no sample has a value.</summary>
    internal static ImmutableSortedDictionary<int, double> Percentiles(double[] sorted)
    {
        var b = ImmutableSortedDictionary.CreateBuilder<int, double>();
        if (sorted.Length == 0)
        {
            return b.ToImmutable();
        }

        foreach (var p in PercentileKeys)
        {
            var h = (sorted.Length - 1) * p / 100.0;
            var lo = (int)Math.Floor(h);
            var hi = Math.Min(lo + 1, sorted.Length - 1);
            b[p] = sorted[lo] + ((h - lo) * (sorted[hi] - sorted[lo]));
        }

        return b.ToImmutable();
    }

    /// <summary>
    /// Bins of [From, To) over the observed range, with the narrowest of 0.1°, 0.2°, 0.5°, 1°, 2°, 5°, 10°, 20°
    /// that needs at most 24 bins, so a tight spread still shows a shape and a wide one stays readable.
    /// </summary>
    internal static ImmutableArray<HistogramBin> Histogram(double[] sorted)
    {
        if (sorted.Length == 0)
        {
            return [];
        }

        var (min, max) = (sorted[0], sorted[^1]);
        var width = HistogramWidthsDeg[^1];
        foreach (var w in HistogramWidthsDeg)
        {
            if (Math.Floor(max / w) - Math.Floor(min / w) + 1 <= MaxHistogramBins)
            {
                width = w;
                break;
            }
        }

        var first = Math.Floor(min / width);
        var bins = (int)(Math.Floor(max / width) - first) + 1;
        var counts = new int[bins];
        foreach (var v in sorted)
        {
            counts[Math.Clamp((int)(Math.Floor(v / width) - first), 0, bins - 1)]++;
        }

        var result = ImmutableArray.CreateBuilder<HistogramBin>(bins);
        for (var k = 0; k < bins; k++)
        {
            // Rounded so the edges print as 45, 50, ... rather than 45.000000000000007.
            result.Add(new HistogramBin(Math.Round((first + k) * width, 9), Math.Round((first + k + 1) * width, 9), counts[k]));
        }

        return result.MoveToImmutable();
    }
}
