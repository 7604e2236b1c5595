using SpecLint.Core.Spec;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis;

/// <summary>
/// Where an adjustable Rf is worst (references.md §D7): both ends of the range, and, when they lie inside it, the
/// setting with the lowest phase margin, the one with the most peaking and the one with the least bandwidth. The worst
/// loop figure can sit inside the range (a fixed Cf is right for one Rf only), so the ends alone are not enough:
/// every position of a digital potentiometer is tried, and a continuous one on a fine logarithmic grid refined by
/// golden-section search.
/// </summary>
internal static class AdjustableSearch
{
    private const int GridPoints = 241;
    private const int MaxExhaustiveSteps = 4096;

    /// <summary>The positions to check, lowest first, each with its label.</summary>
    public static IReadOnlyList<(Resistance Element, string Label)> Positions(TiaSpec channel)
    {
        var a = channel.Feedback.Adjustable ?? throw new ArgumentException("the spec has no adjustable resistance", nameof(channel));
        var lo = a.Low.Ohms;
        var hi = a.High.Ohms;
        var grid = Grid(a);
        var figures = grid.Select(r => Figures(channel, r)).ToArray();

        var result = new List<(double R, string Why)> { (lo, "lowest"), (hi, "highest") };
        AddWorst(result, channel, a, grid, figures, f => f.Pm ?? double.PositiveInfinity, minimise: true, "lowest phase margin");
        AddWorst(result, channel, a, grid, figures, f => f.Peaking, minimise: false, "most peaking");
        AddWorst(result, channel, a, grid, figures, f => f.Bandwidth ?? double.PositiveInfinity, minimise: true, "least bandwidth");

        return [.. result
            .OrderBy(p => p.R)
            .Select(p => (new Resistance(p.R), $"Rf {QuantityFormat.FormatRounded(p.R + a.WiperResistance.Ohms, Dimension.Resistance)} ({p.Why})"))];
    }

    private static double[] Grid(AdjustableResistance a)
    {
        var lo = a.Low.Ohms;
        var hi = a.High.Ohms;
        if (a.Steps is { } n && n <= MaxExhaustiveSteps)
        {
            return [.. Enumerable.Range(0, n).Select(k => lo + ((hi - lo) * k / (n - 1)))];
        }

        return [.. Enumerable.Range(0, GridPoints).Select(k => lo * Math.Pow(hi / lo, (double)k / (GridPoints - 1)))];
    }

    private static (double? Pm, double? Bandwidth, double Peaking) Figures(TiaSpec channel, double element)
    {
        var view = GainViews.At(channel, new Resistance(element), "");
        var (pm, bw, pk) = TiaAnalyzer.LoopFigures(CircuitFactory.Nominal(view));
        return (pm, bw, pk);
    }

    private static void AddWorst(
        List<(double R, string Why)> result,
        TiaSpec channel,
        AdjustableResistance a,
        double[] grid,
        (double? Pm, double? Bandwidth, double Peaking)[] figures,
        Func<(double? Pm, double? Bandwidth, double Peaking), double> metric,
        bool minimise,
        string why)
    {
        var sign = minimise ? 1 : -1;
        var best = 0;
        for (var i = 1; i < grid.Length; i++)
        {
            if (sign * metric(figures[i]) < sign * metric(figures[best]))
            {
                best = i;
            }
        }

        if (best == 0 || best == grid.Length - 1 || !double.IsFinite(metric(figures[best])))
        {
            return;
        }

        // Peaking of zero everywhere has no worst position.
        if (!minimise && metric(figures[best]) <= 0)
        {
            return;
        }

        var r = grid[best];
        if (a.Steps is null || a.Steps > MaxExhaustiveSteps)
        {
            r = Refine(grid[best - 1], grid[best + 1], x => sign * metric(Figures(channel, x)));
        }

        if (Math.Abs(metric(figures[0]) - metric(figures[best])) < 1e-9 * Math.Abs(metric(figures[0])))
        {
            return;
        }

        // Two figures worst at (nearly) the same setting share one position and name both.
        var same = result.FindIndex(p => Math.Abs(p.R - r) <= 1e-3 * r);
        if (same < 0)
        {
            result.Add((r, why));
        }
        else if (same > 1)
        {
            result[same] = (result[same].R, result[same].Why + ", " + why);
        }
    }

    /// <summary>Golden-section search for the minimum of <paramref name="f"/> on [a, b], in ln R.</summary>
    private static double Refine(double a, double b, Func<double, double> f)
    {
        var invPhi = (Math.Sqrt(5) - 1) / 2;
        var la = Math.Log(a);
        var lb = Math.Log(b);
        var c = lb - (invPhi * (lb - la));
        var d = la + (invPhi * (lb - la));
        var fc = f(Math.Exp(c));
        var fd = f(Math.Exp(d));
        for (var i = 0; i < 40; i++)
        {
            if (fc < fd)
            {
                lb = d;
                d = c;
                fd = fc;
                c = lb - (invPhi * (lb - la));
                fc = f(Math.Exp(c));
            }
            else
            {
                la = c;
                c = d;
                fc = fd;
                d = la + (invPhi * (lb - la));
                fd = f(Math.Exp(d));
            }
        }

        return Math.Exp(fc < fd ? c : d);
    }
}
