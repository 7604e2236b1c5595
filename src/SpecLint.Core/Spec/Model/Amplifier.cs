using SpecLint.Core.Units;

namespace SpecLint.Core.Spec.Model;

/// <summary>The op-amp's figures, as a datasheet gives them.</summary>
/// <param name="Gbw">Gain-bandwidth product.</param>
/// <param name="OpenLoopGain">DC open-loop gain (default 120 dB).</param>
/// <param name="SecondPole">Second open-loop pole, or null for none.</param>
/// <param name="VoltageNoise">Input voltage noise density (white part).</param>
/// <param name="VoltageNoiseCorner">1/f corner of the voltage noise, or null.</param>
/// <param name="CurrentNoise">Input current noise density (white part).</param>
/// <param name="CurrentNoiseCorner">1/f corner of the current noise, or null.</param>
/// <param name="CommonModeCapacitance">Common-mode input capacitance.</param>
/// <param name="DifferentialCapacitance">Differential input capacitance.</param>
/// <param name="BiasCurrent">Input bias current (at 25 °C).</param>
/// <param name="OffsetVoltage">Input offset voltage.</param>
/// <param name="SwingToNegative">Closest approach of the output to the negative rail.</param>
/// <param name="SwingToPositive">Closest approach of the output to the positive rail.</param>
/// <param name="SlewRate">Slew rate, or null.</param>
/// <param name="MinStableGain">Minimum stable closed-loop gain for decompensated parts, or null (unity-gain stable).</param>
public sealed record Amplifier(
    Spread<Frequency> Gbw,
    Gain OpenLoopGain,
    Spread<Frequency>? SecondPole,
    VoltageNoiseDensity VoltageNoise,
    Frequency? VoltageNoiseCorner,
    CurrentNoiseDensity CurrentNoise,
    Frequency? CurrentNoiseCorner,
    Capacitance CommonModeCapacitance,
    Capacitance DifferentialCapacitance,
    Spread<Current> BiasCurrent,
    Spread<Voltage> OffsetVoltage,
    Voltage SwingToNegative,
    Voltage SwingToPositive,
    SlewRate? SlewRate,
    Gain? MinStableGain)
{
    /// <summary>
    /// The temperature rise over which the bias current doubles (a difference, held in kelvin), or null for the
    /// default of 10 K (common practice for FET inputs); 0 K keeps the bias current constant.
    /// </summary>
    public Temperature? BiasCurrentDoubling { get; init; }
}
