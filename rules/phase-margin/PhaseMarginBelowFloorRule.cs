using System.Globalization;
using SpecLint.Core.Analysis;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Fixes;

namespace SpecLint.Rules.BuiltIn;

/// <summary>Flags a loop whose phase margin is below the floor at nominal or at any tolerance corner, or undefined.</summary>
public sealed class PhaseMarginBelowFloorRule : IRule
{
    /// <summary>The floor option, shared by the rules that judge stability.</summary>
    public static readonly RuleOption Floor = new("floor", Dimension.Angle, "45 deg", "smallest acceptable phase margin; requirements.phase-margin overrides it");

    /// <summary>The descriptor.</summary>
    public static RuleDescriptor Info { get; } = new(
        "phase-margin", "Phase margin at nominal and at every tolerance corner stays above the floor", Severity.Error, [Floor]);

    /// <inheritdoc />
    public RuleDescriptor Descriptor => Info;

    /// <summary>The floor for this spec: its requirement, else the configured floor of this rule.</summary>
    public static Angle FloorFor(RuleContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        return context.Spec.Requirements.PhaseMargin ?? context.OptionOf<Angle>(Info, Floor.Key);
    }

    /// <inheritdoc />
    public IEnumerable<Finding> Check(RuleContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var floor = FloorFor(context);
        var a = context.Analysis;
        var at = context.Spec.Feedback.Capacitance is null ? "/feedback" : "/feedback/capacitance";
        if (a.PhaseMargin is not { } pm)
        {
            yield return context.Report("/feedback/resistance", NeverCrosses(a));
            yield break;
        }

        if (pm.Degrees < floor.Degrees)
        {
            var (fix, fixText) = Fix(context, floor);
            yield return context.Report(at, string.Create(CultureInfo.InvariantCulture,
                $"phase margin is {pm.Degrees:0.0}° at nominal, below the {floor.Degrees:0.#}° floor (|T| = 1 at {Fmt.Hz(a.Crossover)}, peaking {a.PeakingDb:0.0} dB); the loop will ring.{fixText}"), fix);
            yield break;
        }

        if (context.Tolerances is { } t && (t.PhaseMarginMin is null || t.PhaseMarginMin.Value.Degrees < floor.Degrees))
        {
            var (fix, fixText) = Fix(context, floor);
            var worst = t.PhaseMarginMin is { } m ? string.Create(CultureInfo.InvariantCulture, $"{m.Degrees:0.0}°") : "undefined (|T| never reaches 1)";
            yield return context.Report(at, string.Create(CultureInfo.InvariantCulture,
                $"phase margin is {pm.Degrees:0.0}° at nominal but {worst} at the corner {t.PhaseMarginMinAt.Describe()}, below the {floor.Degrees:0.#}° floor.{fixText}"), fix);
        }
    }

    // Searched only once the margin fails: each candidate costs a full corner analysis.
    private static (FixSuggestion? Fix, string Text) Fix(RuleContext context, Angle floor)
    {
        var search = CfForFloor.Search(context, floor);
        var fix = search.Value is { } v ? new FixSuggestion("/feedback/capacitance", SpecEdits.CfText(context.Spec, new Capacitance(v))) : null;
        var fixText = fix is not null
            ? $" Use Cf = {fix.Value} (re-checked{(context.Tolerances is null ? "" : " at every corner")})."
            : search.Closest is { } closest && search.RejectedBy != Info.Id
                ? $" Cf = {SpecEdits.CfText(context.Spec, new Capacitance(closest))} would restore it, but {search.RejectedBy} rejects it ({search.Requirement}): reduce the input capacitance or Rf, or use an op-amp with more GBW."
                : " No standard Cf restores it: reduce the input capacitance or Rf, or use an op-amp with more GBW.";
        return (fix, fixText);
    }

    private static string NeverCrosses(AnalysisResult a) => string.Create(CultureInfo.InvariantCulture,
        $"the loop gain never reaches 1 (DC loop gain {a.LoopGainDc:G3}), so the phase margin is undefined and the op-amp cannot hold the summing node at the bias voltage; the shunt resistance is too low for this Rf, or the open-loop gain too small. Lower Rf or use a sensor with a higher shunt resistance.");
}
