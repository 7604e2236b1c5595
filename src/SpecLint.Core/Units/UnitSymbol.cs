namespace SpecLint.Core.Units;

/// <summary>
/// One unit symbol a spec may write. Decimal units carry a power of ten so that parsing stays exact
/// (the decimal digits the user wrote become the nearest double, never a product of two roundings);
/// the few non-decimal units (°C, dB, degrees) convert with a function.
/// </summary>
/// <param name="Symbol">The text as written, e.g. "Ω", "ohm", "V/√Hz".</param>
/// <param name="Dimension">The dimension the symbol belongs to.</param>
/// <param name="Power10">SI value = written value × 10^Power10 (ignored when <paramref name="ToSi"/> is set).</param>
/// <param name="AcceptsPrefix">Whether SI prefixes (f p n u µ m k M G T) may precede it.</param>
/// <param name="ToSi">Conversion for units that are not a power of ten of the SI unit.</param>
/// <param name="FromSi">The inverse of <paramref name="ToSi"/>.</param>
public sealed record UnitSymbol(
    string Symbol,
    Dimension Dimension,
    int Power10,
    bool AcceptsPrefix,
    Func<double, double>? ToSi = null,
    Func<double, double>? FromSi = null);
