using System.Collections.Immutable;

namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>
/// Worst-case search over the tolerance box: every vertex of the loop-affecting axes, then a coordinate-wise
/// search inside the box from the most extreme vertex of each figure (references.md §4 item 13: minima of phase
/// margin and bandwidth sat at vertices in every case tried, maxima can lie inside).
/// </summary>
/// <remarks>
/// The inner search moves one axis at a time: it samples the axis at <see cref="GridSteps"/> + 1 evenly spaced
/// points, and when an inner point beats the current one, refines it by golden-section search between its grid
/// neighbours; sweeps repeat until no axis moves (at most <see cref="MaxSweeps"/>). This finds maxima that are
/// unimodal along each axis, such as phase margin against GBW with a fixed second pole; it is not a global
/// optimiser for arbitrary surfaces.
/// </remarks>
internal sealed class CornerSearch
{
    private const int GridSteps = 4;
    private const int MaxSweeps = 4;
    private const int GoldenIterations = 30;

    private readonly ToleranceBox _box;
    private readonly Dictionary<double[], LoopMetrics> _cache = new(PointComparer.Instance);

    public CornerSearch(ToleranceBox box)
    {
        _box = box;
    }

    /// <summary>The number of axes whose vertices were enumerated in the last <see cref="Run"/>.</summary>
    public int EnumeratedAxes { get; private set; }

    /// <summary>The number of distinct points analysed so far.</summary>
    public int Evaluations => _cache.Count;

    /// <summary>The most extreme point for each figure, and its metrics.</summary>
    public IReadOnlyDictionary<Extreme, (double[] Point, LoopMetrics Metrics)> Run(ToleranceOptions options)
    {
        var loop = Enumerable.Range(0, _box.Axes.Length).Where(i => _box.Axes[i].AffectsLoop).ToArray();
        var cap = Math.Clamp(options.MaxVertexParameters, 0, 20);
        var enumerated = loop.Length <= cap ? loop : MostInfluential(loop, cap);

        EnumeratedAxes = enumerated.Length;
        var extremes = Enum.GetValues<Extreme>();
        var best = new Dictionary<Extreme, (double[] Point, LoopMetrics Metrics, double Score)>();
        void Consider(double[] x, LoopMetrics m)
        {
            foreach (var e in extremes)
            {
                var s = Score(e, m);
                // Strictly greater: the first point in enumeration order wins ties, so the result is stable.
                if (!best.TryGetValue(e, out var b) || s > b.Score)
                {
                    best[e] = ((double[])x.Clone(), m, s);
                }
            }
        }

        var typical = _box.TypicalPoint();
        Consider(typical, Evaluate(typical));
        var count = 1 << enumerated.Length;
        var vertices = new double[count][];
        for (var mask = 0; mask < count; mask++)
        {
            var x = (double[])typical.Clone();
            for (var j = 0; j < enumerated.Length; j++)
            {
                var a = _box.Axes[enumerated[j]];
                x[enumerated[j]] = ((mask >> j) & 1) == 0 ? a.Low : a.High;
            }

            vertices[mask] = x;
        }

        // Vertices are independent: analysed in parallel into their own slots, then taken in mask order.
        var metrics = new LoopMetrics[count];
        ParallelFor(count, options.MaxDegreeOfParallelism, k => metrics[k] = LoopMetrics.Of(_box.Build(vertices[k])));
        for (var mask = 0; mask < count; mask++)
        {
            _cache.TryAdd(vertices[mask], metrics[mask]);
            Consider(vertices[mask], metrics[mask]);
        }

        var result = new Dictionary<Extreme, (double[] Point, LoopMetrics Metrics)>();
        foreach (var e in extremes)
        {
            var (x, m, s) = best[e];
            if (options.SearchInterior && double.IsFinite(s) && loop.Length > 0)
            {
                (x, m) = Climb(e, x, m, s, loop);
            }

            result[e] = (x, m);
        }

        return result;
    }

    /// <summary>Runs <paramref name="body"/> for 0 .. count − 1, keeping an analysis exception's own type for callers.</summary>
    internal static void ParallelFor(int count, int maxDegreeOfParallelism, Action<int> body)
    {
        try
        {
            Parallel.For(0, count, new ParallelOptions { MaxDegreeOfParallelism = maxDegreeOfParallelism }, body);
        }
        catch (AggregateException e) when (e.InnerExceptions.Count > 0)
        {
            System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(e.InnerExceptions[0]).Throw();
            throw;
        }
    }

    /// <summary>Larger is more extreme; an undefined figure is −∞, except that an undefined margin is the worst minimum (+∞).</summary>
    public static double Score(Extreme e, LoopMetrics m) => e switch
    {
        Extreme.MinPhaseMargin => m.PhaseMarginDeg is { } pm ? -pm : double.PositiveInfinity,
        Extreme.MaxPhaseMargin => m.PhaseMarginDeg ?? double.NegativeInfinity,
        Extreme.MinBandwidth => m.BandwidthHz is { } bw ? -bw : double.NegativeInfinity,
        Extreme.MaxBandwidth => m.BandwidthHz ?? double.NegativeInfinity,
        _ => m.PeakingDb,
    };

