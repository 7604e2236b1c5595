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

        return new(T.FromSi(parsed.Typ), T.FromSi(parsed.Min), T.FromSi(parsed.Max), parsed.Form) { ToleranceText = parsed.ToleranceText };
    }

    /// <summary>The tolerance as written after the value (e.g. "±5%"), or null; kept when a fix rewrites the value.</summary>
    public string? ToleranceText { get; init; }

    /// <summary>The text a fix writes for this key at a new nominal value: the value plus the tolerance as written.</summary>
    public string TextAt(T typ) => ToleranceText is { Length: > 0 } t ? $"{typ} {t}" : typ.ToString()!;

    /// <summary>True when the value does not vary.</summary>
    public bool IsExact => Min.Si == Typ.Si && Max.Si == Typ.Si;

    /// <summary>Min / Typ, the factor the low limit applies (1 for an exact value).</summary>
    public double LowFactor => Typ.Si == 0 ? 1 : Min.Si / Typ.Si;

    /// <summary>Max / Typ, the factor the high limit applies.</summary>
    public double HighFactor => Typ.Si == 0 ? 1 : Max.Si / Typ.Si;

    /// <summary>The value with the largest magnitude, for worst-case error terms such as offset voltage.</summary>
    public T WorstMagnitude => Math.Abs(Min.Si) > Math.Abs(Max.Si) ? Min : Max;

    /// <summary>The same spread at a different nominal value, keeping its relative limits.</summary>
    public Spread<T> WithTyp(T typ) => new(typ, T.FromSi(typ.Si * LowFactor), T.FromSi(typ.Si * HighFactor), Form) { ToleranceText = ToleranceText };

    /// <summary>
    /// The same part at another nominal value, as a fix suggestion needs it: an absolute tolerance
    /// (±0.25 pF, or a capacitor letter code below 10 pF) keeps its size, a relative one keeps its ratio.
    /// </summary>
    public Spread<T> Retarget(T typ)
    {
        var absolute = Form == ToleranceForm.Absolute
            || (Form == ToleranceForm.LetterCode && T.Dimension == Dimension.Capacitance && Typ.Si < ToleranceLetterCode.AbsoluteThresholdFarads);
        return absolute
            ? new(typ, T.FromSi(typ.Si - (Typ.Si - Min.Si)), T.FromSi(typ.Si + (Max.Si - Typ.Si)), Form) { ToleranceText = ToleranceText }
            : WithTyp(typ) with { ToleranceText = ToleranceText };
    }

    /// <summary>The relative tolerance half-width, max(|Min/Typ − 1|, |Max/Typ − 1|); 0 for an exact value.</summary>
    public double RelativeTolerance => Typ.Si == 0 ? 0 : Math.Max(Math.Abs(LowFactor - 1), Math.Abs(HighFactor - 1));

    /// <inheritdoc />
    public override string ToString() => IsExact ? Typ.ToString()! : $"{Typ} ({Min} .. {Max})";
}
