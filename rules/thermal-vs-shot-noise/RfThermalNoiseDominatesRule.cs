using System.Globalization;
using SpecLint.Core.Analysis;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Fixes;

namespace SpecLint.Rules.BuiltIn;

/// <summary>Flags an Rf whose thermal noise exceeds the shot noise of the smallest signal (Imin·Rf &lt; 2kT/q).</summary>
public sealed class RfThermalNoiseDominatesRule : IRule
{
    /// <summary>The smallest acceptable Imin·Rf/(2kT/q).</summary>
    public static readonly RuleOption MinRatio = new("min-ratio", Dimension.Ratio, "1", "smallest acceptable Imin·Rf/(2kT/q)");

    /// <summary>The descriptor.</summary>
    public static RuleDescriptor Info { get; } = new(
        "thermal-vs-shot-noise", "Rf's thermal noise stays below the shot noise of the smallest signal", Severity.Warning, [MinRatio]);

    /// <inheritdoc />
    public RuleDescriptor Descriptor => Info;

    /// <inheritdoc />
    public IEnumerable<Finding> Check(RuleContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var spec = context.Spec;
        var minRatio = context.OptionSi(MinRatio.Key);
        var hottest = spec.Conditions.Hottest;
        var ratio = context.Analysis.ShotToRfThermalRatio;
        if (ratio >= minRatio || spec.Input.CurrentMin.Amperes <= 0)
        {
            yield break;
        }

        var twoKtq = PhysicalConstants.ThermalVoltage(hottest) * 2;
        var needed = DesignHelpers.SmallestShotLimitedRf(spec.Input.CurrentMin, hottest).Ohms * minRatio;
        var span = OutputOutsideRailsRule.UsableSpan(context);
        var series = StandardValueSearch.SeriesFor<Resistance>(spec.Feedback.Resistance, ESeries.E96);
        FixCondition[] conditions =
        [
            new(OutputOutsideRailsRule.Info.Id, $"output inside {Fmt.Q(span.Low)} .. {Fmt.Q(span.High)}",
                edited => OutputOutsideRailsRule.Fits(context.ReanalyzeNominal(edited).Analysis.Output, span)),
        ];
        var search = StandardValueSearch.Search(context, series, needed, upward: true, c => SpecEdits.WithRf(spec, new Resistance(c)), conditions, steps: 1);
        var found = search.Value;
        var message = string.Create(CultureInfo.InvariantCulture,
            $"Imin·Rf = {Fmt.Q(new Voltage(spec.Input.CurrentMin.Amperes * spec.Feedback.Resistance.Typ.Ohms))} is {Fmt.Ratio(ratio)}× 2kT/q ({Fmt.Q(twoKtq)} at {hottest.Celsius:0.#} °C): Rf's thermal noise is {Fmt.Ratio(1 / ratio)}× the shot noise of the {Fmt.Q(spec.Input.CurrentMin)} minimum signal in power, so the resistor, not the signal, sets the noise floor.");
        if (found is { } rf)
        {
            var r = new Resistance(rf);
            yield return context.Report("/feedback/resistance",
                message + $" Rf ≥ {Fmt.Q(new Resistance(needed))} fixes it; {SpecEdits.RfText(spec, r)} is the smallest standard value that does and still fits the output headroom (re-checked). Re-check Cf for the bandwidth.",
                new FixSuggestion("/feedback/resistance", SpecEdits.RfText(spec, r)));
        }
        else if (search is { Closest: { } closest, RejectedBy: { } by } && by != OutputOutsideRailsRule.Info.Id)
        {
            yield return context.Report("/feedback/resistance",
                message + $" Rf ≥ {Fmt.Q(new Resistance(needed))} fixes it and {SpecEdits.RfText(spec, new Resistance(closest))} fits the output headroom, but {by} rejects it ({search.Requirement}). Otherwise accept the noise and waive this rule.");
        }
        else
        {
            // Say what it would take: the output room the needed Rf asks for, or the signal the room allows.
            var vbias = spec.Bias.Typ.Volts;
            var room = spec.Input.Direction == CurrentDirection.OutOfNode ? span.High.Volts - vbias : vbias - span.Low.Volts;
            var fullScale = Math.Abs(spec.Input.CurrentMax.Amperes) + Math.Abs(spec.Input.DarkCurrent.Typ.Amperes);
            var takes = room > 0 && fullScale > 0
                ? $" It would take a full-scale current of at most {Fmt.Q(new Current(room / needed))} instead of {Fmt.Q(spec.Input.CurrentMax)}, {Fmt.Q(new Voltage(fullScale * needed))} of output room instead of {Fmt.Q(new Voltage(room))}, or a minimum signal of at least {Fmt.Q(new Current(minRatio * twoKtq.Volts * fullScale / room))} at the largest Rf that fits ({Fmt.Q(new Resistance(room / fullScale))})."
                : string.Empty;
            yield return context.Report("/feedback/resistance",
                message + $" Rf ≥ {Fmt.Q(new Resistance(needed))} would fix it, but no such standard value keeps the full-scale output inside the rails.{takes} Otherwise accept the noise and waive this rule.");
        }
    }
}
