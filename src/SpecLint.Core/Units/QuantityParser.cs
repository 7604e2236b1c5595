using System.Globalization;
using System.Text.RegularExpressions;

namespace SpecLint.Core.Units;

/// <summary>
/// Parses the quantity grammar of references.md §D3: a number, optional space, optional SI prefix and a unit;
/// an optional tolerance (±5 %, ±0.25 pF, +10 %/-20 %, IEC 60062 letter code); or a range a .. b.
/// Also IEC 60062 RKM codes (4k7, 2p2, R47, 470R) for resistance and capacitance.
/// </summary>
public static partial class QuantityParser
{
    [GeneratedRegex(@"^(?<num>[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*(?<unit>[^\s±+\-(]*)\s*(?<tol>.*)$", RegexOptions.CultureInvariant)]
    private static partial Regex ValueRegex();

    // RKM: the letter stands for the decimal point and the multiplier (IEC 60062 §4): 4k7, 2p2, R47, 470R, 1M0.
    // "F" counts as the farad only when attached (2p2F): after a space it is the ±1 % letter code (4k7 F).
    [GeneratedRegex(@"^(?<int>\d*)(?<mark>[RrKkMGTpnuµμm])(?<frac>\d*)(?:\s*(?<unit>Ω|\u2126|ohm|ohms)|(?<unit>F))?(?<rest>(?:\s+.*)?)$", RegexOptions.CultureInvariant)]
    private static partial Regex RkmRegex();

    [GeneratedRegex(@"^(?:±|\+/-|\+-)\s*(?<a>.+)$", RegexOptions.CultureInvariant)]
    private static partial Regex SymmetricRegex();

    [GeneratedRegex(@"^(?<s1>[+-])\s*(?<a>[^/]+?)\s*/\s*(?<s2>[+-])\s*(?<b>.+)$", RegexOptions.CultureInvariant)]
    private static partial Regex AsymmetricRegex();

    [GeneratedRegex(@"^\(?(?<code>[A-Z])\)?$", RegexOptions.CultureInvariant)]
    private static partial Regex LetterRegex();

    /// <summary>Parses <paramref name="text"/> as a value of <paramref name="dimension"/>; throws <see cref="QuantityParseException"/> with a fix-it message.</summary>
    public static ParsedQuantity Parse(string text, Dimension dimension)
    {
        ArgumentNullException.ThrowIfNull(text);
        var trimmed = text.Trim();
        if (trimmed.Length == 0)
        {
            throw new QuantityParseException($"empty value; write {UnitTable.Describe(dimension)} such as \"{UnitTable.Example(dimension)}\"");
        }

        var dots = trimmed.IndexOf("..", StringComparison.Ordinal);
        if (dots >= 0)
        {
            return ParseRange(trimmed[..dots].Trim(), trimmed[(dots + 2)..].Trim(), dimension, trimmed);
        }

        return ParseWithTolerance(trimmed, dimension);
    }

    /// <summary>Parses a single value with no tolerance and returns it in SI.</summary>
    public static double ParseSingle(string text, Dimension dimension)
    {
        var parsed = Parse(text, dimension);
        if (parsed.Form != ToleranceForm.None)
        {
            throw new QuantityParseException($"\"{text.Trim()}\" has a tolerance or range, but this key takes one value; write e.g. \"{UnitTable.Example(dimension)}\"");
        }

        return parsed.Typ;
    }

    /// <summary>Like <see cref="Parse"/> but returns false and a message instead of throwing.</summary>
    public static bool TryParse(string text, Dimension dimension, out ParsedQuantity? value, out string? error)
    {
        try
        {
            value = Parse(text, dimension);
            error = null;
            return true;
        }
        catch (QuantityParseException e)
        {
            value = null;
            error = e.Message;
            return false;
        }
    }

