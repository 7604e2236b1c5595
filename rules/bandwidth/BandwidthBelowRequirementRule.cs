using SpecLint.Core.Analysis;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Fixes;

namespace SpecLint.Rules.BuiltIn;

/// <summary>Flags a closed-loop bandwidth below <c>requirements.bandwidth</c> at nominal or at the worst corner.</summary>
public sealed class BandwidthBelowRequirementRule : IRule
{
    /// <summary>The descriptor.</summary>
    public static RuleDescriptor Info { get; } = new(
        "bandwidth", "The closed-loop −3 dB bandwidth meets requirements.bandwidth at the worst corner", Severity.Error);

    /// <inheritdoc />
    public RuleDescriptor Descriptor => Info;

    /// <inheritdoc />
    public IEnumerable<Finding> Check(RuleContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        if (context.Spec.Requirements.Bandwidth is not { } required)
        {
            yield break;
        }

        var nominal = context.Analysis.Bandwidth;
        var worst = context.Current.WorstBandwidthHz;
        if (worst is { } w && w >= required.Hertz)
        {
            yield break;
        }

        var where = context.Tolerances is { } t && (nominal is null || nominal.Value.Hertz >= required.Hertz)
            ? $"{Fmt.Hz(nominal)} at nominal but {Fmt.Hz(t.BandwidthMin)} at {t.BandwidthMinAt.Describe()}"
            : $"{Fmt.Hz(nominal)} at nominal";
        var floor = PhaseMarginBelowFloorRule.FloorFor(context);
        var search = SearchCf(context, required, floor);
        var advice = search.Value is { } v
            ? $" Cf = {SpecEdits.CfText(context.Spec, new Capacitance(v))} meets it with the {floor.Degrees:0.#}° phase-margin floor kept (re-checked)."
            : Unreachable(context, search, floor);
        yield return context.Report("/requirements/bandwidth",
            $"the closed-loop bandwidth is {where}, below the required {Fmt.Hz(required)}." + advice,
            search.Value is { } c ? new FixSuggestion("/feedback/capacitance", SpecEdits.CfText(context.Spec, new Capacitance(c))) : null);
    }

    /// <summary>The largest standard Cf at or below the current one that meets the bandwidth and the floor at every corner.</summary>
    public static Capacitance? LargestCfMeeting(RuleContext context, Frequency required, Angle floor)
    {
        ArgumentNullException.ThrowIfNull(context);
        return SearchCf(context, required, floor).Value is { } f ? new Capacitance(f) : null;
    }

    // Walks down from the current Cf. A candidate must meet the bandwidth, keep the floor, and stay a real part
    // (feedback-capacitor-size's minimum, so that this fix does not trip that rule); a failed search names the
    // rule that stopped the candidate that came closest.
    private static FixSearchResult SearchCf(RuleContext context, Frequency required, Angle floor)
    {
        if (context.Spec.Feedback.Capacitance is not { } cf)
        {
            return FixSearchResult.NotSearched;
        }

        var smallest = CfForFloor.SmallestPart(context);
        var analysed = new Dictionary<TiaSpec, SpecAnalysis>(ReferenceEqualityComparer.Instance);
        SpecAnalysis Of(TiaSpec s) => analysed.TryGetValue(s, out var a) ? a : analysed[s] = context.Reanalyze(s);
        var series = StandardValueSearch.SeriesFor<Capacitance>(cf, ESeries.E12);
        FixCondition[] conditions =
        [
            // The nominal figure is tested first: the worst corner is never better, and the corners cost far more.
            new(Info.Id, $"bandwidth ≥ {Fmt.Hz(required)}", s => context.ReanalyzeNominal(s).Analysis.Bandwidth is { } n && n.Hertz >= required.Hertz
                && Of(s).WorstBandwidthHz is { } b && b >= required.Hertz),
            new(PhaseMarginBelowFloorRule.Info.Id, $"phase margin ≥ {floor.Degrees:0.#}°", s => context.ReanalyzeNominal(s).Analysis.PhaseMargin is { } n && n.Degrees >= floor.Degrees
                && Of(s).WorstPhaseMarginDeg is { } p && p >= floor.Degrees),
            new(FeedbackCapacitorTooSmallRule.Info.Id, $"Cf ≥ {Fmt.Q(smallest)}", s => s.Feedback.Capacitance is { } c && c.Typ.Farads >= smallest.Farads * (1 - 1e-9)),
        ];
        return StandardValueSearch.Search(context, series, cf.Typ.Farads, upward: false, c => SpecEdits.WithCf(context.Spec, new Capacitance(c)), conditions, steps: 24);
    }

    private static string Unreachable(RuleContext context, FixSearchResult search, Angle floor)
    {
        var sw = context.Spec.Feedback.Switch;
        var others = context.Spec.Feedback.Settings.Length - 1;
        // Below its own corners an unselected branch is its open switch's capacitance across the feedback.
        var otherwise = sw is { OffCapacitance.Farads: > 0 } && others > 0
            ? $"lower Rf, reduce the input capacitance, use an op-amp with more GBW, or a switch with less off-capacitance: the {others} other setting{(others == 1 ? "" : "s")} put{(others == 1 ? "s" : "")} about {Fmt.Q(new Capacitance(others * sw.OffCapacitance.Farads))} across Rf through the open switch{(others == 1 ? "" : "es")}."
            : "lower Rf, reduce the input capacitance, or use an op-amp with more GBW.";
        if (search.Closest is not { } closest)
        {
            return $" No standard Cf meets it while keeping the {floor.Degrees:0.#}° phase-margin floor: {otherwise}";
        }

        if (search.RejectedBy == Info.Id)
        {
            return $" No standard Cf meets it, whatever the phase margin: {otherwise}";
        }

        var text = SpecEdits.CfText(context.Spec, new Capacitance(closest));
        return search.RejectedBy == PhaseMarginBelowFloorRule.Info.Id
            ? $" No standard Cf meets it while keeping the {floor.Degrees:0.#}° phase-margin floor: phase-margin rejects Cf = {text}, the largest that meets the bandwidth, and every smaller one tried. Otherwise {otherwise}"
            : $" Cf = {text} would meet it with the {floor.Degrees:0.#}° phase-margin floor kept, but {search.RejectedBy} rejects it ({search.Requirement}). Otherwise {otherwise}";
    }
}
