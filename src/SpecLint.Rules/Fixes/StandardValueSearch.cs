using SpecLint.Core.Analysis;
using SpecLint.Core.Units;

namespace SpecLint.Rules.Fixes;

/// <summary>
/// Walks a standard series from a starting value, in one direction, until a candidate passes a check
/// (typically: re-run the analysis with it). Bounded, so a hopeless design ends with "no value works".
/// </summary>
public static class StandardValueSearch
{
    /// <summary>The default number of candidates tried before giving up.</summary>
    public const int DefaultSteps = 12;

    /// <summary>The series a part's tolerance implies (IEC 60063), for a spread of this quantity.</summary>
    public static ESeries SeriesFor<T>(Spread<T>? spread, ESeries whenExact)
        where T : struct, IQuantity<T>
    {
        if (spread is not { } s || s.RelativeTolerance <= 0)
        {
            return whenExact;
        }

        return ESeries.ForTolerance(s.RelativeTolerance);
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
}