    private static ParsedQuantity ParseRange(string low, string high, Dimension dimension, string whole)
    {
        if (low.Length == 0 || high.Length == 0)
        {
            throw new QuantityParseException($"\"{whole}\" is an incomplete range; write both ends, e.g. \"{RangeExample(dimension)}\"");
        }

        var a = ParseBare(low, dimension, out var tolA);
        var b = ParseBare(high, dimension, out var tolB);
        if (tolA.Length > 0 || tolB.Length > 0)
        {
            throw new QuantityParseException($"\"{whole}\": a range cannot also carry a tolerance; write either \"{RangeExample(dimension)}\" or one value with a tolerance");
        }

        if (a > b)
        {
            throw new QuantityParseException($"\"{whole}\": the range runs backwards; write the low end first, e.g. \"{high.Trim()} .. {low.Trim()}\"");
        }

        return new ParsedQuantity(dimension, (a + b) / 2, a, b, ToleranceForm.Range, HasTypical: false);
    }

    private static string RangeExample(Dimension dimension) => dimension switch
    {
        Dimension.Temperature => "-10 °C .. 60 °C",
        Dimension.Frequency => "1 Hz .. 100 kHz",
        _ => $"{UnitTable.Example(dimension)} .. {UnitTable.Example(dimension)}",
    };

    private static ParsedQuantity ParseWithTolerance(string text, Dimension dimension)
    {
        var typ = ParseBare(text, dimension, out var tolerance);
        if (tolerance.Length == 0)
        {
            return ParsedQuantity.Exact(dimension, typ);
        }

        return ParseTolerance(text, typ, tolerance, dimension) with { ToleranceText = tolerance };
    }

    private static ParsedQuantity ParseTolerance(string text, double typ, string tolerance, Dimension dimension)
    {

        var letter = LetterRegex().Match(tolerance);
        if (letter.Success)
        {
            return ApplyLetterCode(text, typ, letter.Groups["code"].Value[0], dimension);
        }

        var sym = SymmetricRegex().Match(tolerance);
        if (sym.Success)
        {
            var (delta, relative) = ParseDeviation(sym.Groups["a"].Value, typ, dimension, text);
            return Build(dimension, typ, delta, delta, relative, text);
        }

        var asym = AsymmetricRegex().Match(tolerance);
        if (asym.Success && asym.Groups["s1"].Value != asym.Groups["s2"].Value)
        {
            var (d1, r1) = ParseDeviation(asym.Groups["a"].Value, typ, dimension, text);
            var (d2, r2) = ParseDeviation(asym.Groups["b"].Value, typ, dimension, text);
            var (plus, minus) = asym.Groups["s1"].Value == "+" ? (d1, d2) : (d2, d1);
            return Build(dimension, typ, minus, plus, r1 && r2, text);
        }

        throw new QuantityParseException(
            $"cannot read the tolerance \"{tolerance}\" in \"{text}\"; write e.g. \"{UnitTable.Example(dimension)} ±5%\" or \"{UnitTable.Example(dimension)} +10%/-20%\"");
    }

    private static ParsedQuantity Build(Dimension dimension, double typ, double minus, double plus, bool relative, string text)
    {
        if (minus < 0 || plus < 0)
        {
            throw new QuantityParseException($"\"{text}\": a tolerance is a size; write it without a sign inside, e.g. \"±5%\" or \"+10%/-20%\"");
        }

        return new ParsedQuantity(dimension, typ, typ - minus, typ + plus, relative ? ToleranceForm.Relative : ToleranceForm.Absolute);
    }

