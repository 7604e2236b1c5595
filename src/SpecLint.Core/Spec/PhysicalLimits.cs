using System.Collections.Frozen;
using SpecLint.Core.Spec.Yaml;

namespace SpecLint.Core.Spec;

/// <summary>
/// Hard limits on every quantity key: beyond them a value cannot be a real part or figure, and inside them
/// every formula of the analysis stays finite (no overflow to infinity, no underflow to a denormal that a
/// later 1/x blows up). These are not design checks: the rules judge designs, this only refuses nonsense
/// such as <c>7000 dB</c> or <c>1e-320 MΩ</c> before it reaches the numerics.
/// </summary>
internal static class PhysicalLimits
{
    /// <summary>The limits of one key, in SI (a gain as V/V, an angle in rad, a temperature in K).</summary>
    /// <param name="Min">Smallest value allowed.</param>
    /// <param name="Max">Largest value allowed.</param>
    /// <param name="SmallestNonZero">A value other than zero must be at least this large in magnitude.</param>
    /// <param name="Text">The limits as a user writes them, for messages.</param>
    public sealed record Limit(double Min, double Max, double SmallestNonZero, string Text)
    {
        /// <summary>Whether a value lies inside the limits (false for NaN and infinities).</summary>
        public bool Allows(double si) =>
            double.IsFinite(si) && si >= Min && si <= Max && (si == 0 || Math.Abs(si) >= SmallestNonZero);
    }

    private static readonly Limit Voltage = new(-100e3, 100e3, 1e-15, "-100 kV .. 100 kV (other than 0, at least 1e-15 V in size)");
    private static readonly Limit SensorCapacitance = new(0, 1e-3, 1e-18, "0 F, or 1e-18 F .. 1 mF");
    private static readonly Limit FeedbackCapacitance = new(0, 1e-6, 1e-18, "0 F, or 1e-18 F .. 1 µF");
    private static readonly Limit Current = new(0, 1, 1e-24, "0 A, or 1e-24 A .. 1 A");
    private static readonly Limit Frequency = new(1e-3, 1e12, 0, "1 mHz .. 1000 GHz");
    private static readonly Limit CornerFrequency = new(0, 1e9, 1e-6, "0 Hz, or 1 µHz .. 1 GHz");

    private static readonly FrozenDictionary<string, Limit> Limits = new Dictionary<string, Limit>
    {
        ["/conditions/temperature"] = new(0, 1273.15, 0, "-273.15 °C .. 1000 °C"),
        ["/conditions/supply/positive"] = Voltage,
        ["/conditions/supply/negative"] = Voltage,
        ["/bias"] = Voltage,
        ["/input/capacitance"] = SensorCapacitance,
        ["/input/shunt-resistance"] = new(1e-3, 1e18, 0, "1 mΩ .. 1000000 TΩ"),
        ["/input/dark-current"] = Current,
        ["/input/current"] = Current,
        ["/input/responsivity"] = new(1e-9, 1e6, 0, "1 nA/W .. 1000000 A/W"),
        ["/amplifier/gbw"] = Frequency,
        ["/amplifier/open-loop-gain"] = new(1e-10, 1e10, 0, "-200 dB .. 200 dB"),
        ["/amplifier/second-pole"] = Frequency,
        ["/amplifier/voltage-noise"] = new(0, 1e-3, 1e-15, "0 V/√Hz, or 1e-15 V/√Hz .. 1 mV/√Hz"),
        ["/amplifier/voltage-noise-corner"] = CornerFrequency,
        ["/amplifier/current-noise"] = new(0, 1e-6, 1e-24, "0 A/√Hz, or 1e-24 A/√Hz .. 1 µA/√Hz"),
        ["/amplifier/current-noise-corner"] = CornerFrequency,
        ["/amplifier/input-capacitance/common-mode"] = SensorCapacitance,
        ["/amplifier/input-capacitance/differential"] = SensorCapacitance,
        ["/amplifier/bias-current"] = new(-1, 1, 1e-24, "-1 A .. 1 A (other than 0, at least 1e-24 A in size)"),
        ["/amplifier/bias-current-doubling"] = new(0, 200, 0, "0 K .. 200 K"),
        ["/amplifier/offset-voltage"] = new(-100, 100, 1e-15, "-100 V .. 100 V (other than 0, at least 1e-15 V in size)"),
        ["/amplifier/output-swing/to-negative"] = Voltage with { Min = 0, Text = "0 V, or 1e-15 V .. 100 kV" },
        ["/amplifier/output-swing/to-positive"] = Voltage with { Min = 0, Text = "0 V, or 1e-15 V .. 100 kV" },
        ["/amplifier/slew-rate"] = new(1e-3, 1e12, 0, "0.001 V/s .. 1000000 V/µs"),
        ["/amplifier/min-stable-gain"] = new(1e-10, 1e6, 0, "-200 dB .. 120 dB (1000000 V/V)"),
        ["/feedback/resistance"] = new(1e-3, 1e15, 0, "1 mΩ .. 1000 TΩ"),
        ["/feedback/resistance/adjustable"] = new(1e-3, 1e15, 0, "1 mΩ .. 1000 TΩ"),
        ["/feedback/resistance/wiper-resistance"] = new(0, 1e9, 0, "0 Ω .. 1 GΩ"),
        ["/feedback/switch/on-resistance"] = new(0, 1e9, 0, "0 Ω .. 1 GΩ"),
        ["/feedback/switch/off-capacitance"] = FeedbackCapacitance,
        ["/input/series-resistance"] = new(0, 1e12, 0, "0 Ω .. 1 TΩ"),
        ["/feedback/capacitance"] = FeedbackCapacitance,
        ["/feedback/parasitic-capacitance"] = FeedbackCapacitance,
        ["/board/stray-capacitance"] = SensorCapacitance,
        ["/requirements/bandwidth"] = Frequency,
        ["/requirements/phase-margin"] = new(0, Math.PI, 0, "0 deg .. 180 deg"),
        ["/requirements/peaking"] = new(1e-10, 1e5, 0, "-200 dB .. 100 dB"),
        ["/requirements/noise/band"] = new(0, 1e12, 1e-6, "0 Hz, or 1 µHz .. 1000 GHz"),
        ["/requirements/noise/max-input"] = new(1e-24, 1, 0, "1e-24 A .. 1 A"),
    }.ToFrozenDictionary(StringComparer.Ordinal);

    /// <summary>Every key that has limits (all quantity keys).</summary>
    public static IEnumerable<string> Keys => Limits.Keys;

    /// <summary>The limits of a quantity key or of a min/typ/max entry under one; null for other keys.</summary>
    public static Limit? For(string pointer)
    {
        pointer = SettingKeys.ChannelPointer(pointer);
        if (Limits.TryGetValue(pointer, out var limit))
        {
            return limit;
        }

        var tokens = JsonPointerText.Split(pointer);
        return tokens.Count > 0 && tokens[^1] is "min" or "typ" or "max" && Limits.TryGetValue(JsonPointerText.Parent(pointer), out limit)
            ? limit
            : null;
    }
}
