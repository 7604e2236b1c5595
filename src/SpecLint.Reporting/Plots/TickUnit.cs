using System.Globalization;
using SpecLint.Core.Units;

namespace SpecLint.Reporting.Plots;

/// <summary>
/// How tick values of an axis are written. Quantities with an SI dimension use the engineering notation of
/// the spec grammar ("10 kHz", "10 nV/√Hz"), so plots read like the specs; logarithmic and angular units that
/// the grammar keeps in SI (dB, degrees) get a plain number and a suffix.
/// </summary>
internal sealed record TickUnit
{
    private TickUnit(Dimension? dimension, string suffix, bool spaceBeforeSuffix)
    {
        Dimension = dimension;
        Suffix = suffix;
        SpaceBeforeSuffix = spaceBeforeSuffix;
    }

    /// <summary>The SI dimension whose display unit labels the ticks, or null for a suffix unit.</summary>
    public Dimension? Dimension { get; }

    /// <summary>The text after the number for suffix units ("dB", "°"); empty for a bare number.</summary>
    public string Suffix { get; }

    /// <summary>Whether a space separates number and suffix ("3 dB" but "45°").</summary>
    public bool SpaceBeforeSuffix { get; }

    /// <summary>Decibels: "−20 dB".</summary>
    public static TickUnit Decibel { get; } = new(null, "dB", true);

    /// <summary>Decibels relative to 1 Ω, for transimpedance: "120 dBΩ".</summary>
    public static TickUnit DecibelOhm { get; } = new(null, "dBΩ", true);

    /// <summary>Degrees of phase: "−180°".</summary>
    public static TickUnit Degrees { get; } = new(null, "°", false);

    /// <summary>A bare number.</summary>
    public static TickUnit Plain { get; } = new(null, "", false);

    /// <summary>Engineering notation in the display unit of <paramref name="dimension"/>; values are SI.</summary>
    public static TickUnit Of(Dimension dimension) => new(dimension, "", false);

    /// <summary>A number followed by <paramref name="suffix"/>.</summary>
    public static TickUnit WithSuffix(string suffix, bool spaceBeforeSuffix = true) => new(null, suffix ?? "", spaceBeforeSuffix);

    /// <summary>Writes one tick value, with a true minus sign so that negative labels do not read as dashes.</summary>
    public string Format(double value)
    {
        string text;
        if (Dimension is { } dimension)
        {
            text = QuantityFormat.FormatRounded(value, dimension);
        }
        else
        {
            // Twelve significant digits hide the float noise of stepped ticks (0.30000000000000004).
            var rounded = double.Parse(value.ToString("G12", CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
            text = rounded == 0 ? "0" : rounded.ToString("0.###", CultureInfo.InvariantCulture);
            if (Suffix.Length > 0)
            {
                text += (SpaceBeforeSuffix ? " " : "") + Suffix;
            }
        }

        return text.StartsWith('-') ? "\u2212" + text[1..] : text;
    }
}