    /// <summary>Reads "5%", "5 %", "0.25 pF", "30 ppm" as a deviation from <paramref name="typ"/>.</summary>
    private static (double Delta, bool Relative) ParseDeviation(string text, double typ, Dimension dimension, string whole)
    {
        var t = text.Trim();
        if (t.EndsWith("ppm", StringComparison.Ordinal))
        {
            return (Math.Abs(typ) * ParseNumber(t[..^3].Trim(), whole, dimension, -6), true);
        }

        if (t.EndsWith('%'))
        {
            return (Math.Abs(typ) * ParseNumber(t[..^1].Trim(), whole, dimension, -2), true);
        }

        if (dimension == Dimension.Temperature)
        {
            // ±5 °C is a temperature difference: no offset.
            var m = ValueRegex().Match(t);
            if (m.Success && m.Groups["unit"].Value is "°C" or "K" or "degC" && m.Groups["tol"].Value.Length == 0)
            {
                return (ParseNumber(m.Groups["num"].Value, whole, dimension, 0), false);
            }
        }

        double value;
        string extra;
        try
        {
            value = ParseBare(t, dimension, out extra);
        }
        catch (QuantityParseException)
        {
            // The deviation's own complaint ("twenty" is not a number) hides that it is the tolerance that is wrong.
            extra = t;
            value = 0;
        }

        if (extra.Length > 0)
        {
            throw new QuantityParseException($"cannot read the tolerance in \"{whole}\"; write e.g. \"±5%\" or \"+10%/-20%\"");
        }

        return (value, false);
    }

    private static ParsedQuantity ApplyLetterCode(string text, double typ, char code, Dimension dimension)
    {
        if (dimension is not (Dimension.Capacitance or Dimension.Resistance))
        {
            throw new QuantityParseException($"\"{text}\": tolerance letter codes apply to resistors and capacitors only; write e.g. \"±5%\"");
        }

        var letter = ToleranceLetterCodes.Find(code)
            ?? throw new QuantityParseException($"\"{text}\": '{code}' is not a tolerance letter SpecLint reads; use one of {ToleranceLetterCodes.KnownLetters} or write e.g. \"±5%\"");

        var (minus, plus, _) = letter.Deviation(typ, dimension);
        if (double.IsNaN(minus))
        {
            throw new QuantityParseException($"\"{text}\": letter '{code}' has no meaning below 10 pF; write the tolerance in pF, e.g. \"±0.25 pF\"");
        }

        return new ParsedQuantity(dimension, typ, typ - minus, typ + plus, ToleranceForm.LetterCode);
    }

    /// <summary>Parses one value with its unit (no range); returns what follows the unit in <paramref name="rest"/>.</summary>
    private static double ParseBare(string text, Dimension dimension, out string rest)
    {
        var rkm = RkmRegex().Match(text);
        if (rkm.Success && dimension is Dimension.Resistance or Dimension.Capacitance && IsRkm(rkm))
        {
            rest = rkm.Groups["rest"].Value.Trim();
            return ParseRkm(rkm, dimension, text);
        }

        var m = ValueRegex().Match(text);
        if (!m.Success)
        {
            throw new QuantityParseException($"\"{text}\" is not a number with a unit; write {UnitTable.Describe(dimension)} such as \"{UnitTable.Example(dimension)}\"");
        }

        var unitText = m.Groups["unit"].Value;
        rest = m.Groups["tol"].Value.Trim();
        if (unitText.Length == 0)
        {
            if (UnitTable.AllowsBareNumber(dimension))
            {
                return ParseNumber(m.Groups["num"].Value, text, dimension, 0);
            }

            throw new QuantityParseException($"\"{text}\" has no unit; {UnitTable.Describe(dimension)} needs one, e.g. \"{WithUnitHint(m.Groups["num"].Value, dimension)}\"");
        }

        if (!UnitTable.TryResolve(unitText, out var unit, out var prefix))
        {
            if (dimension is Dimension.Resistance && unitText is "k" or "K" or "M" or "G" or "R" or "m")
            {
                throw new QuantityParseException($"\"{text}\" has no unit; write \"{m.Groups["num"].Value} {(unitText == "K" ? "k" : unitText == "R" ? "" : unitText)}Ω\" or the RKM code \"{RkmHint(m.Groups["num"].Value, unitText)}\"");
            }

            var spelled = UnitTable.SuggestSpelling(unitText);
            var hint = spelled is not null ? $"did you mean \"{m.Groups["num"].Value} {spelled}\"? " : "";
            throw new QuantityParseException($"unknown unit \"{unitText}\" in \"{text}\"; {hint}{UnitTable.Describe(dimension)} is written like \"{UnitTable.Example(dimension)}\" (prefixes f p n u µ m k M G T are case-sensitive)");
        }

        if (unit.Dimension != dimension)
        {
            throw new QuantityParseException($"\"{text}\" is {UnitTable.Describe(unit.Dimension)}, but this key takes {UnitTable.Describe(dimension)}; write e.g. \"{UnitTable.Example(dimension)}\"");
        }

        if (unit.ToSi is not null)
        {
            return unit.ToSi(ParseNumber(m.Groups["num"].Value, text, dimension, 0));
        }

        return ParseNumber(m.Groups["num"].Value, text, dimension, unit.Power10 + prefix);
    }

