namespace SpecLint.Core.Units;

/// <summary>
/// A spec value with the spread a real build sees: the typical value and the limits its tolerance,
/// range or temperature characteristic allows. An exact value has Min = Typ = Max.
/// </summary>
/// <typeparam name="T">The quantity type.</typeparam>
/// <param name="Typ">The nominal value.</param>
/// <param name="Min">The low limit.</param>
/// <param name="Max">The high limit.</param>
/// <param name="Form">How the spread was written in the spec.</param>
public readonly record struct Spread<T>(T Typ, T Min, T Max, ToleranceForm Form)
    where T : struct, IQuantity<T>
{
    /// <summary>A value with no spread.</summary>
    public static Spread<T> Exact(T value) => new(value, value, value, ToleranceForm.None);

    /// <summary>Builds a spread from a parsed value of the matching dimension.</summary>
    public static Spread<T> From(ParsedQuantity parsed)
    {
        ArgumentNullException.ThrowIfNull(parsed);
        if (parsed.Dimension != T.Dimension)
        {
            throw new ArgumentException($"a {parsed.Dimension} value cannot become a {T.Dimension}", nameof(parsed));
        }

        return new(T.FromSi(parsed.Typ), T.FromSi(parsed.Min), T.FromSi(parsed.Max), parsed.Form);
    }

    /// <summary>True when the value does not vary.</summary>
    public bool IsExact => Min.Si == Typ.Si && Max.Si == Typ.Si;

    /// <summary>Min / Typ, the factor the low limit applies (1 for an exact value).</summary>
    public double LowFactor => Typ.Si == 0 ? 1 : Min.Si / Typ.Si;

    /// <summary>Max / Typ, the factor the high limit applies.</summary>
    public double HighFactor => Typ.Si == 0 ? 1 : Max.Si / Typ.Si;

    /// <summary>The value with the largest magnitude, for worst-case error terms such as offset voltage.</summary>
    public T WorstMagnitude => Math.Abs(Min.Si) > Math.Abs(Max.Si) ? Min : Max;

    /// <summary>The same spread at a different nominal value, keeping its relative limits.</summary>
    public Spread<T> WithTyp(T typ) => new(typ, T.FromSi(typ.Si * LowFactor), T.FromSi(typ.Si * HighFactor), Form);

    /// <inheritdoc />
    public override string ToString() => IsExact ? Typ.ToString()! : $"{Typ} ({Min} .. {Max})";
}
