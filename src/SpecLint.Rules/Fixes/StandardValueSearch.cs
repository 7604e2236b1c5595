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

    /// <summary>
    /// The fix search that says why it failed: walks the series like <see cref="Find(RuleContext, ESeries, double, bool, Func{double, TiaSpec}, Func{TiaSpec, bool}, int)"/>
    /// and tests each candidate against <paramref name="conditions"/> in order (the rule's own aim first), then
    /// against every other error-level rule. When no candidate passes, the result names the rule that rejected the
    /// candidate that got furthest, and that candidate.
    /// </summary>
    public static FixSearchResult Search(
        RuleContext context,
        ESeries series,
        double start,
        bool upward,
        Func<double, TiaSpec> edit,
        IReadOnlyList<FixCondition> conditions,
        int steps = DefaultSteps)
    {
        ArgumentNullException.ThrowIfNull(context);
        ArgumentNullException.ThrowIfNull(series);
        ArgumentNullException.ThrowIfNull(edit);
        ArgumentNullException.ThrowIfNull(conditions);
        if (!context.SearchFixes || !(start > 0) || !double.IsFinite(start))
        {
            return FixSearchResult.NotSearched;
        }

        var furthest = -1;
        FixSearchResult best = FixSearchResult.NotSearched;
        var candidate = upward ? series.NextUpOrEqual(start) : series.NextDownOrEqual(start);
        for (var i = 0; i < steps; i++)
        {
            var edited = edit(candidate);
            var passed = 0;
            string? rejectedBy = null;
            string? reason = null;
            foreach (var condition in conditions)
            {
                if (!condition.Holds(edited))
                {
                    (rejectedBy, reason) = (condition.Rule, condition.What);
                    break;
                }

                passed++;
            }

            if (rejectedBy is null)
            {
                var tripped = context.RulesTrippedBy(edited);
                if (tripped.Count == 0)
                {
                    return new FixSearchResult(candidate, null, null, null);
                }

                (rejectedBy, reason) = (string.Join(", ", tripped), "it reports an error");
            }

            if (passed > furthest)
            {
                furthest = passed;
                best = new FixSearchResult(null, rejectedBy, reason, candidate);
            }

            candidate = upward ? series.NextUp(candidate) : series.NextDown(candidate);
        }

        return best;
    }
}

/// <summary>A condition a fix candidate must meet: the rule it belongs to, what it asks, and the test on the edited spec.</summary>
/// <param name="Rule">The id of the rule whose requirement this is.</param>
/// <param name="What">The requirement in words, e.g. "Cf ≥ 0.5 pF".</param>
/// <param name="Holds">Whether the edited spec meets it.</param>
public sealed record FixCondition(string Rule, string What, Func<TiaSpec, bool> Holds);

/// <summary>
/// The outcome of <see cref="StandardValueSearch.Search"/>: the value found, or the rule that rejected the candidate
/// that came closest (<paramref name="Closest"/>), with its requirement in words.
/// </summary>
/// <param name="Value">The first candidate that passes every condition and trips no other rule, or null.</param>
/// <param name="RejectedBy">The id of the rule (or ids, comma-separated) that rejected <paramref name="Closest"/>.</param>
/// <param name="Requirement">What that rule asks, in words.</param>
/// <param name="Closest">The candidate that passed the most conditions, or null when none was tried.</param>
public sealed record FixSearchResult(double? Value, string? RejectedBy, string? Requirement, double? Closest)
{
    /// <summary>No search ran (fixes are off while another rule's fix is verified, or the start is not a value).</summary>
    public static FixSearchResult NotSearched { get; } = new(null, null, null, null);
}