    private static string WithUnitHint(string number, Dimension dimension)
    {
        var example = UnitTable.Example(dimension);
        var space = example.IndexOf(' ', StringComparison.Ordinal);
        return number + example[space..];
    }

    private static string RkmHint(string number, string letter)
    {
        var point = number.IndexOf('.', StringComparison.Ordinal);
        var mark = letter == "K" ? "k" : letter;
        return point < 0 ? number + mark : number[..point] + mark + number[(point + 1)..];
    }

    private static bool IsRkm(Match rkm)
    {
        var hasInt = rkm.Groups["int"].Value.Length > 0;
        var hasFrac = rkm.Groups["frac"].Value.Length > 0;
        var mark = rkm.Groups["mark"].Value;
        // 4k7, 2p2, R47 and 470R are codes; "47k" alone reads as a value missing its unit, so it is not.
        return (hasInt && hasFrac) || (!hasInt && hasFrac) || (hasInt && !hasFrac && mark is "R" or "r");
    }

    private static double ParseRkm(Match rkm, Dimension dimension, string text)
    {
        var mark = rkm.Groups["mark"].Value;
        var unit = rkm.Groups["unit"].Value;
        var power = mark switch
        {
            "R" or "r" => 0,
            "k" or "K" => 3,
            "M" => 6,
            "G" => 9,
            "T" => 12,
            "m" => -3,
            "u" or "µ" or "μ" => -6,
            "n" => -9,
            "p" => -12,
            _ => 0,
        };

        var isResistorMark = mark is "R" or "r" or "k" or "K" or "M" or "G" or "T";
        if (dimension == Dimension.Resistance != isResistorMark || (unit.Length > 0 && (unit == "F") != (dimension == Dimension.Capacitance)))
        {
            throw new QuantityParseException($"\"{text}\": the RKM letter '{mark}' does not fit {UnitTable.Describe(dimension)}; write e.g. \"{UnitTable.Example(dimension)}\"");
        }

        var digits = (rkm.Groups["int"].Value.Length == 0 ? "0" : rkm.Groups["int"].Value) + "." + (rkm.Groups["frac"].Value.Length == 0 ? "0" : rkm.Groups["frac"].Value);
        return ParseNumber(digits, text, dimension, power);
    }

    /// <summary>Parses decimal text scaled by 10^power10 with a single rounding, so "2.2" with p gives exactly 2.2e-12.</summary>
    private static double ParseNumber(string number, string whole, Dimension dimension, int power10)
    {
        var n = number;
        var exponent = power10;
        var e = n.IndexOfAny(['e', 'E']);
        if (e >= 0)
        {
            if (!int.TryParse(n[(e + 1)..], NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var written))
            {
                throw new QuantityParseException($"\"{whole}\" has an unreadable exponent; write e.g. \"{UnitTable.Example(dimension)}\"");
            }

            exponent += written;
            n = n[..e];
        }

        var ok = double.TryParse(n + "E" + exponent.ToString(CultureInfo.InvariantCulture), NumberStyles.Float, CultureInfo.InvariantCulture, out var value);
        if (!ok || double.IsNaN(value) || double.IsInfinity(value))
        {
            throw new QuantityParseException($"\"{whole}\" is not a finite number; write e.g. \"{UnitTable.Example(dimension)}\"");
        }

        return value;
    }
}
