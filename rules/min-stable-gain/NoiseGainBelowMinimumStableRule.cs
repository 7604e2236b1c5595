using SpecLint.Core.Analysis;
using System.Globalization;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Fixes;

namespace SpecLint.Rules.BuiltIn;

/// <summary>Flags a decompensated op-amp whose high-frequency noise gain 1 + Cin/(Cf + Cpar) is below its minimum stable gain.</summary>
public sealed class NoiseGainBelowMinimumStableRule : IRule
{
    /// <summary>The descriptor.</summary>
    public static RuleDescriptor Info { get; } = new(
        "min-stable-gain", "The high-frequency noise gain 1 + Cin/Cf reaches a decompensated op-amp's minimum stable gain", Severity.Error);

    /// <inheritdoc />
    public RuleDescriptor Descriptor => Info;

    /// <summary>The lowest high-frequency noise gain over the spreads: least input capacitance, most feedback capacitance.</summary>
    public static double WorstNoiseGain(Core.Spec.Model.TiaSpec spec)
    {
        ArgumentNullException.ThrowIfNull(spec);
        var amp = spec.Amplifier;
        var cin = spec.Input.Capacitance.Min + amp.CommonModeCapacitance + amp.DifferentialCapacitance + spec.Board.StrayCapacitance.Min;
        var cfb = (spec.Feedback.Capacitance?.Max ?? Capacitance.Zero) + spec.Feedback.ParasiticCapacitance.Max;
        return cfb.Farads <= 0 ? double.PositiveInfinity : 1 + (cin / cfb);
    }

    /// <inheritdoc />
    public IEnumerable<Finding> Check(RuleContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var spec = context.Spec;
        if (spec.Amplifier.MinStableGain is not { } gmin || gmin.Linear <= 1)
        {
            yield break;
        }

        var nominal = context.Analysis.NoiseGainHighFrequency;
        var worst = Math.Min(nominal, WorstNoiseGain(spec));
        if (worst >= gmin.Linear)
        {
            yield break;
        }

        var floor = PhaseMarginBelowFloorRule.FloorFor(context);
        var search = SearchCf(context, gmin.Linear, floor);
        Capacitance? fix = search.Value is { } found ? new Capacitance(found) : null;
        const string Otherwise = "add capacitance at the inverting input to raise the noise gain, or use a unity-gain-stable op-amp.";
        var advice = fix is { } c
            ? string.Create(CultureInfo.InvariantCulture, $" Cf = {SpecEdits.CfText(spec, c)} reaches it with the {floor.Degrees:0.#}° phase-margin floor kept (re-checked).")
            : search is { Closest: { } closest, RejectedBy: { } by } && by != Info.Id
                ? string.Create(CultureInfo.InvariantCulture, $" Cf = {SpecEdits.CfText(spec, new Capacitance(closest))} would reach it, but {by} rejects it ({search.Requirement}); otherwise {Otherwise}")
                : string.Create(CultureInfo.InvariantCulture, $" No standard Cf reaches it and keeps the {floor.Degrees:0.#}° phase-margin floor: {Otherwise}");
        var where = nominal < gmin.Linear
            ? string.Create(CultureInfo.InvariantCulture, $"{nominal:0.##}")
            : string.Create(CultureInfo.InvariantCulture, $"{nominal:0.##} at nominal and {worst:0.##} with the smallest Cin and largest Cf");
        yield return context.Report(spec.Feedback.Capacitance is null ? "/amplifier/min-stable-gain" : "/feedback/capacitance",
            string.Create(CultureInfo.InvariantCulture, $"the high-frequency noise gain 1 + Cin/(Cf + Cpar) is {where}, below the op-amp's minimum stable gain of {gmin.Linear:0.##}; a decompensated op-amp oscillates there.") + advice,
            fix is { } v ? new FixSuggestion("/feedback/capacitance", SpecEdits.CfText(spec, v)) : null);
    }

    // Walks down from the Cf that gives exactly the minimum stable gain; a failed search names the rule that
    // stopped the candidate that came closest.
    private static FixSearchResult SearchCf(RuleContext context, double gmin, Angle floor)
    {
        var spec = context.Spec;
        var c = context.Circuit;
        var start = (c.Cin.Farads / (gmin - 1)) - c.Cpar.Farads;
        var series = StandardValueSearch.SeriesFor(spec.Feedback.Capacitance, ESeries.E12);
        FixCondition[] conditions =
        [
            new(Info.Id, string.Create(CultureInfo.InvariantCulture, $"noise gain ≥ {gmin:0.##}"), edited => WorstNoiseGain(edited) >= gmin),
            new(PhaseMarginBelowFloorRule.Info.Id, string.Create(CultureInfo.InvariantCulture, $"phase margin ≥ {floor.Degrees:0.#}°"),
                edited => context.ReanalyzeNominal(edited).Analysis.PhaseMargin is { } n && n.Degrees >= floor.Degrees
                    && context.Reanalyze(edited).WorstPhaseMarginDeg is { } pm && pm >= floor.Degrees),
        ];
        return StandardValueSearch.Search(context, series, start, upward: false, cf => SpecEdits.WithCf(spec, new Capacitance(cf)), conditions, steps: 6);
    }
}
