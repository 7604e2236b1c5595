using System.Globalization;
using SpecLint.Core.Analysis;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Fixes;

namespace SpecLint.Rules.BuiltIn;

/// <summary>Flags an output range (zero signal to full scale, with DC errors) that leaves the rails' usable span.</summary>
public sealed class OutputOutsideRailsRule : IRule
{
    /// <summary>Room kept inside each swing limit.</summary>
    public static readonly RuleOption Margin = new("margin", Dimension.Voltage, "100 mV", "extra room kept between the output and each swing limit");

    /// <summary>The descriptor.</summary>
    public static RuleDescriptor Info { get; } = new(
        "output-headroom", "The output stays inside the rails with a margin, DC errors included, at the low end of the supply", Severity.Error, [Margin]);

    /// <inheritdoc />
    public RuleDescriptor Descriptor => Info;

    /// <summary>The usable output span: rails at the low end of their tolerance, less the swing limits and the margin.</summary>
    public static (Voltage Low, Voltage High) UsableSpan(RuleContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var spec = context.Spec;
        var margin = context.OptionOf<Voltage>(Info, Margin.Key);
        var high = spec.Conditions.SupplyPositive.Min - spec.Amplifier.SwingToPositive - margin;
        var low = spec.Conditions.SupplyNegative.Max + spec.Amplifier.SwingToNegative + margin;
        return (low, high);
    }

    /// <summary>Whether an analysis result's output range fits the span.</summary>
    public static bool Fits(OutputRange output, (Voltage Low, Voltage High) span) =>
        output.Min >= span.Low && output.Max <= span.High;

    /// <inheritdoc />
    public IEnumerable<Finding> Check(RuleContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var span = UsableSpan(context);
        var o = context.Analysis.Output;
        if (Fits(o, span))
        {
            yield break;
        }

        var spec = context.Spec;
        var problems = new List<string>();
        if (o.Max > span.High)
        {
            problems.Add($"the output reaches {Fmt.Q(o.Max)}, above the {Fmt.Q(span.High)} limit (positive rail {Fmt.Q(spec.Conditions.SupplyPositive.Min)} at the low end of its tolerance, less {Fmt.Q(spec.Amplifier.SwingToPositive)} swing limit and {Fmt.Q(context.OptionOf<Voltage>(Info, Margin.Key))} margin)");
        }

        if (o.Min < span.Low)
        {
            problems.Add($"the output goes down to {Fmt.Q(o.Min)}, below the {Fmt.Q(span.Low)} limit (negative rail {Fmt.Q(spec.Conditions.SupplyNegative.Max)}, plus {Fmt.Q(spec.Amplifier.SwingToNegative)} swing limit and {Fmt.Q(context.OptionOf<Voltage>(Info, Margin.Key))} margin)");
        }

        var search = SearchRf(context, span);
        Resistance? rf = search.Value is { } found ? new Resistance(found) : null;
        var detail = string.Create(CultureInfo.InvariantCulture,
            $" Range: {Fmt.Q(o.Min)} .. {Fmt.Q(o.Max)} from zero signal to full scale {Fmt.Q(spec.Input.CurrentMax)}, including ±{Fmt.Q(o.ErrorBand)} of offset and bias-current error.");
        var advice = rf is { } r
            ? $" Use Rf = {SpecEdits.RfText(spec, r)}, the largest standard value that fits (re-checked)."
            : search is { Closest: { } closest, RejectedBy: { } by } && by != Info.Id
                ? $" Rf = {SpecEdits.RfText(spec, new Resistance(closest))} would fit, but {by} rejects it ({search.Requirement}); otherwise move the bias voltage, widen the supply or reduce the full-scale current."
                : " No standard Rf fits: move the bias voltage, widen the supply or reduce the full-scale current.";
        yield return context.Report("/feedback/resistance",
            "the output clips: " + string.Join("; ", problems) + "." + detail + advice,
            rf is { } v ? new FixSuggestion("/feedback/resistance", SpecEdits.RfText(spec, v)) : null);
    }

    // Walks down from the largest Rf that fits by the closed form; a failed search names the rule that stopped
    // the candidate that came closest.
    private static FixSearchResult SearchRf(RuleContext context, (Voltage Low, Voltage High) span)
    {
        var spec = context.Spec;
        var series = StandardValueSearch.SeriesFor<Resistance>(spec.Feedback.Resistance, ESeries.E96);
        var worstRails = context.Circuit with { SupplyPositive = spec.Conditions.SupplyPositive.Min, SupplyNegative = spec.Conditions.SupplyNegative.Max };
        var start = DesignHelpers.LargestRfForHeadroom(worstRails, context.OptionOf<Voltage>(Info, Margin.Key)) is { } r && double.IsFinite(r.Ohms) ? r.Ohms : spec.Feedback.Resistance.Typ.Ohms;
        FixCondition[] conditions =
        [
            new(Info.Id, $"output inside {Fmt.Q(span.Low)} .. {Fmt.Q(span.High)}", edited => Fits(context.ReanalyzeNominal(edited).Analysis.Output, span)),
        ];
        return StandardValueSearch.Search(context, series, Math.Min(start, spec.Feedback.Resistance.Typ.Ohms), upward: false,
            c => SpecEdits.WithRf(spec, new Resistance(c)), conditions, steps: 24);
    }
}
