using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis;

/// <summary>
/// One unselected branch of a switched feedback network: its resistor and the capacitance across it, reaching the
/// summing node through the open switch's off-capacitance (references.md §D8).
/// </summary>
/// <param name="Rf">The branch's feedback resistor.</param>
/// <param name="Capacitance">Its Cf plus the parasitic capacitance across it.</param>
/// <param name="OffCapacitance">The open switch's capacitance, in series with the branch.</param>
public readonly record struct OffBranch(Resistance Rf, Capacitance Capacitance, Capacitance OffCapacitance)
{
    /// <summary>
    /// What the branch puts across the feedback at high frequency: Coff in series with C; a branch without
    /// capacitance looks like its resistor there and adds none.
    /// </summary>
    internal Capacitance HighFrequencyCapacitance =>
        Capacitance.Farads > 0
            ? new(OffCapacitance.Farads * Capacitance.Farads / (OffCapacitance.Farads + Capacitance.Farads))
            : Units.Capacitance.Zero;
}
