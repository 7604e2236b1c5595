using SpecLint.Core.Units;

namespace SpecLint.Core.Spec.Model;

/// <summary>Layout parasitics.</summary>
/// <param name="StrayCapacitance">Stray capacitance at the inverting node (zero when not given).</param>
public sealed record Board(Spread<Capacitance> StrayCapacitance);
