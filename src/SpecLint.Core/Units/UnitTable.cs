using System.Collections.Frozen;

namespace SpecLint.Core.Units;

/// <summary>The unit symbols and SI prefixes of the spec grammar (references.md §D3).</summary>
public static class UnitTable
{
    /// <summary>SI prefixes and their powers of ten. Both micro signs are accepted, and "u" for keyboards without one.</summary>
    public static readonly FrozenDictionary<char, int> Prefixes = new Dictionary<char, int>
    {
        ['f'] = -15, ['p'] = -12, ['n'] = -9, ['u'] = -6, ['µ'] = -6, ['μ'] = -6,
        ['m'] = -3, ['k'] = 3, ['M'] = 6, ['G'] = 9, ['T'] = 12,
    }.ToFrozenDictionary();

    /// <summary>Prefixes used when formatting, by power of ten.</summary>
    public static readonly FrozenDictionary<int, string> FormatPrefixes = new Dictionary<int, string>
    {
        [-15] = "f", [-12] = "p", [-9] = "n", [-6] = "µ", [-3] = "m", [0] = "", [3] = "k", [6] = "M", [9] = "G", [12] = "T",
    }.ToFrozenDictionary();

    private static readonly UnitSymbol[] All =
    [
        new("Ω", Dimension.Resistance, 0, true),
        new("\u2126", Dimension.Resistance, 0, true), // U+2126 OHM SIGN, written as an escape so editors cannot fold it into U+03A9
        new("ohm", Dimension.Resistance, 0, true),
        new("ohms", Dimension.Resistance, 0, true),
        new("Ohm", Dimension.Resistance, 0, true),
        new("F", Dimension.Capacitance, 0, true),
        new("Hz", Dimension.Frequency, 0, true),
        new("V", Dimension.Voltage, 0, true),
        new("A", Dimension.Current, 0, true),
        new("W", Dimension.Power, 0, true),
        new("A/W", Dimension.Responsivity, 0, true),
        new("V/√Hz", Dimension.VoltageNoiseDensity, 0, true),
        new("V/rtHz", Dimension.VoltageNoiseDensity, 0, true),
        new("V/sqrtHz", Dimension.VoltageNoiseDensity, 0, true),
        new("A/√Hz", Dimension.CurrentNoiseDensity, 0, true),
        new("A/rtHz", Dimension.CurrentNoiseDensity, 0, true),
        new("A/sqrtHz", Dimension.CurrentNoiseDensity, 0, true),
        new("V/µs", Dimension.SlewRate, 6, false),
        new("V/μs", Dimension.SlewRate, 6, false),
        new("V/us", Dimension.SlewRate, 6, false),
        new("V/s", Dimension.SlewRate, 0, false),
        new("°C", Dimension.Temperature, 0, false, c => c + Temperature.ZeroCelsiusInKelvin, k => k - Temperature.ZeroCelsiusInKelvin),
        new("degC", Dimension.Temperature, 0, false, c => c + Temperature.ZeroCelsiusInKelvin, k => k - Temperature.ZeroCelsiusInKelvin),
        new("K", Dimension.Temperature, 0, false),
        new("dB", Dimension.Gain, 0, false, db => Math.Pow(10, db / 20), v => 20 * Math.Log10(v)),
        new("V/V", Dimension.Gain, 0, false),
        new("deg", Dimension.Angle, 0, false, d => d * Math.PI / 180, r => r * 180 / Math.PI),
        new("°", Dimension.Angle, 0, false, d => d * Math.PI / 180, r => r * 180 / Math.PI),
        new("rad", Dimension.Angle, 0, false),
        new("%", Dimension.Ratio, -2, false),
    ];

    private static readonly FrozenDictionary<string, UnitSymbol> BySymbol =
        All.ToFrozenDictionary(u => u.Symbol, StringComparer.Ordinal);

