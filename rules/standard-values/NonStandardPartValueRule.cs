using SpecLint.Core.Analysis;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Fixes;

namespace SpecLint.Rules.BuiltIn;

/// <summary>Flags an Rf or Cf whose nominal value is not in the IEC 60063 series its tolerance implies.</summary>
public sealed class NonStandardPartValueRule : IRule
{
    /// <summary>The descriptor.</summary>
    public static RuleDescriptor Info { get; } = new(
        "standard-values", "Rf and Cf are values of the IEC 60063 series their tolerance implies", Severity.Note);

    /// <inheritdoc />
    public RuleDescriptor Descriptor => Info;

    /// <inheritdoc />
    public IEnumerable<Finding> Check(RuleContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var spec = context.Spec;
        var rf = spec.Feedback.Resistance;
        var rfSeries = StandardValueSearch.SeriesFor<Resistance>(rf, ESeries.E96);
        // A potentiometer's setting is not a part value: no series applies to it.
        if (spec.Feedback.Adjustable is null && !rfSeries.ContainsWithCoarser(rf.Typ.Ohms))
        {
            var nearest = new Resistance(rfSeries.Nearest(rf.Typ.Ohms));
            yield return context.Report("/feedback/resistance",
                $"Rf = {rf.Typ} is not a value of {rfSeries.Name} or a coarser series (the series {Tolerance(rf, rfSeries)} implies); the nearest is {nearest}.",
                new FixSuggestion("/feedback/resistance", SpecEdits.RfText(spec, nearest)));
        }

        if (spec.Feedback.Capacitance is { } cf && !IsSubPicofaradStep(cf.Typ))
        {
            var cfSeries = StandardValueSearch.SeriesFor<Capacitance>(cf, ESeries.E12);
            if (!cfSeries.ContainsWithCoarser(cf.Typ.Farads))
            {
                var nearest = new Capacitance(cfSeries.Nearest(cf.Typ.Farads));
                yield return context.Report("/feedback/capacitance",
                    $"Cf = {cf.Typ} is not a value of {cfSeries.Name} or a coarser series (the series {Tolerance(cf, cfSeries)} implies); the nearest is {nearest}.",
                    new FixSuggestion("/feedback/capacitance", SpecEdits.CfText(spec, nearest)));
            }
        }
    }

    // Sub-picofarad C0G parts are sold in 0.1 pF steps rather than E-series values (common practice).
    private static bool IsSubPicofaradStep(Capacitance c)
    {
        if (c.Farads >= 1e-12)
        {
            return false;
        }

        var tenths = c.Farads / 0.1e-12;
        return Math.Abs(tenths - Math.Round(tenths)) < 1e-6;
    }

    private static string Tolerance<T>(Spread<T> spread, ESeries series)
        where T : struct, IQuantity<T> =>
        spread.RelativeTolerance > 0 ? $"that a {100 * spread.RelativeTolerance:0.##}% tolerance" : $"{series.Name}, the default with no tolerance,";
}
