using SpecLint.Core.Analysis;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Fixes;

/// <summary>
/// Walks a standard series from a starting value, in one direction, until a candidate passes a check
/// (typically: re-run the analysis with it). Bounded, so a hopeless design ends with "no value works".
/// </summary>
public static class StandardValueSearch
{
    /// <summary>The default number of candidates tried before giving up.</summary>
    public const int DefaultSteps = 12;

    /// <summary>
    /// The series a part's tolerance implies (IEC 60063), for a spread of this quantity. Capacitors stop at
    /// E24: ceramic capacitors are stocked in E12/E24 values whatever their tolerance (common practice).
    /// </summary>
    public static ESeries SeriesFor<T>(Spread<T>? spread, ESeries whenExact)
        where T : struct, IQuantity<T>
    {
        if (spread is not { } s || s.RelativeTolerance <= 0)
        {
            return whenExact;
        }

        var series = ESeries.ForTolerance(s.RelativeTolerance);
        return T.Dimension == Dimension.Capacitance && series.Values.Length > ESeries.E24.Values.Length ? ESeries.E24 : series;
    }

    /// <summary>
    /// The first standard value at or above <paramref name="start"/> (upward) or at or below it (downward)
    /// that passes <paramref name="accept"/>; null when none of the next <paramref name="steps"/> values does.
    /// </summary>
    public static double? Find(ESeries series, double start, bool upward, Func<double, bool> accept, int steps = DefaultSteps)
    {
        ArgumentNullException.ThrowIfNull(series);
        ArgumentNullException.ThrowIfNull(accept);
        if (!(start > 0) || !double.IsFinite(start))
        {
            return null;
        }

        var candidate = upward ? series.NextUpOrEqual(start) : series.NextDownOrEqual(start);
        for (var i = 0; i < steps; i++)
        {
            if (accept(candidate))
            {
                return candidate;
            }

            candidate = upward ? series.NextUp(candidate) : series.NextDown(candidate);
        }

        return null;
    }

    /// <summary>
    /// The fix search rules use: walks the series, builds the edited spec for each candidate, and accepts the
    /// first one that passes the rule's own check and trips no error-level rule that was clean before. Returns
    /// null without searching while the engine is verifying another rule's fix.
    /// </summary>
    public static double? Find(
        RuleContext context,
        ESeries series,
        double start,
        bool upward,
        Func<double, TiaSpec> edit,
        Func<TiaSpec, bool> accept,
        int steps = DefaultSteps)
    {
        ArgumentNullException.ThrowIfNull(context);
        ArgumentNullException.ThrowIfNull(edit);
        ArgumentNullException.ThrowIfNull(accept);
        if (!context.SearchFixes)
        {
            return null;
        }

        return Find(series, start, upward, candidate =>
        {
            var edited = edit(candidate);
            return accept(edited) && context.LeavesOtherRulesClean(edited);
        }, steps);
    }
}
