using System.Collections.Immutable;
using Microsoft.CodeAnalysis;

namespace SpecLint.Analyzers.Units;

/// <summary>
/// The quantity types of SpecLint.Core.Units, their accessors and factories. Kept by hand because the
/// analyzer must not load the library; a test compares it with the library by reflection.
/// </summary>
internal static class UnitCatalog
{
    public const string Namespace = "SpecLint.Core.Units";

    /// <summary>
    /// Plausible magnitudes are generous bounds for a photodiode receiver, so only numbers that are
    /// off by several decades (a prefix forgotten) are flagged.
    /// </summary>
    public static readonly ImmutableArray<QuantityDef> All = ImmutableArray.Create(
        Q("Capacitance", 1e-16, 1e-2, "FromPicofarads FromNanofarads FromMicrofarads FromFemtofarads",
            U("F", 1, "Farads", "FromFarads"), U("µF", 1e-6, "Microfarads", "FromMicrofarads"), U("nF", 1e-9, "Nanofarads", "FromNanofarads"),
            U("pF", 1e-12, "Picofarads", "FromPicofarads"), U("fF", 1e-15, "Femtofarads", "FromFemtofarads")),
        Q("Resistance", 1e-2, 1e13, "FromMegaohms FromKiloohms FromGigaohms FromOhms",
            U("Ω", 1, "Ohms", "FromOhms"), U("kΩ", 1e3, "Kiloohms", "FromKiloohms"), U("MΩ", 1e6, "Megaohms", "FromMegaohms"), U("GΩ", 1e9, "Gigaohms", "FromGigaohms")),
        Q("Frequency", 1e-3, 1e11, "FromMegahertz FromKilohertz FromHertz FromGigahertz",
            U("Hz", 1, "Hertz", "FromHertz"), U("kHz", 1e3, "Kilohertz", "FromKilohertz"), U("MHz", 1e6, "Megahertz", "FromMegahertz"),
            U("GHz", 1e9, "Gigahertz", "FromGigahertz"), U("rad/s", 1 / (2 * System.Math.PI), "RadiansPerSecond", "FromRadiansPerSecond")),
        Q("Voltage", 1e-9, 1e4, "FromMillivolts FromMicrovolts FromVolts",
            U("V", 1, "Volts", "FromVolts"), U("mV", 1e-3, "Millivolts", "FromMillivolts"), U("µV", 1e-6, "Microvolts", "FromMicrovolts")),
        Q("Current", 1e-18, 10, "FromPicoamperes FromNanoamperes FromMicroamperes FromFemtoamperes FromMilliamperes FromAmperes",
            U("A", 1, "Amperes", "FromAmperes"), U("mA", 1e-3, "Milliamperes", "FromMilliamperes"), U("µA", 1e-6, "Microamperes", "FromMicroamperes"),
            U("nA", 1e-9, "Nanoamperes", "FromNanoamperes"), U("pA", 1e-12, "Picoamperes", "FromPicoamperes"), U("fA", 1e-15, "Femtoamperes", "FromFemtoamperes")),
        Q("Power", 1e-15, 100, "FromMicrowatts FromNanowatts FromMilliwatts FromWatts",
            U("W", 1, "Watts", "FromWatts"), U("mW", 1e-3, "Milliwatts", "FromMilliwatts"), U("µW", 1e-6, "Microwatts", "FromMicrowatts"), U("nW", 1e-9, "Nanowatts", "FromNanowatts")),
        Q("VoltageNoiseDensity", 1e-11, 1e-4, "FromNanovoltsPerRootHertz",
            U("V/√Hz", 1, "VoltsPerRootHertz", "FromVoltsPerRootHertz"), U("nV/√Hz", 1e-9, "NanovoltsPerRootHertz", "FromNanovoltsPerRootHertz")),
        Q("CurrentNoiseDensity", 1e-18, 1e-8, "FromFemtoamperesPerRootHertz FromPicoamperesPerRootHertz",
            U("A/√Hz", 1, "AmperesPerRootHertz", "FromAmperesPerRootHertz"), U("pA/√Hz", 1e-12, "PicoamperesPerRootHertz", "FromPicoamperesPerRootHertz"),
            U("fA/√Hz", 1e-15, "FemtoamperesPerRootHertz", "FromFemtoamperesPerRootHertz")),
        Q("SlewRate", 100, 1e11, "FromVoltsPerMicrosecond",
            U("V/s", 1, "VoltsPerSecond", "FromVoltsPerSecond"), U("V/µs", 1e6, "VoltsPerMicrosecond", "FromVoltsPerMicrosecond")),
        // Below 150 K is cryogenic: far more often a Celsius figure passed as kelvin.
        Q("Temperature", 150, 700, "FromCelsius FromKelvin",
            U("K", 1, "Kelvin", "FromKelvin"), U("°C", 1, "Celsius", "FromCelsius", 273.15)),
        // A phase beyond two turns is not an angle anyone specifies: it is degrees passed as radians.
        Q("Angle", 0, 4 * System.Math.PI, "FromDegrees FromRadians",
            U("rad", 1, "Radians", "FromRadians"), U("deg", System.Math.PI / 180, "Degrees", "FromDegrees")),
        // Gain, ratio and responsivity span any magnitude, so they have no plausible range (max 0).
        Q("Gain", 0, 0, "", U("V/V", 1, "Linear", null), U("dB", double.NaN, "Decibels", "FromDecibels")),
        Q("Ratio", 0, 0, "", U("fraction", 1, "Fraction", null)),
        Q("Responsivity", 0, 0, "", U("A/W", 1, "AmperesPerWatt", null)));

    private static readonly ImmutableDictionary<string, QuantityDef> ByName = All.ToImmutableDictionary(q => q.Name);

    /// <summary>The quantity a type symbol is, or null for any other type.</summary>
    public static QuantityDef? Of(ITypeSymbol? type)
    {
        if (type is null || type.TypeKind != TypeKind.Struct || type.ContainingNamespace?.ToDisplayString() != Namespace)
        {
            return null;
        }

        return ByName.TryGetValue(type.Name, out var q) ? q : null;
    }

    public static QuantityDef? Named(string name) => ByName.TryGetValue(name, out var q) ? q : null;

    private static QuantityDef Q(string name, double min, double max, string fixOrder, params UnitDef[] units) =>
        new(name, min, max, units.ToImmutableArray(),
            fixOrder.Split(new[] { ' ' }, System.StringSplitOptions.RemoveEmptyEntries).ToImmutableArray());

    private static UnitDef U(string symbol, double scale, string? accessor, string? factory, double offset = 0) =>
        new(symbol, scale, accessor, factory, offset);
}
