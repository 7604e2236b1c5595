using System.Globalization;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Fixes;

namespace SpecLint.Rules.BuiltIn;

/// <summary>
/// Flags a design whose phase-margin floor or bandwidth requirement fails at the worst corner of its part
/// tolerances and temperature, and any class 2 dielectric in the feedback path.
/// </summary>
public sealed class ToleranceCornerFailsRule : IRule
{
    /// <summary>The descriptor.</summary>
    public static RuleDescriptor Info { get; } = new(
        "capacitor-tolerance", "The phase-margin floor and bandwidth still hold at the worst corner of part tolerances and temperature; no class 2 dielectric in the feedback path", Severity.Error);

    /// <inheritdoc />
    public RuleDescriptor Descriptor => Info;

    /// <inheritdoc />
    public IEnumerable<Finding> Check(RuleContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var spec = context.Spec;
        if (spec.Feedback.Dielectric is { } d && Dielectric.TryParse(d, out var dielectric) && dielectric.Class == 2)
        {
            yield return context.Report("/feedback/dielectric",
                $"the feedback capacitor is {d}, a class 2 dielectric: its capacitance moves with temperature (±15 % for X7R, +22/−82 % for Y5V), DC bias and age, so the compensation moves with it. Use C0G/NP0 (±30 ppm/K).",
                new FixSuggestion("/feedback/dielectric", "C0G"), Severity.Warning);
        }

        if (context.Tolerances is not { } t)
        {
            yield break;
        }

        // Only the spread is judged here: a design that already fails at nominal is reported by
        // phase-margin and bandwidth, and one root cause should not raise two errors.
        var floor = PhaseMarginBelowFloorRule.FloorFor(context);
        var required = spec.Requirements.Bandwidth;
        var nominal = context.Analysis;
        var nominalPmOk = nominal.PhaseMargin is { } npm && npm.Degrees >= floor.Degrees;
        var nominalBwOk = required is not { } r0 || (nominal.Bandwidth is { } nbw && nbw.Hertz >= r0.Hertz);
        var pmFails = nominalPmOk && (t.PhaseMarginMin is null || t.PhaseMarginMin.Value.Degrees < floor.Degrees);
        var bwFails = nominalBwOk && required is { } req && t.BandwidthMin is { } bmin && bmin.Hertz < req.Hertz;
        if (!pmFails && !bwFails)
        {
            yield break;
        }

        var parts = new List<string>();
        if (pmFails)
        {
            var pm = t.PhaseMarginMin is { } m ? string.Create(CultureInfo.InvariantCulture, $"{m.Degrees:0.0}°") : "undefined";
            parts.Add(string.Create(CultureInfo.InvariantCulture, $"phase margin falls to {pm} (floor {floor.Degrees:0.#}°) at {t.PhaseMarginMinAt.Describe()}"));
        }

        if (bwFails)
        {
            parts.Add($"bandwidth falls to {Fmt.Hz(t.BandwidthMin)} (required {Fmt.Hz(required)}) at {t.BandwidthMinAt.Describe()}");
        }

        // A margin problem wants a larger Cf (the smallest that holds); a bandwidth problem a smaller one (the largest that holds).
        var fix = pmFails
            ? CfForFloor.Find(context, floor, r => required is not { } q || (r.WorstBandwidthHz is { } w && w >= q.Hertz))
            : BandwidthBelowRequirementRule.LargestCfMeeting(context, required!.Value, floor) is { } c
                ? new FixSuggestion("/feedback/capacitance", SpecEdits.CfText(spec, c))
                : null;
        var yield = t.MonteCarlo is { } mc
            ? string.Create(CultureInfo.InvariantCulture, $" In {mc.Samples} Monte Carlo builds {100 * mc.Yield:0.#}% meet every requirement.")
            : "";
        var advice = fix is { } f
            ? $" Cf = {f.Value} holds at every corner (re-checked); tighter tolerances on the parts named also help."
            : " No standard Cf holds at every corner: tighten the tolerances named above, use a C0G capacitor, or choose an op-amp with a tighter GBW spread.";
        yield return context.Report(spec.Feedback.Capacitance is null ? "/feedback" : "/feedback/capacitance",
            "the design passes at nominal, but with the part tolerances and temperature range " + string.Join("; ", parts) + "." + yield + advice, fix);
    }
}
