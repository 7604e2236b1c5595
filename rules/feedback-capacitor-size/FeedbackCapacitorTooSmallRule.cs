using System.Globalization;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Fixes;

namespace SpecLint.Rules.BuiltIn;

/// <summary>Flags a feedback capacitor that is absent or so small that layout parasitics decide the response.</summary>
public sealed class FeedbackCapacitorTooSmallRule : IRule
{
    /// <summary>The smallest Cf that is a part rather than a parasitic.</summary>
    public static readonly RuleOption Min = new("min", Dimension.Capacitance, "0.5 pF", "smallest Cf that is a part rather than a parasitic");

    /// <summary>The largest share of the parasitic in Cf + Cpar.</summary>
    public static readonly RuleOption MaxParasiticShare = new("max-parasitic-share", Dimension.Ratio, "30 %", "largest share Cpar/(Cf + Cpar)");

    /// <summary>The descriptor.</summary>
    public static RuleDescriptor Info { get; } = new(
        "feedback-capacitor-size", "Cf is large enough that layout parasitics do not decide the response", Severity.Warning, [Min, MaxParasiticShare]);

    /// <inheritdoc />
    public RuleDescriptor Descriptor => Info;

    /// <inheritdoc />
    public IEnumerable<Finding> Check(RuleContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var fb = context.Spec.Feedback;
        var min = context.Option<Capacitance>(Min.Key);
        var maxShare = context.OptionSi(MaxParasiticShare.Key);
        var cpar = fb.ParasiticCapacitance.Typ;
        if (fb.Capacitance is not { } cfSpread)
        {
            var what = cpar.Farads > 0
                ? $"only the {Fmt.Q(cpar)} parasitic across Rf compensates the loop"
                : "nothing across Rf compensates the loop (not even a parasitic estimate)";
            yield return context.Report("/feedback", $"no feedback capacitor: {what}, so the layout, the resistor body and the assembly decide the response and it will differ from board to board. Fit a real Cf of at least {Fmt.Q(min)}.");
            yield break;
        }

        var cf = cfSpread.Typ;
        var share = cpar.Farads / (cf.Farads + cpar.Farads);
        if (cf < min)
        {
            yield return context.Report("/feedback/capacitance", string.Create(CultureInfo.InvariantCulture,
                $"Cf = {Fmt.Q(cf)} is below {Fmt.Q(min)}: a resistor body and its pads alone put 0.1–0.3 pF across Rf, so parasitics, not the part, set the response. Use Cf ≥ {Fmt.Q(min)} (and accept the lower bandwidth) or split the gain over two stages."));
        }
        else if (share > maxShare)
        {
            yield return context.Report("/feedback/capacitance", string.Create(CultureInfo.InvariantCulture,
                $"the {Fmt.Q(cpar)} parasitic is {100 * share:0}% of the {Fmt.Q(cf + cpar)} across Rf (limit {100 * maxShare:0}%): the response depends on the layout. Use a larger Cf or reduce the parasitic (guard the Rf pads, use a longer resistor body)."));
        }
    }
}
