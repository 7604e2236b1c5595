using SpecLint.Core.Units;

namespace SpecLint.Core.Spec.Model;

/// <summary>The sensor: a current source with its capacitance and shunt resistance.</summary>
/// <param name="Type">Photodiode, phototransistor, electrode or plain current source.</param>
/// <param name="Capacitance">Sensor capacitance at the bias used.</param>
/// <param name="ShuntResistance">Shunt resistance, or null for infinite.</param>
/// <param name="DarkCurrent">Current flowing with no signal (zero when not given).</param>
/// <param name="CurrentMin">Smallest signal current that must be resolved.</param>
/// <param name="CurrentMax">Full-scale signal current.</param>
/// <param name="Direction">Signal current orientation.</param>
/// <param name="Responsivity">A/W, for optical units in reports, or null.</param>
public sealed record SensorInput(
    SensorType Type,
    Spread<Capacitance> Capacitance,
    Spread<Resistance>? ShuntResistance,
    Spread<Current> DarkCurrent,
    Current CurrentMin,
    Current CurrentMax,
    CurrentDirection Direction,
    Responsivity? Responsivity)
{
    /// <summary>An electrode's access resistance between the source and the summing node, or null for none.</summary>
    public Spread<Resistance>? SeriesResistance { get; init; }
}
