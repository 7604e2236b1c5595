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
        var search = SearchCf(context, limitDb);
        Capacitance? fix = search.Value is { } found ? new Capacitance(found) : null;
        var advice = fix is { } c
            ? $" Cf = {SpecEdits.CfText(context.Spec, c)} keeps it within the limit (re-checked)."
            : search is { Closest: { } closest, RejectedBy: { } by } && by != Info.Id
                ? $" Cf = {SpecEdits.CfText(context.Spec, new Capacitance(closest))} would keep it within the limit, but {by} rejects it ({search.Requirement})."
                : " No standard Cf brings it within the limit.";
        yield return context.Report(context.Spec.Feedback.Capacitance is null ? "/feedback" : "/feedback/capacitance",
            string.Create(CultureInfo.InvariantCulture, $"the transimpedance peaks {where}, above the {limitDb:0.#} dB limit: steps overshoot and noise near the peak is amplified.") + advice,
            fix is { } v ? new FixSuggestion("/feedback/capacitance", SpecEdits.CfText(context.Spec, v)) : null);
    }

    // Walks up from the current Cf (never below a real part); a failed search names the rule that stopped the
    // candidate that came closest, so the message can say what stands in the way.
    private static FixSearchResult SearchCf(RuleContext context, double limitDb)
    {
        var start = Math.Max(context.Circuit.Cf.Farads, CfForFloor.SmallestPart(context).Farads);
        var series = StandardValueSearch.SeriesFor(context.Spec.Feedback.Capacitance, ESeries.E12);
        FixCondition[] conditions =
        [
            new(Info.Id, string.Create(CultureInfo.InvariantCulture, $"peaking ≤ {limitDb:0.#} dB"), edited =>
            {
                // The nominal peak is tested first: the worst corner is never lower, and the corners cost far more.
                if (context.ReanalyzeNominal(edited).Analysis.PeakingDb > limitDb)
                {
                    return false;
                }

                var r = context.Reanalyze(edited);
                return Math.Max(r.Analysis.PeakingDb, r.Tolerances?.PeakingDbMax ?? double.NegativeInfinity) <= limitDb;
            }),
        ];
        return StandardValueSearch.Search(context, series, start, upward: true, c => SpecEdits.WithCf(context.Spec, new Capacitance(c)), conditions, steps: 24);
    }
}
