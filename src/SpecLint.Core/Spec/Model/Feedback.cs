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
    Spread<Capacitance> ParasiticCapacitance)
{
    /// <summary>
    /// The named settings of a switched-gain channel, as written; empty for a single gain. In a spec with settings,
    /// <see cref="Resistance"/>, <see cref="Capacitance"/> and the rest hold the selected setting's values (see
    /// <see cref="TiaSpec.Setting"/>).
    /// </summary>
    public System.Collections.Immutable.ImmutableArray<GainSetting> Settings { get; init; } = [];

    /// <summary>The gain switch of a switched-gain channel, or null (an ideal switch).</summary>
    public GainSwitch? Switch { get; init; }

    /// <summary>The adjustment range of a potentiometer Rf, or null for a fixed resistor.</summary>
    public AdjustableResistance? Adjustable { get; init; }
}
