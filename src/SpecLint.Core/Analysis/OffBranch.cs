using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis;

/// <summary>
/// One unselected branch of a switched feedback network: its resistor and the capacitance across it, reaching the
/// summing node through the open switch's off-capacitance (references.md §D7).
/// </summary>
/// <param name="Rf">The branch's feedback resistor.</param>
/// <param name="Capacitance">Its Cf plus the parasitic capacitance across it.</param>
/// <param name="OffCapacitance">The open switch's capacitance, in series with the branch.</param>
public readonly record struct OffBranch(Resistance Rf, Capacitance Capacitance, Capacitance OffCapacitance);
