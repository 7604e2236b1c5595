using System.Collections.Immutable;

namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>
/// Worst-case search over the tolerance box: every vertex of the loop-affecting axes, then a coordinate-wise
/// search inside the box from the most extreme vertex of each figure (references.md §4 item 13: minima of phase
/// margin and bandwidth sat at vertices in every case tried, maxima can lie inside).
/// </summary>
/// <remarks>
/// The inner search moves one axis at a time: it samples the axis at <see cref="GridSteps"/> + 1 evenly spaced
/// points and refines the best of them, an end of the axis included, by golden-section search between its grid
/// neighbours; after each sweep a line search follows the sweep's net move through several axes at once (a
/// pattern move), and sweeps repeat until no axis moves (at most <see cref="MaxSweeps"/>). This finds maxima that are
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

    // Every point of the box starts its root search from the typical point's roots.
    private readonly LoopHint _hint;

    public CornerSearch(ToleranceBox box)
    {
        _box = box;
        _hint = box.Hint;
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
        ParallelFor(count, options.MaxDegreeOfParallelism, k => metrics[k] = LoopMetrics.At(_box, vertices[k], _hint));
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
            m = LoopMetrics.At(_box, x, _hint);
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
            var sweepStart = (double[])x.Clone();
            var moved = false;
            foreach (var i in axes)
            {
                var a = _box.Axes[i];
                var bestT = double.NaN;
                var bestS = s;
                var bestM = m;
                var gridK = 0;
                var gridS = double.NegativeInfinity;
                for (var k = 0; k <= GridSteps; k++)
                {
                    var t = (double)k / GridSteps;
                    var (mk, sk) = Probe(e, x, i, a.At(t));
                    if (sk > gridS)
                    {
                        (gridK, gridS) = (k, sk);
                    }

                    if (sk > bestS)
                    {
                        (bestT, bestS, bestM) = (t, sk, mk);
                    }
                }

                // Refine between the best grid point's neighbours, also when it is an end of the axis (the vertex the
                // climb may have started from): a maximum can lie between a vertex and the next grid point.
                var (gt, gm, gs) = Golden(e, x, i, (double)Math.Max(0, gridK - 1) / GridSteps, (double)Math.Min(GridSteps, gridK + 1) / GridSteps);
                if (gs > bestS)
                {
                    (bestT, bestS, bestM) = (gt, gs, gm);
                }

                // A relative threshold keeps rounding noise from counting as progress and looping.
                if (!double.IsNaN(bestT) && bestS > s + (1e-12 * Math.Max(1, Math.Abs(s))))
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

            // A ridge across the axes is climbed in the direction the whole sweep moved, not axis by axis.
            (x, m, s) = PatternMove(e, sweepStart, x, m, s, axes);
        }

        return (x, m);
    }

    /// <summary>
    /// Golden-section search along the sweep's net move, from its end to the edge of the box (at most as far
    /// again); returns the better of that and the sweep's end.
    /// </summary>
    private (double[] X, LoopMetrics Metrics, double Score) PatternMove(Extreme e, double[] from, double[] to, LoopMetrics m, double s, int[] axes)
    {
        var reach = 1.0;
        foreach (var i in axes)
        {
            var d = to[i] - from[i];
            var a = _box.Axes[i];
            if (d != 0)
            {
                reach = Math.Min(reach, ((d > 0 ? a.High : a.Low) - to[i]) / d);
            }
        }

        if (!(reach > 1e-9))
        {
            return (to, m, s);
        }

        double[] At(double lambda)
        {
            var p = (double[])to.Clone();
            foreach (var i in axes)
            {
                var a = _box.Axes[i];
                p[i] = Math.Clamp(to[i] + (lambda * (to[i] - from[i])), Math.Min(a.Low, a.High), Math.Max(a.Low, a.High));
            }

            return p;
        }

        (LoopMetrics M, double S) Eval(double lambda)
        {
            var mm = Evaluate(At(lambda));
            return (mm, Score(e, mm));
        }

        var invPhi = (Math.Sqrt(5) - 1) / 2;
        var (lo, hi) = (0.0, reach);
        var c = hi - (invPhi * (hi - lo));
        var dd = lo + (invPhi * (hi - lo));
        var (mc, sc) = Eval(c);
        var (md, sd) = Eval(dd);
        for (var k = 0; k < GoldenIterations; k++)
        {
            if (sc > sd)
            {
                (hi, dd, md, sd) = (dd, c, mc, sc);
                c = hi - (invPhi * (hi - lo));
                (mc, sc) = Eval(c);
            }
            else
            {
                (lo, c, mc, sc) = (c, dd, md, sd);
                dd = lo + (invPhi * (hi - lo));
                (md, sd) = Eval(dd);
            }
        }

        var (lambdaBest, mBest, sBest) = sc > sd ? (c, mc, sc) : (dd, md, sd);
        return sBest > s + (1e-12 * Math.Max(1, Math.Abs(s))) ? (At(lambdaBest), mBest, sBest) : (to, m, s);
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
