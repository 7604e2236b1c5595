using System.Globalization;
using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>
/// An EIA-198 ceramic dielectric code and the capacitance change it allows over temperature
/// (references.md §3.6; the codes are from memory, EIA-198 and IEC 60384-8/-9 were not consulted).
/// </summary>
/// <remarks>
/// <para>Class 1 codes (C0G, NP0, U2J, P2H, ...) give a temperature coefficient and its tolerance:
/// first letter the significant figure, digit the multiplier, last letter the tolerance in ppm/K
/// (C0G = 0 ± 30 ppm/K, P2H = −150 ± 60 ppm/K, U2J = −750 ± 120 ppm/K). The change at a temperature T is
/// (α ± δ)·(T − 25 °C), taken at both ends of the operating range.</para>
/// <para>Class 2 codes (X7R, X5R, Y5V, ...) give only a band the capacitance stays in over the rated range
/// (first letter: low temperature, digit: high temperature, last letter: the band). The curve inside the
/// band is not known, so the whole band is used as a conservative bound whenever the operating range is
/// anything but 25 °C alone. DC-bias and ageing losses are not included (references.md §3.6).</para>
/// </remarks>
public sealed record Dielectric
{
    private const double ReferenceCelsius = 25;

    // Class 1 significant figure (first letter), multiplier (digit) and tolerance in ppm/K (last letter).
    private static readonly Dictionary<char, double> Class1Figure = new()
    {
        ['C'] = 0, ['B'] = 0.3, ['L'] = 0.8, ['A'] = 0.9, ['M'] = 1.0, ['P'] = 1.5,
        ['R'] = 2.2, ['S'] = 3.3, ['T'] = 4.7, ['V'] = 5.6, ['U'] = 7.5,
    };

    private static readonly Dictionary<char, double> Class1Multiplier = new()
    {
        ['0'] = -1, ['1'] = -10, ['2'] = -100, ['3'] = -1000, ['4'] = -10000,
        ['5'] = 1, ['6'] = 10, ['7'] = 100, ['8'] = 1000, ['9'] = 10000,
    };

    private static readonly Dictionary<char, double> Class1TolerancePpm = new()
    {
        ['G'] = 30, ['H'] = 60, ['J'] = 120, ['K'] = 250, ['L'] = 500, ['M'] = 1000, ['N'] = 2500,
    };

    // Class 2 low temperature (first letter), high temperature (digit), change in percent (last letter).
    private static readonly Dictionary<char, double> Class2Low = new() { ['X'] = -55, ['Y'] = -30, ['Z'] = 10 };

    private static readonly Dictionary<char, double> Class2High = new()
    {
        ['4'] = 65, ['5'] = 85, ['6'] = 105, ['7'] = 125, ['8'] = 150, ['9'] = 200,
    };

    private static readonly Dictionary<char, (double Minus, double Plus)> Class2Change = new()
    {
        ['A'] = (1.0, 1.0), ['B'] = (1.5, 1.5), ['C'] = (2.2, 2.2), ['D'] = (3.3, 3.3), ['E'] = (4.7, 4.7), ['F'] = (7.5, 7.5),
        ['P'] = (10, 10), ['R'] = (15, 15), ['S'] = (22, 22), ['T'] = (33, 22), ['U'] = (56, 22), ['V'] = (82, 22),
    };

    private Dielectric()
    {
    }

    /// <summary>The code as normalised (upper case; NP0 and NPO read as C0G but keep their spelling here).</summary>
    public required string Code { get; init; }

    /// <summary>1 for temperature-compensating (C0G, U2J, ...), 2 for high-permittivity (X7R, Y5V, ...).</summary>
    public required int Class { get; init; }

    /// <summary>Class 1: the nominal temperature coefficient in ppm/K (0 for C0G); 0 for class 2.</summary>
    public double CoefficientPpmPerKelvin { get; private init; }

    /// <summary>Class 1: the tolerance of the coefficient in ppm/K (30 for C0G); 0 for class 2.</summary>
    public double CoefficientTolerancePpmPerKelvin { get; private init; }

    /// <summary>Class 2: the largest fall over the rated range, in percent (82 for Y5V); 0 for class 1.</summary>
    public double MinusPercent { get; private init; }

    /// <summary>Class 2: the largest rise over the rated range, in percent (22 for Y5V); 0 for class 1.</summary>
    public double PlusPercent { get; private init; }

    /// <summary>Lowest rated temperature (class 1 codes are rated −55 °C .. +125 °C).</summary>
    public Temperature RatedLow { get; private init; }

    /// <summary>Highest rated temperature.</summary>
    public Temperature RatedHigh { get; private init; }

