using System.Globalization;

namespace LarkspurTarn.HouseRules;

/// <summary>
/// Low-light channels sit in a dark, cold probe for months: the lab wants more phase margin than the
/// built-in 45° at every tolerance and temperature corner, so that ringing never reaches the ADC.
/// </summary>
public sealed class LowLightMarginBelowFloorRule : IRule
{
    public static readonly RuleOption Floor = new("floor", Dimension.Angle, "60 deg", "Phase margin every corner must keep");

    public RuleDescriptor Descriptor { get; } = new(
        "low-light-margin", "Low-light channels keep the lab's phase-margin floor at every tolerance corner", Severity.Error, [Floor]);

    public IEnumerable<Finding> Check(RuleContext context)
    {
        var floor = context.Option<Angle>(Floor.Key);
        var worst = context.Current.WorstPhaseMarginDeg;
        if (worst is { } w && w >= floor.Degrees)
        {
            yield break;
        }

        var where = context.Tolerances is { } t ? $" (worst at {t.PhaseMarginMinAt.Describe()})" : "";
        var shown = worst is { } v ? v.ToString("0.#", CultureInfo.InvariantCulture) + "°" : "undefined";
        var fix = context.SearchFixes ? CfForFloor.Find(context, floor) : null;
        var advice = fix is { } f ? $"; Cf = {f.Value} restores it (re-checked at every corner)" : "";
        yield return context.Report("/feedback/capacitance",
            $"the worst-case phase margin is {shown}{where}, below the lab's {floor.Degrees:0.#}° floor for low-light channels{advice}", fix);
    }
}
