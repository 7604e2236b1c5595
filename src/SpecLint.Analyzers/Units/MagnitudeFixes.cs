using System.Collections.Generic;
using System.Globalization;

namespace SpecLint.Analyzers.Units;

/// <summary>Which prefixed factories turn a literal into a plausible value.</summary>
internal static class MagnitudeFixes
{
    /// <summary>
    /// The number a fix keeps: the literal as written, or its mantissa when it carries an exponent
    /// (4.7e-6 into FromOhms was meant as 4.7 of some prefix, not 4.7e-6 of another).
    /// </summary>
    public static string NumberText(string literal, bool negative)
    {
        var text = literal;
        var e = text.IndexOfAny(new[] { 'e', 'E' });
        if (e > 0 && !text.StartsWith("0x", System.StringComparison.OrdinalIgnoreCase))
        {
            text = text.Substring(0, e);
        }

        text = text.TrimEnd('d', 'D', 'f', 'F', 'm', 'M');
        return negative ? "-" + text : text;
    }

    /// <summary>Factories (most usual first) under which the number is plausible, leaving out the one used.</summary>
    public static List<UnitDef> Candidates(QuantityDef quantity, UnitDef used, string numberText)
    {
        var result = new List<UnitDef>();
        if (!double.TryParse(numberText, NumberStyles.Float, CultureInfo.InvariantCulture, out var number))
        {
            return result;
        }

        foreach (var name in quantity.FixOrder)
        {
            var u = quantity.ByFactory(name);
            if (u is not null && u != used && quantity.IsPlausible(u.ToSi(number)))
            {
                result.Add(u);
            }
        }

        return result;
    }
}
