using SpecLint.Core.Units;

namespace SpecLint.Rules.Engine;

/// <summary>
/// Reads a rule option from configuration text with the same care as a spec value: its type and unit, one
/// value (no tolerance), finite, and inside the range that makes sense for its dimension. A phase-margin
/// floor of -5 deg would silently switch the gate off, so it is refused rather than obeyed.
/// </summary>
internal static class OptionValues
{
    /// <summary>Parses and range-checks <paramref name="text"/> for <paramref name="option"/>; false with a message otherwise.</summary>
    public static bool TryRead(RuleOption option, string text, out double si, out string error)
    {
        ArgumentNullException.ThrowIfNull(option);
        si = option.DefaultSi;
        if (!QuantityParser.TryParse(text ?? "", option.Dimension, out var parsed, out var parseError))
        {
            error = parseError ?? "not a value";
            return false;
        }

        if (parsed!.Form != ToleranceForm.None)
        {
            error = "takes one value, not a tolerance or range";
            return false;
        }

        var (min, max, range) = Range(option.Dimension);
        if (!double.IsFinite(parsed.Typ) || parsed.Typ < min || parsed.Typ > max)
        {
            error = $"must lie within {range}";
            return false;
        }

        si = parsed.Typ;
        error = "";
        return true;
    }

    /// <summary>The allowed range of an option of a dimension, in SI, with its text for messages.</summary>
    private static (double Min, double Max, string Text) Range(Dimension dimension) => dimension switch
    {
        // An angle option is a phase-margin floor: 0 deg would switch the check off, 180 deg cannot be met.
        Dimension.Angle => (1e-9, Math.PI, "0 deg .. 180 deg (above 0)"),
        Dimension.Gain => (1, 1e5, "0 dB .. 100 dB"),
        Dimension.Ratio => (0, 1e6, "0 % .. 100000000 %"),
        Dimension.Capacitance => (0, 1e-6, "0 F .. 1 µF"),
        Dimension.Voltage => (0, 100e3, "0 V .. 100 kV"),
        Dimension.Resistance => (0, 1e15, "0 Ω .. 1000 TΩ"),
        Dimension.Current => (0, 1, "0 A .. 1 A"),
        Dimension.Frequency => (0, 1e12, "0 Hz .. 1000 GHz"),
        Dimension.Temperature => (0, 1273.15, "-273.15 °C .. 1000 °C"),
        _ => (0, 1e12, "0 .. 1e12 in SI units"),
    };
}
