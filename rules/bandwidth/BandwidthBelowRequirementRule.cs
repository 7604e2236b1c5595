using SpecLint.Core.Analysis;
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
        var fix = LargestCfMeeting(context, required, floor);
        var advice = fix is { } c
            ? $" Cf = {SpecEdits.CfText(context.Spec, c)} meets it with the {floor.Degrees:0.#}° phase-margin floor kept (re-checked)."
            : $" No standard Cf meets it while keeping the {floor.Degrees:0.#}° phase-margin floor: lower Rf, reduce the input capacitance, or use an op-amp with more GBW.";
        yield return context.Report("/requirements/bandwidth",
            $"the closed-loop bandwidth is {where}, below the required {Fmt.Hz(required)}." + advice,
            fix is { } v ? new FixSuggestion("/feedback/capacitance", SpecEdits.CfText(context.Spec, v)) : null);
    }

    /// <summary>The largest standard Cf at or below the current one that meets the bandwidth and the floor at every corner.</summary>
    public static Capacitance? LargestCfMeeting(RuleContext context, Frequency required, Angle floor)
    {
        ArgumentNullException.ThrowIfNull(context);
        if (context.Spec.Feedback.Capacitance is not { } cf)
        {
            return null;
        }

        var series = StandardValueSearch.SeriesFor<Capacitance>(cf, ESeries.E12);
        var found = StandardValueSearch.Find(context, series, cf.Typ.Farads, upward: false, c => SpecEdits.WithCf(context.Spec, new Capacitance(c)), edited =>
        {
            var r = context.Reanalyze(edited);
            return r.WorstBandwidthHz is { } b && b >= required.Hertz && r.WorstPhaseMarginDeg is { } p && p >= floor.Degrees;
        }, steps: 24);
        return found is { } f ? new Capacitance(f) : null;
    }
}
