using System;
using System.Linq;

namespace SpecLint.Analyzers.Units;

/// <summary>
/// Reads the unit or dimension a name ends with, as the house style writes raw doubles
/// (<c>cfPf</c>, <c>bandwidthMHz</c>, <c>gain_db</c>, <c>capacitance</c>).
/// </summary>
internal static class NameUnits
{
    // Case-insensitive suffixes. "mhz" and "mohm" read as mega: millihertz and milliohms do not occur
    // in a receiver front end, and people type the mega prefix in lower case. Single letters (V, A, K, C)
    // are left out: too many names end in them for other reasons.
    private static readonly (string Suffix, string Quantity, string? Symbol)[] Table =
    {
        ("farads", "Capacitance", "F"), ("uf", "Capacitance", "µF"), ("nf", "Capacitance", "nF"), ("pf", "Capacitance", "pF"), ("femtofarads", "Capacitance", "fF"),
        ("ohms", "Resistance", "Ω"), ("ohm", "Resistance", "Ω"), ("kohms", "Resistance", "kΩ"), ("kohm", "Resistance", "kΩ"),
        ("mohms", "Resistance", "MΩ"), ("mohm", "Resistance", "MΩ"), ("gohms", "Resistance", "GΩ"), ("gohm", "Resistance", "GΩ"),
        ("hz", "Frequency", "Hz"), ("khz", "Frequency", "kHz"), ("mhz", "Frequency", "MHz"), ("ghz", "Frequency", "GHz"),
        ("radpersec", "Frequency", "rad/s"), ("radpersecond", "Frequency", "rad/s"), ("radianspersecond", "Frequency", "rad/s"),
        ("volts", "Voltage", "V"), ("mv", "Voltage", "mV"), ("uv", "Voltage", "µV"),
        ("amps", "Current", "A"), ("amperes", "Current", "A"), ("ua", "Current", "µA"), ("na", "Current", "nA"), ("pa", "Current", "pA"), ("fa", "Current", "fA"),
        ("watts", "Power", "W"), ("mw", "Power", "mW"), ("uw", "Power", "µW"), ("nw", "Power", "nW"),
        ("vperus", "SlewRate", "V/µs"),
        ("kelvin", "Temperature", "K"), ("celsius", "Temperature", "°C"), ("degc", "Temperature", "°C"),
        ("deg", "Angle", "deg"), ("degrees", "Angle", "deg"), ("rad", "Angle", "rad"), ("radians", "Angle", "rad"),
        ("db", "Gain", "dB"),
        ("capacitance", "Capacitance", null), ("resistance", "Resistance", null), ("frequency", "Frequency", null),
        ("bandwidth", "Frequency", null), ("voltage", "Voltage", null), ("current", "Current", null),
        ("power", "Power", null), ("temperature", "Temperature", null), ("angle", "Angle", null), ("phase", "Angle", null),
    };

    // Longest first, so "MHz" wins over "Hz" and "kohm" over "ohm".
    private static readonly (string Suffix, string Quantity, string? Symbol)[] Ordered =
        Table.OrderByDescending(t => t.Suffix.Length).ToArray();

    // A unit after one of these is the denominator of a compound unit (nV/√Hz, V/µs): the name does
    // not say a plain unit, so it is not judged.
    private static readonly string[] CompoundMarkers = { "per", "root", "rt", "sqrt" };

    public static NameUnit? Read(string name)
    {
        foreach (var (suffix, quantity, symbol) in Ordered)
        {
            if (name.Length < suffix.Length || !name.EndsWith(suffix, StringComparison.OrdinalIgnoreCase))
            {
                continue;
            }

            var start = name.Length - suffix.Length;
            if (!IsWordStart(name, start))
            {
                continue;
            }

            var before = name.Substring(0, start).TrimEnd('_');
            if (CompoundMarkers.Any(m => before.EndsWith(m, StringComparison.OrdinalIgnoreCase)))
            {
                return null;
            }

            var q = UnitCatalog.Named(quantity)!;
            return new NameUnit(q, symbol is null ? null : q.BySymbol(symbol), name.Substring(start));
        }

        return null;
    }

    // A word starts at the beginning, after an underscore or a digit, or at an upper-case letter that
    // follows a lower-case one (camelCase).
    private static bool IsWordStart(string name, int i)
    {
        if (i == 0)
        {
            return true;
        }

        var prev = name[i - 1];
        var cur = name[i];
        return prev == '_' || char.IsDigit(prev) || (char.IsUpper(cur) && char.IsLower(prev));
    }
}
