using System.Globalization;

namespace LarkspurTarn.HouseRules;

/// <summary>
/// The Monte Carlo builds show what production will see: if the 1st-percentile phase margin lies far below
/// nominal, a few boards in every hundred will not behave like the prototype.
/// </summary>
public sealed class BuildSpreadTooWideRule : IRule
{
    public static readonly RuleOption MaxDrop = new("max-drop", Dimension.Angle, "8 deg", "Largest drop from nominal to the 1st-percentile build");

    public RuleDescriptor Descriptor { get; } = new(
        "build-spread", "The 1st-percentile Monte Carlo build keeps its phase margin within 8° of nominal", Severity.Warning, [MaxDrop]);

    public IEnumerable<Finding> Check(RuleContext context)
    {
        if (context.Tolerances?.MonteCarlo is not { } mc || context.Analysis.PhaseMargin is not { } nominal
            || !mc.PhaseMarginPercentilesDeg.TryGetValue(1, out var p1))
        {
            yield break;
        }

        var maxDrop = context.Option<Angle>(MaxDrop.Key);
        var drop = nominal.Degrees - p1;
        if (drop <= maxDrop.Degrees)
        {
            yield break;
        }

        yield return context.Report("/feedback/capacitance", string.Create(CultureInfo.InvariantCulture,
            $"one build in a hundred has {p1:0.#}° of phase margin, {drop:0.#}° below the nominal {nominal.Degrees:0.#}° ({mc.Samples} builds); tighten the Cf or Cd tolerance, or add margin"));
    }
}
