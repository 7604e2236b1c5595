using SpecLint.Core.Units;

namespace SpecLint.Core.Spec.Model;

/// <summary>The switch that selects a gain setting (<c>feedback.switch</c>).</summary>
/// <param name="OnResistance">In series with the selected branch.</param>
/// <param name="OffCapacitance">In series with each unselected branch.</param>
public sealed record GainSwitch(Resistance OnResistance, Capacitance OffCapacitance);
