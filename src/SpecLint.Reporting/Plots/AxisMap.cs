using System.Globalization;

namespace SpecLint.Reporting.Plots;

/// <summary>The resolved range of one axis and its mapping to pixels, plus its ticks.</summary>
internal sealed class AxisMap
{
    // Beyond this many decades only every n-th decade is labelled, so labels never collide.
    private const int MaxLabelledDecades = 8;

    private readonly double _p0;
    private readonly double _p1;

    private AxisMap(ChartAxis axis, double lo, double hi, double step, double p0, double p1)
    {
        Axis = axis;
        Lo = lo;
        Hi = hi;
        Step = step;
        _p0 = p0;
        _p1 = p1;
    }

    public ChartAxis Axis { get; }

    public double Lo { get; }

    public double Hi { get; }

    private double Step { get; }

    public bool IsLog => Axis.Scale == AxisScale.Log;

    /// <summary>Fits a range to the values (finite, and positive on a log axis), honouring fixed ends.</summary>
    public static AxisMap Fit(ChartAxis axis, IEnumerable<double> values, double p0, double p1, bool headroom = false)
    {
        var log = axis.Scale == AxisScale.Log;
        var usable = values.Where(v => IsUsable(v, log)).ToList();
        if (axis.Min is { } fixedMin && IsUsable(fixedMin, log))
        {
            usable.Add(fixedMin);
        }

        if (axis.Max is { } fixedMax && IsUsable(fixedMax, log))
        {
            usable.Add(fixedMax);
        }

        if (log)
        {
            double lo, hi;
            if (usable.Count == 0)
            {
                (lo, hi) = (1, 10);
            }
            else
            {
                var min = usable.Min();
                var max = usable.Max();
                lo = Pow10((int)Math.Floor(Math.Log10(headroom ? min / 1.12 : min) + 1e-12));
                // y-axes end at 1, 2 or 5 × 10ⁿ with a little room, so a flat curve at a decade does not hide in the frame.
                hi = headroom ? NiceAtOrAbove(max * 1.12) : Pow10((int)Math.Ceiling(Math.Log10(max) - 1e-12));
            }

            lo = axis.Min is { } a && a > 0 ? a : lo;
            hi = axis.Max is { } b && b > 0 ? b : hi;
            if (!(hi > lo))
            {
                hi = lo * 10;
            }

            return new AxisMap(axis, lo, hi, 0, p0, p1);
        }
        else
        {
            double min = usable.Count == 0 ? 0 : usable.Min();
            double max = usable.Count == 0 ? 1 : usable.Max();
            if (max == min)
            {
                // A flat series still needs a visible range around it.
                var pad = min == 0 ? 1 : Math.Abs(min) * 0.1;
                (min, max) = (min - pad, max + pad);
            }

            var step = axis.Step is { } s && s > 0 ? s : NiceStep((max - min) / 5);
            var lo = axis.Min ?? Math.Floor(Round(min / step)) * step;
            var hi = axis.Max ?? Math.Ceiling(Round(max / step)) * step;
            if (headroom)
            {
                // Data (or a reference line) flush with the frame is hard to see: leave one more step.
                var span = hi - lo;
                if (axis.Max is null && hi - max < span * 0.03)
                {
                    hi += step;
                }

                if (axis.Min is null && min - lo < span * 0.03)
                {
                    lo -= step;
                }
            }
            if (!(hi > lo))
            {
                hi = lo + step;
            }

            return new AxisMap(axis, lo, hi, step, p0, p1);
        }
    }

    public static bool IsUsable(double v, bool log) => double.IsFinite(v) && (!log || v > 0);

    public bool IsUsable(double v) => IsUsable(v, IsLog);

    /// <summary>Pixel position of <paramref name="v"/>; only for usable values.</summary>
    public double Map(double v)
    {
        var t = IsLog ? (Math.Log10(v) - Math.Log10(Lo)) / (Math.Log10(Hi) - Math.Log10(Lo)) : (v - Lo) / (Hi - Lo);
        // Far-off points would write huge coordinates; the plot is clipped anyway.
        return Math.Clamp(_p0 + (t * (_p1 - _p0)), -1e5, 1e5);
    }

    public bool Contains(double v) => IsUsable(v) && v >= Lo * (1 - 1e-9) - 1e-12 && v <= Hi * (1 + 1e-9) + 1e-12;

    public IReadOnlyList<AxisTick> Ticks()
    {
        var ticks = new List<AxisTick>();
        if (IsLog)
        {
            var k0 = (int)Math.Floor(Math.Log10(Lo) + 1e-9);
            var k1 = (int)Math.Ceiling(Math.Log10(Hi) - 1e-9);
            var decades = k1 - k0;
            var stride = Math.Max(1, (int)Math.Ceiling(decades / (double)MaxLabelledDecades));
            for (var k = k0; k <= k1; k++)
            {
                var decade = Pow10(k);
                if (Contains(decade))
                {
                    var labelled = ((k % stride) + stride) % stride == 0;
                    ticks.Add(new AxisTick(decade, labelled, labelled ? Axis.Unit.Format(decade) : ""));
                }

                for (var m = 2; m <= 9; m++)
                {
                    var v = m * decade;
                    if (Contains(v))
                    {
                        // Within a single decade the 2…9 ticks are the only ones, so label them.
                        var label = decades <= 1 && (m == 2 || m == 5) ? Axis.Unit.Format(v) : "";
                        ticks.Add(new AxisTick(v, false, label));
                    }
                }
            }

            return ticks;
        }

        var count = (int)Math.Round((Hi - Lo) / Step);
        var labelEvery = Math.Max(1, (int)Math.Ceiling(count / 10.0));
        var first = Math.Ceiling(Round(Lo / Step));
        for (var i = 0; ; i++)
        {
            var v = Round((first + i) * Step);
            if (v > Hi + (Step * 1e-9))
            {
                break;
            }

            var n = (long)(first + i);
            var labelled = n % labelEvery == 0;
            ticks.Add(new AxisTick(v == 0 ? 0 : v, labelled, labelled ? Axis.Unit.Format(v) : ""));
            if (i > 1000)
            {
                break;
            }
        }

        return ticks;
    }

    /// <summary>1, 2 or 5 × 10ⁿ at or above <paramref name="rough"/>.</summary>
    internal static double NiceStep(double rough)
    {
        if (!(rough > 0) || !double.IsFinite(rough))
        {
            return 1;
        }

        var k = Math.Floor(Math.Log10(rough));
        var unit = Pow10((int)k);
        var f = rough / unit;
        var nice = f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10;
        return Round(nice * unit);
    }

    /// <summary>The smallest 1, 2 or 5 × 10ⁿ at or above <paramref name="v"/> (v &gt; 0).</summary>
    internal static double NiceAtOrAbove(double v)
    {
        var k = (int)Math.Floor(Math.Log10(v));
        foreach (var m in new[] { 1, 2, 5, 10 })
        {
            var candidate = Round(m * Pow10(k));
            if (candidate >= v * (1 - 1e-12))
            {
                return candidate;
            }
        }

        return Pow10(k + 1);
    }

    // Exact decades from text: Math.Pow(10, -9) is not the double nearest to 1e-9.
    private static double Pow10(int k) => double.Parse("1e" + k.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    private static double Round(double v) => double.Parse(v.ToString("G12", CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
}
