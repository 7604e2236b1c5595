using System.Globalization;
using SpecLint.Core.Units;

namespace SpecLint.Rules.Fixes;

/// <summary>Short engineering formatting of figures inside rule messages (3 significant digits).</summary>
public static class Fmt
{
    /// <summary>A frequency such as "1.23 MHz", or "n/a".</summary>
    public static string Hz(Frequency? f) => f is { } v ? QuantityFormat.FormatRounded(v.Hertz, Dimension.Frequency) : "n/a";

    /// <summary>Any quantity to 3 significant digits.</summary>
    public static string Q<T>(T value)
        where T : struct, IQuantity<T> => QuantityFormat.FormatRounded(value.Si, T.Dimension);

    /// <summary>
    /// A dimensionless ratio to 3 significant digits, never in E-notation: plain between 0.001 and 10 000
    /// ("0.00195", "51.4"), else as a power of ten ("1.95 × 10⁻¹¹").
    /// </summary>
    public static string Ratio(double ratio)
    {
        var magnitude = Math.Abs(ratio);
        if (magnitude == 0 || !double.IsFinite(ratio) || (magnitude >= 1e-3 && magnitude < 1e4))
        {
            return Plain(ratio);
        }

        var exponent = (int)Math.Floor(Math.Log10(magnitude));
        var mantissa = Math.Round(ratio / Math.Pow(10, exponent), 2);
        if (Math.Abs(mantissa) >= 10)
        {
            mantissa /= 10;
            exponent++;
        }

        var power = "10" + string.Concat(exponent.ToString(CultureInfo.InvariantCulture).Select(Superscript));
        return mantissa == 1 ? power : Plain(mantissa) + " × " + power;
    }

    private static string Plain(double value)
    {
        var decimals = value == 0 ? 0 : Math.Max(0, 2 - (int)Math.Floor(Math.Log10(Math.Abs(value))));
        return Math.Round(value, Math.Min(decimals, 15)).ToString("0.###############", CultureInfo.InvariantCulture);
    }

    private static char Superscript(char c) => c switch
    {
        '-' => '⁻',
        '0' => '⁰',
        '1' => '¹',
        '2' => '²',
        '3' => '³',
        _ => (char)('⁴' + (c - '4')),
    };
}
