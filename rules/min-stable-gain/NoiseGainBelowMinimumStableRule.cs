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
        var fix = LargestCfReaching(context, gmin.Linear, floor);
        var advice = fix is { } c
            ? string.Create(CultureInfo.InvariantCulture, $" Cf = {SpecEdits.CfText(spec, c)} reaches it with the {floor.Degrees:0.#}° phase-margin floor kept (re-checked).")
            : string.Create(CultureInfo.InvariantCulture, $" No standard Cf reaches it and keeps the {floor.Degrees:0.#}° phase-margin floor: add capacitance at the inverting input to raise the noise gain, or use a unity-gain-stable op-amp.");
        var where = nominal < gmin.Linear
            ? string.Create(CultureInfo.InvariantCulture, $"{nominal:0.##}")
            : string.Create(CultureInfo.InvariantCulture, $"{nominal:0.##} at nominal and {worst:0.##} with the smallest Cin and largest Cf");
        yield return context.Report(spec.Feedback.Capacitance is null ? "/amplifier/min-stable-gain" : "/feedback/capacitance",
            string.Create(CultureInfo.InvariantCulture, $"the high-frequency noise gain 1 + Cin/(Cf + Cpar) is {where}, below the op-amp's minimum stable gain of {gmin.Linear:0.##}; a decompensated op-amp oscillates there.") + advice,
            fix is { } v ? new FixSuggestion("/feedback/capacitance", SpecEdits.CfText(spec, v)) : null);
    }

    private static Capacitance? LargestCfReaching(RuleContext context, double gmin, Angle floor)
    {
        var spec = context.Spec;
        var c = context.Circuit;
        var start = (c.Cin.Farads / (gmin - 1)) - c.Cpar.Farads;
        if (!(start > 0))
        {
            return null;
        }

        var series = StandardValueSearch.SeriesFor(spec.Feedback.Capacitance, ESeries.E12);
        var found = StandardValueSearch.Find(context, series, start, upward: false, c => SpecEdits.WithCf(spec, new Capacitance(c)), edited =>
        {
            if (WorstNoiseGain(edited) < gmin)
            {
                return false;
            }

            var r = context.Reanalyze(edited);
            return r.WorstPhaseMarginDeg is { } pm && pm >= floor.Degrees;
        }, steps: 6);
        return found is { } f ? new Capacitance(f) : null;
    }
}
