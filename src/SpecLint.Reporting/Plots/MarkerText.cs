using System.Globalization;
using SpecLint.Core.Units;

namespace SpecLint.Reporting.Plots;

/// <summary>Marker label wording shared by the chart builders, so all plots say things the same way.</summary>
internal static class MarkerText
{
    public static string Frequency(double hz) => QuantityFormat.FormatRounded(hz, Dimension.Frequency);

    public static string Degrees(double deg) => Signed(deg.ToString("0", CultureInfo.InvariantCulture)) + "°";

    public static string Decibels(double db) => Signed(db.ToString("0.#", CultureInfo.InvariantCulture)) + " dB";

    public static string Ohms(double ohm) => QuantityFormat.FormatRounded(ohm, Dimension.Resistance);

    private static string Signed(string text) => text.StartsWith('-') ? "\u2212" + text[1..] : text;
}
