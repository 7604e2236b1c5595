using SpecLint.Core.Analysis;
using System.Globalization;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Fixes;

namespace SpecLint.Rules.BuiltIn;

/// <summary>Flags closed-loop transimpedance peaking above the limit, at nominal or at the worst corner.</summary>
public sealed class PeakingAboveLimitRule : IRule
{
    /// <summary>The largest acceptable peaking.</summary>
    public static readonly RuleOption Max = new("max", Dimension.Gain, "1 dB", "largest acceptable peaking; requirements.peaking overrides it");

    /// <summary>The descriptor.</summary>
    public static RuleDescriptor Info { get; } = new(
        "peaking", "Gain peaking of the transimpedance stays within the limit", Severity.Warning, [Max]);

    /// <inheritdoc />
    public RuleDescriptor Descriptor => Info;

    /// <inheritdoc />
    public IEnumerable<Finding> Check(RuleContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var limitDb = context.Spec.Requirements.PeakingDb ?? context.Option<Gain>(Max.Key).Decibels;
        var nominal = context.Analysis.PeakingDb;
        var worst = Math.Max(nominal, context.Tolerances?.PeakingDbMax ?? double.NegativeInfinity);
        if (worst <= limitDb + 1e-9 || context.Analysis.PhaseMargin is null)
        {
            yield break;
        }

        var where = nominal > limitDb
            ? string.Create(CultureInfo.InvariantCulture, $"{nominal:0.0} dB at nominal (at {Fmt.Hz(context.Analysis.PeakFrequency)})")
            : string.Create(CultureInfo.InvariantCulture, $"{nominal:0.0} dB at nominal but {worst:0.0} dB at {context.Tolerances!.PeakingMaxAt.Describe()}");
        var fix = SmallestCfWithin(context, limitDb);
        var advice = fix is { } c
            ? $" Cf = {SpecEdits.CfText(context.Spec, c)} keeps it within the limit (re-checked)."
            : " No standard Cf brings it within the limit.";
        yield return context.Report(context.Spec.Feedback.Capacitance is null ? "/feedback" : "/feedback/capacitance",
            string.Create(CultureInfo.InvariantCulture, $"the transimpedance peaks {where}, above the {limitDb:0.#} dB limit: steps overshoot and noise near the peak is amplified.") + advice,
            fix is { } v ? new FixSuggestion("/feedback/capacitance", SpecEdits.CfText(context.Spec, v)) : null);
    }

    private static Capacitance? SmallestCfWithin(RuleContext context, double limitDb)
    {
        var start = Math.Max(context.Circuit.Cf.Farads, CfForFloor.SmallestPart(context).Farads);
        var series = StandardValueSearch.SeriesFor(context.Spec.Feedback.Capacitance, ESeries.E12);
        var found = StandardValueSearch.Find(context, series, start, upward: true, c => SpecEdits.WithCf(context.Spec, new Capacitance(c)), edited =>
        {
            var r = context.Reanalyze(edited);
            var peak = Math.Max(r.Analysis.PeakingDb, r.Tolerances?.PeakingDbMax ?? double.NegativeInfinity);
            return peak <= limitDb;
        }, steps: 24);
        return found is { } f ? new Capacitance(f) : null;
    }
}