    private LoopMetrics Evaluate(double[] x)
    {
        if (!_cache.TryGetValue(x, out var m))
        {
            m = LoopMetrics.Of(_box.Build(x));
            _cache[(double[])x.Clone()] = m;
        }

        return m;
    }

    private (double[] Point, LoopMetrics Metrics) Climb(Extreme e, double[] start, LoopMetrics startMetrics, double startScore, int[] axes)
    {
        var x = (double[])start.Clone();
        var (m, s) = (startMetrics, startScore);
        for (var sweep = 0; sweep < MaxSweeps; sweep++)
        {
            var moved = false;
            foreach (var i in axes)
            {
                var a = _box.Axes[i];
                var bestT = double.NaN;
                var bestK = -1;
                var bestS = s;
                var bestM = m;
                for (var k = 0; k <= GridSteps; k++)
                {
                    var t = (double)k / GridSteps;
                    var (mk, sk) = Probe(e, x, i, a.At(t));
                    if (sk > bestS)
                    {
                        (bestT, bestK, bestS, bestM) = (t, k, sk, mk);
                    }
                }

                if (bestK > 0 && bestK < GridSteps)
                {
                    var (t, mt, st) = Golden(e, x, i, (double)(bestK - 1) / GridSteps, (double)(bestK + 1) / GridSteps);
                    if (st > bestS)
                    {
                        (bestT, bestS, bestM) = (t, st, mt);
                    }
                }

                // A relative threshold keeps rounding noise from counting as progress and looping.
                if (bestK >= 0 && bestS > s + (1e-12 * Math.Max(1, Math.Abs(s))))
                {
                    x[i] = a.At(bestT);
                    (m, s) = (bestM, bestS);
                    moved = true;
                }
            }

            if (!moved)
            {
                break;
            }
        }

        return (x, m);
    }

    private (LoopMetrics Metrics, double Score) Probe(Extreme e, double[] x, int axis, double value)
    {
        var saved = x[axis];
        x[axis] = value;
        var m = Evaluate(x);
        x[axis] = saved;
        return (m, Score(e, m));
    }

    /// <summary>Golden-section search for the largest score along one axis, t ∈ [lo, hi].</summary>
    private (double T, LoopMetrics Metrics, double Score) Golden(Extreme e, double[] x, int axis, double lo, double hi)
    {
        var a = _box.Axes[axis];
        var invPhi = (Math.Sqrt(5) - 1) / 2;
        var c = hi - (invPhi * (hi - lo));
        var d = lo + (invPhi * (hi - lo));
        var (mc, sc) = Probe(e, x, axis, a.At(c));
        var (md, sd) = Probe(e, x, axis, a.At(d));
        for (var k = 0; k < GoldenIterations; k++)
        {
            if (sc > sd)
            {
                (hi, d, md, sd) = (d, c, mc, sc);
                c = hi - (invPhi * (hi - lo));
                (mc, sc) = Probe(e, x, axis, a.At(c));
            }
            else
            {
                (lo, c, mc, sc) = (c, d, md, sd);
                d = lo + (invPhi * (hi - lo));
                (md, sd) = Probe(e, x, axis, a.At(d));
            }
        }

        return sc > sd ? (c, mc, sc) : (d, md, sd);
    }

    /// <summary>
    /// The <paramref name="keep"/> loop axes whose one-at-a-time swing moves the figures most, scored as
    /// |ΔPM| in degrees + 100·|Δln BW| (1° weighs like 1 % of bandwidth) + |Δpeaking| in dB; ties keep the axis order.
    /// </summary>
    private int[] MostInfluential(int[] loop, int keep)
    {
        var typical = _box.TypicalPoint();
        var scores = new List<(int Axis, double Score)>();
        foreach (var i in loop)
        {
            var lo = (double[])typical.Clone();
            lo[i] = _box.Axes[i].Low;
            var hi = (double[])typical.Clone();
            hi[i] = _box.Axes[i].High;
            var (ml, mh) = (Evaluate(lo), Evaluate(hi));
            var pm = ml.PhaseMarginDeg is { } a && mh.PhaseMarginDeg is { } b ? Math.Abs(a - b) : 1e6;
            var bw = ml.BandwidthHz is { } c && mh.BandwidthHz is { } d ? 100 * Math.Abs(Math.Log(c / d)) : 1e6;
            scores.Add((i, pm + bw + Math.Abs(ml.PeakingDb - mh.PeakingDb)));
        }

        return [.. scores.OrderByDescending(s => s.Score).Take(keep).Select(s => s.Axis).Order()];
    }
}
