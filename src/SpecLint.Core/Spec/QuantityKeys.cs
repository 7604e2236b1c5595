using System.Collections.Frozen;
using SpecLint.Core.Spec.Yaml;
using SpecLint.Core.Units;

namespace SpecLint.Core.Spec;

/// <summary>The dimension of every quantity key of references.md §D3, by JSON Pointer (map entries min/typ/max share their key's).</summary>
internal static class QuantityKeys
{
    private static readonly FrozenDictionary<string, Dimension> Keys = new Dictionary<string, Dimension>
    {
        ["/conditions/temperature"] = Dimension.Temperature,
        ["/conditions/supply/positive"] = Dimension.Voltage,
        ["/conditions/supply/negative"] = Dimension.Voltage,
        ["/bias"] = Dimension.Voltage,
        ["/input/capacitance"] = Dimension.Capacitance,
        ["/input/shunt-resistance"] = Dimension.Resistance,
        ["/input/dark-current"] = Dimension.Current,
        ["/input/current"] = Dimension.Current,
        ["/input/responsivity"] = Dimension.Responsivity,
        ["/amplifier/gbw"] = Dimension.Frequency,
        ["/amplifier/open-loop-gain"] = Dimension.Gain,
        ["/amplifier/second-pole"] = Dimension.Frequency,
        ["/amplifier/voltage-noise"] = Dimension.VoltageNoiseDensity,
        ["/amplifier/voltage-noise-corner"] = Dimension.Frequency,
        ["/amplifier/current-noise"] = Dimension.CurrentNoiseDensity,
        ["/amplifier/current-noise-corner"] = Dimension.Frequency,
        ["/amplifier/input-capacitance/common-mode"] = Dimension.Capacitance,
        ["/amplifier/input-capacitance/differential"] = Dimension.Capacitance,
        ["/amplifier/bias-current"] = Dimension.Current,
        ["/amplifier/bias-current-doubling"] = Dimension.Temperature,
        ["/amplifier/offset-voltage"] = Dimension.Voltage,
        ["/amplifier/output-swing/to-negative"] = Dimension.Voltage,
        ["/amplifier/output-swing/to-positive"] = Dimension.Voltage,
        ["/amplifier/slew-rate"] = Dimension.SlewRate,
        ["/amplifier/min-stable-gain"] = Dimension.Gain,
        ["/feedback/resistance"] = Dimension.Resistance,
        ["/feedback/capacitance"] = Dimension.Capacitance,
        ["/feedback/parasitic-capacitance"] = Dimension.Capacitance,
        ["/board/stray-capacitance"] = Dimension.Capacitance,
        ["/requirements/bandwidth"] = Dimension.Frequency,
        ["/requirements/phase-margin"] = Dimension.Angle,
        ["/requirements/peaking"] = Dimension.Gain,
        ["/requirements/noise/band"] = Dimension.Frequency,
        ["/requirements/noise/max-input"] = Dimension.Current,
    }.ToFrozenDictionary(StringComparer.Ordinal);

    /// <summary>The dimension of a quantity key or of a min/typ/max entry under one; null for other keys.</summary>
    public static Dimension? DimensionOf(string pointer)
    {
        if (Keys.TryGetValue(pointer, out var d))
        {
            return d;
        }

        var tokens = JsonPointerText.Split(pointer);
        if (tokens.Count > 0 && tokens[^1] is "min" or "typ" or "max" && Keys.TryGetValue(JsonPointerText.Parent(pointer), out d))
        {
            return d;
        }

        return null;
    }
}