    /// <summary>The symbol reports and fix suggestions write for each dimension.</summary>
    public static UnitSymbol DisplayUnit(Dimension dimension) => dimension switch
    {
        Dimension.Resistance => BySymbol["Ω"],
        Dimension.Capacitance => BySymbol["F"],
        Dimension.Frequency => BySymbol["Hz"],
        Dimension.Voltage => BySymbol["V"],
        Dimension.Current => BySymbol["A"],
        Dimension.Power => BySymbol["W"],
        Dimension.Responsivity => BySymbol["A/W"],
        Dimension.VoltageNoiseDensity => BySymbol["V/√Hz"],
        Dimension.CurrentNoiseDensity => BySymbol["A/√Hz"],
        Dimension.SlewRate => BySymbol["V/µs"],
        Dimension.Temperature => BySymbol["°C"],
        Dimension.Gain => BySymbol["V/V"],
        Dimension.Angle => BySymbol["deg"],
        Dimension.Ratio => BySymbol["%"],
        _ => throw new ArgumentOutOfRangeException(nameof(dimension)),
    };

    /// <summary>Whether a bare number (no unit) is a complete value of this dimension.</summary>
    public static bool AllowsBareNumber(Dimension dimension) => dimension is Dimension.Gain or Dimension.Ratio;

    /// <summary>An example value for messages that show how to write a quantity.</summary>
    public static string Example(Dimension dimension) => dimension switch
    {
        Dimension.Resistance => "4.7 MΩ",
        Dimension.Capacitance => "2.2 pF",
        Dimension.Frequency => "10 MHz",
        Dimension.Voltage => "2.5 V",
        Dimension.Current => "50 pA",
        Dimension.Power => "1 mW",
        Dimension.Responsivity => "0.5 A/W",
        Dimension.VoltageNoiseDensity => "7 nV/√Hz",
        Dimension.CurrentNoiseDensity => "0.6 fA/√Hz",
        Dimension.SlewRate => "10 V/µs",
        Dimension.Temperature => "25 °C",
        Dimension.Gain => "120 dB",
        Dimension.Angle => "45 deg",
        Dimension.Ratio => "5 %",
        _ => "1",
    };

    /// <summary>A plain-language name of the dimension for messages.</summary>
    public static string Describe(Dimension dimension) => dimension switch
    {
        Dimension.Resistance => "a resistance",
        Dimension.Capacitance => "a capacitance",
        Dimension.Frequency => "a frequency",
        Dimension.Voltage => "a voltage",
        Dimension.Current => "a current",
        Dimension.Power => "a power",
        Dimension.Responsivity => "a responsivity",
        Dimension.VoltageNoiseDensity => "a voltage noise density",
        Dimension.CurrentNoiseDensity => "a current noise density",
        Dimension.SlewRate => "a slew rate",
        Dimension.Temperature => "a temperature",
        Dimension.Gain => "a gain",
        Dimension.Angle => "an angle",
        Dimension.Ratio => "a ratio",
        _ => "a value",
    };

    /// <summary>
    /// Resolves a unit text such as "pF" or "nV/√Hz": an exact symbol first (so "V/µs" is not read as a
    /// prefix), then one prefix character followed by a symbol that accepts prefixes.
    /// </summary>
    public static bool TryResolve(string text, out UnitSymbol unit, out int prefixPower10)
    {
        prefixPower10 = 0;
        if (BySymbol.TryGetValue(text, out unit!))
        {
            return true;
        }

        if (text.Length > 1 && Prefixes.TryGetValue(text[0], out var p)
            && BySymbol.TryGetValue(text[1..], out var u) && u.AcceptsPrefix)
        {
            unit = u;
            prefixPower10 = p;
            return true;
        }

        // A case-insensitive near miss is still an error, but the message can name the right spelling.
        unit = null!;
        return false;
    }

    /// <summary>Finds a symbol that differs only in letter case, for a did-you-mean hint.</summary>
    public static string? SuggestSpelling(string text)
    {
        foreach (var u in All)
        {
            if (string.Equals(u.Symbol, text, StringComparison.OrdinalIgnoreCase))
            {
                return u.Symbol;
            }

            if (text.Length > 1 && string.Equals(u.Symbol, text[1..], StringComparison.OrdinalIgnoreCase) && u.AcceptsPrefix)
            {
                var prefix = text[0] switch { 'P' => "p", 'N' => "n", 'U' => "µ", 'F' => "f", 'K' => "k", _ => text[0].ToString() };
                return prefix + u.Symbol;
            }
        }

        return null;
    }
}
