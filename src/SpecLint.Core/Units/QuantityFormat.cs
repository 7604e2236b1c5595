using System.Globalization;

namespace SpecLint.Core.Units;

/// <summary>
/// Engineering notation (prefix steps of 10³) that parses back to exactly the same value for every
/// decimal unit: the shortest round-trip digits of the double are shifted, never recomputed.
/// </summary>
public static class QuantityFormat
{
    private const int MaxPlainPower = 5;
    private const int MinPlainPower = -6;

    /// <summary>Formats an SI value in the display unit of its dimension, e.g. 2.2e-12 F as "2.2 pF".</summary>
    public static string Format(double si, Dimension dimension)
    {
        var unit = UnitTable.DisplayUnit(dimension);
        if (!double.IsFinite(si))
        {
            // Spec limits keep every figure finite; should one slip through, it must not print as "NaN" or "Infinity".
            return "undefined";
        }

        if (unit.ToSi is not null)
        {
            return FormatConverted(si, unit);
        }

        if (!unit.AcceptsPrefix)
        {
            return ShiftDecimal(si, -unit.Power10) + " " + unit.Symbol;
        }

        var (digits, exponent, negative) = Decompose(si);
        if (digits == "0")
        {
            return "0 " + unit.Symbol;
        }

        // exponent is the power of ten of the leading digit; pick the prefix that leaves 1..999 before the point.
        var engineering = (int)Math.Floor(exponent / 3.0) * 3;
        engineering = Math.Clamp(engineering, -15, 12);
        if (dimension == Dimension.Capacitance && exponent == -13)
        {
            // The trade writes sub-picofarad capacitors as 0.56 pF, not 560 fF.
            engineering = -12;
        }

        var mantissa = PlaceDecimalPoint(digits, exponent - engineering);
        return (negative ? "-" : "") + mantissa + " " + UnitTable.FormatPrefixes[engineering] + unit.Symbol;
    }

    /// <summary>Formats with a fixed number of significant digits for tables; not guaranteed to round-trip.</summary>
    public static string FormatRounded(double si, Dimension dimension, int significantDigits = 3)
    {
        var unit = UnitTable.DisplayUnit(dimension);
        if (!double.IsFinite(si))
        {
            // Spec limits keep every figure finite; should one slip through, it must not print as "NaN" or "Infinity".
            return "undefined";
        }

        var g = "G" + significantDigits.ToString(CultureInfo.InvariantCulture);
        if (unit.ToSi is not null)
        {
            var shown = unit.FromSi!(si);
            // Temperatures and angles read best to one decimal, whatever their magnitude.
            var text = Math.Abs(shown) is >= 100 and < 1e6 ? shown.ToString("0.#", CultureInfo.InvariantCulture) : shown.ToString(g, CultureInfo.InvariantCulture);
            return text + " " + unit.Symbol;
        }

        return Format(double.Parse(si.ToString(g, CultureInfo.InvariantCulture), CultureInfo.InvariantCulture), dimension);
    }

    private static string FormatConverted(double si, UnitSymbol unit)
    {
        var shown = unit.FromSi!(si);
        // Try the shortest text first; non-decimal conversions do not always invert exactly, so take the
        // first precision that parses back to the same double and fall back to 17 digits.
        for (var digits = 1; digits <= 17; digits++)
        {
            var text = shown.ToString("G" + digits.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
            if (unit.ToSi!(double.Parse(text, CultureInfo.InvariantCulture)) == si)
            {
                return text + " " + unit.Symbol;
            }
        }

        return shown.ToString("R", CultureInfo.InvariantCulture) + " " + unit.Symbol;
    }

    private static string ShiftDecimal(double si, int power10)
    {
        var (digits, exponent, negative) = Decompose(si);
        if (digits == "0")
        {
            return "0";
        }

        return (negative ? "-" : "") + PlaceDecimalPoint(digits, exponent + power10);
    }

    /// <summary>Splits the shortest round-trip text of a double into significant digits and the power of ten of the first digit.</summary>
    internal static (string Digits, int Exponent, bool Negative) Decompose(double value)
    {
        if (value == 0)
        {
            return ("0", 0, false);
        }

        var text = Math.Abs(value).ToString("R", CultureInfo.InvariantCulture);
        var exponentAdjust = 0;
        var ePos = text.IndexOfAny(['E', 'e']);
        if (ePos >= 0)
        {
            exponentAdjust = int.Parse(text[(ePos + 1)..], NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture);
            text = text[..ePos];
        }

        var point = text.IndexOf('.', StringComparison.Ordinal);
        var intPart = point >= 0 ? text[..point] : text;
        var fracPart = point >= 0 ? text[(point + 1)..] : "";
        var all = intPart + fracPart;
        var leadingZeros = 0;
        while (leadingZeros < all.Length - 1 && all[leadingZeros] == '0')
        {
            leadingZeros++;
        }

        var digits = all[leadingZeros..].TrimEnd('0');
        if (digits.Length == 0)
        {
            digits = "0";
        }

        var exponent = intPart.Length - 1 - leadingZeros + exponentAdjust;
        return (digits, exponent, value < 0);
    }

    /// <summary>
    /// Writes digits d1d2d3… where d1 has the power of ten <paramref name="leadingPower"/>. Past the prefixes
    /// (above 999 T or below 0.001 f) it switches to an exponent, so no value is ever written as a string of
    /// hundreds of zeros; the text still parses back to the same double.
    /// </summary>
    private static string PlaceDecimalPoint(string digits, int leadingPower)
    {
        if (leadingPower > MaxPlainPower || leadingPower < MinPlainPower)
        {
            var mantissa = digits.Length == 1 ? digits : digits[..1] + "." + digits[1..];
            return mantissa + "e" + leadingPower.ToString(CultureInfo.InvariantCulture);
        }

        var intCount = leadingPower + 1;
        if (intCount <= 0)
        {
            return "0." + new string('0', -intCount) + digits;
        }

        if (intCount >= digits.Length)
        {
            return digits + new string('0', intCount - digits.Length);
        }

        return digits[..intCount] + "." + digits[intCount..];
    }
}
