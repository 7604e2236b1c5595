using SpecLint.Core.Analysis;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Fixes;

/// <summary>
/// The smallest standard feedback capacitor that gives at least a phase-margin floor, at nominal and (when
/// the spec has tolerances) at the worst corner. Starts from the exact-model solution and re-runs the full
/// analysis for every candidate, so the suggestion is never an asymptotic estimate.
/// </summary>
public static class CfForFloor
{
    /// <summary>The fix, or null when no standard value within reach restores the floor.</summary>
    public static FixSuggestion? Find(RuleContext context, Angle floor, Func<SpecAnalysis, bool>? alsoRequire = null)
    {
        ArgumentNullException.ThrowIfNull(context);
        var cf = Value(context, floor, alsoRequire);
        return cf is { } c ? new FixSuggestion("/feedback/capacitance", SpecEdits.CfText(context.Spec, c)) : null;
    }

    /// <summary>
    /// The smallest capacitor a fix may suggest: the <c>feedback-capacitor-size</c> rule's <c>min</c>, so that one
    /// rule's fix does not trip another (below it, layout parasitics decide the response).
    /// </summary>
    public static Capacitance SmallestPart(RuleContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        return context.OptionOf<Capacitance>(BuiltIn.FeedbackCapacitorTooSmallRule.Info, BuiltIn.FeedbackCapacitorTooSmallRule.Min.Key);
    }

    /// <summary>The capacitance itself, or null.</summary>
    public static Capacitance? Value(RuleContext context, Angle floor, Func<SpecAnalysis, bool>? alsoRequire = null) =>
        Search(context, floor, alsoRequire).Value is { } f ? new Capacitance(f) : null;

    /// <summary>
    /// The search itself: the capacitance, or the rule that rejected the candidate that came closest (the floor
    /// itself, or another rule's error that the larger Cf brings, such as a bandwidth requirement).
    /// </summary>
    public static FixSearchResult Search(RuleContext context, Angle floor, Func<SpecAnalysis, bool>? alsoRequire = null)
    {
        ArgumentNullException.ThrowIfNull(context);
        var start = DesignHelpers.FeedbackCapacitanceForPhaseMargin(context.Circuit, floor) is { } exact ? exact.Farads : context.Circuit.Cf.Farads;
        start = Math.Max(start, SmallestPart(context).Farads);

        var analysed = new Dictionary<TiaSpec, SpecAnalysis>(ReferenceEqualityComparer.Instance);
        SpecAnalysis Of(TiaSpec s) => analysed.TryGetValue(s, out var a) ? a : analysed[s] = context.Reanalyze(s);
        var conditions = new List<FixCondition>
        {
            // The nominal margin is tested first: the worst corner is never better, and the corners cost far more.
            new(BuiltIn.PhaseMarginBelowFloorRule.Info.Id, $"phase margin ≥ {Fmt.Q(floor)}", s => context.ReanalyzeNominal(s).Analysis.PhaseMargin is { } n && n.Degrees >= floor.Degrees
                && Of(s).WorstPhaseMarginDeg is { } w && w >= floor.Degrees),
        };
        if (alsoRequire is not null)
        {
            conditions.Add(new("the requirement this fix is for", "the caller's check", s => alsoRequire(Of(s))));
        }

        var series = StandardValueSearch.SeriesFor(context.Spec.Feedback.Capacitance, ESeries.E12);
        return StandardValueSearch.Search(context, series, start, upward: true, c => SpecEdits.WithCf(context.Spec, new Capacitance(c)), conditions, steps: 24);
    }
}