    /// <summary>Parses an EIA code such as C0G, NP0, U2J, X7R or Y5V (case-insensitive); false for anything else.</summary>
    /// <param name="code">The code as written in the spec.</param>
    /// <param name="dielectric">The dielectric, or null.</param>
    public static bool TryParse(string? code, [System.Diagnostics.CodeAnalysis.NotNullWhen(true)] out Dielectric? dielectric)
    {
        dielectric = null;
        var c = code?.Trim().ToUpperInvariant();
        if (c is null)
        {
            return false;
        }

        // NP0 ("negative-positive zero") is the older name of C0G; NPO with a letter O is the usual misspelling.
        var lookup = c is "NP0" or "NPO" ? "C0G" : c;
        if (lookup.Length != 3)
        {
            return false;
        }

        if (Class2Low.TryGetValue(lookup[0], out var low) && Class2High.TryGetValue(lookup[1], out var high)
            && Class2Change.TryGetValue(lookup[2], out var change))
        {
            dielectric = new Dielectric
            {
                Code = c,
                Class = 2,
                MinusPercent = change.Minus,
                PlusPercent = change.Plus,
                RatedLow = Temperature.FromCelsius(low),
                RatedHigh = Temperature.FromCelsius(high),
            };
            return true;
        }

        if (Class1Figure.TryGetValue(lookup[0], out var figure) && Class1Multiplier.TryGetValue(lookup[1], out var multiplier)
            && Class1TolerancePpm.TryGetValue(lookup[2], out var tolerance))
        {
            dielectric = new Dielectric
            {
                Code = c,
                Class = 1,
                // 0 × −1 is −0; a plain 0 keeps "0 ppm/K" in the text.
                CoefficientPpmPerKelvin = figure == 0 ? 0 : figure * multiplier,
                CoefficientTolerancePpmPerKelvin = tolerance,
                RatedLow = Temperature.FromCelsius(-55),
                RatedHigh = Temperature.FromCelsius(125),
            };
            return true;
        }

        return false;
    }

    /// <summary>
    /// The factors (low, high) that multiply the capacitance over the operating range [<paramref name="low"/>,
    /// <paramref name="high"/>], relative to its value at 25 °C; (1, 1) when the range is 25 °C alone.
    /// </summary>
    /// <param name="low">Coldest operating temperature.</param>
    /// <param name="high">Hottest operating temperature.</param>
    public (double Low, double High) TemperatureFactors(Temperature low, Temperature high)
    {
        if (low > high)
        {
            (low, high) = (high, low);
        }

        var dLow = low.Celsius - ReferenceCelsius;
        var dHigh = high.Celsius - ReferenceCelsius;
        if (dLow == 0 && dHigh == 0)
        {
            return (1, 1);
        }

        if (Class == 2)
        {
            return (1 - (MinusPercent / 100), 1 + (PlusPercent / 100));
        }

        // (α ± δ)·ΔT at both ends of the range, and 25 °C itself (factor 1) when the range contains it.
        var lo = 1.0;
        var hi = 1.0;
        var extreme = false;
        foreach (var dt in (ReadOnlySpan<double>)[dLow, dHigh])
        {
            foreach (var ppm in (ReadOnlySpan<double>)[CoefficientPpmPerKelvin - CoefficientTolerancePpmPerKelvin, CoefficientPpmPerKelvin + CoefficientTolerancePpmPerKelvin])
            {
                var f = 1 + (ppm * 1e-6 * dt);
                if (!extreme)
                {
                    (lo, hi, extreme) = (f, f, true);
                }
                else
                {
                    lo = Math.Min(lo, f);
                    hi = Math.Max(hi, f);
                }
            }
        }

        if (dLow <= 0 && dHigh >= 0)
        {
            lo = Math.Min(lo, 1);
            hi = Math.Max(hi, 1);
        }

        return (lo, hi);
    }

    /// <summary>True when [<paramref name="low"/>, <paramref name="high"/>] lies inside the rated range.</summary>
    public bool IsRatedFor(Temperature low, Temperature high) => low >= RatedLow && high <= RatedHigh;

    /// <summary>The characteristic in words, e.g. "C0G 0 ±30 ppm/K" or "Y5V +22/−82 %".</summary>
    public string Describe() => Class == 1
        ? string.Create(CultureInfo.InvariantCulture, $"{Code} {CoefficientPpmPerKelvin:0.##} ±{CoefficientTolerancePpmPerKelvin:0.##} ppm/K")
        : MinusPercent == PlusPercent
            ? string.Create(CultureInfo.InvariantCulture, $"{Code} ±{PlusPercent:0.##} %")
            : string.Create(CultureInfo.InvariantCulture, $"{Code} +{PlusPercent:0.##}/−{MinusPercent:0.##} %");
}
