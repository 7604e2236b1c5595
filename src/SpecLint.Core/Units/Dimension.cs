namespace SpecLint.Core.Units;

/// <summary>The physical dimension of a quantity; decides which unit symbols a spec value may use.</summary>
public enum Dimension
{
    Resistance,
    Capacitance,
    Frequency,
    Voltage,
    Current,
    Power,
    Responsivity,
    VoltageNoiseDensity,
    CurrentNoiseDensity,
    SlewRate,
    Temperature,
    Gain,
    Angle,
    Ratio,
}
