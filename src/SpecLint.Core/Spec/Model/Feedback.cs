using SpecLint.Core.Units;

namespace SpecLint.Core.Spec.Model;

/// <summary>The feedback network Rf ∥ Cf and the parasitic capacitance across Rf.</summary>
/// <param name="Resistance">Rf.</param>
/// <param name="Capacitance">Cf, or null for a parasitic-only design.</param>
/// <param name="Dielectric">Cf's dielectric code (C0G, X7R, ...), or null.</param>
/// <param name="ParasiticCapacitance">Capacitance across Rf from the layout and the resistor body (zero when not given).</param>
public sealed record Feedback(
    Spread<Resistance> Resistance,
    Spread<Capacitance>? Capacitance,
    string? Dielectric,
    Spread<Capacitance> ParasiticCapacitance);
