namespace SpecLint.Core.Units;

/// <summary>Current in amperes.</summary>
public readonly record struct Current(double Amperes) : IQuantity<Current>
{
    /// <inheritdoc />
    public static Dimension Dimension => Dimension.Current;

    /// <inheritdoc />
    public static Current FromSi(double si) => new(si);

    /// <inheritdoc />
    public double Si => Amperes;

    /// <summary>Zero.</summary>
    public static Current Zero => new(0);

    public static Current operator +(Current a, Current b) => new(a.Amperes + b.Amperes);
    public static Current operator -(Current a, Current b) => new(a.Amperes - b.Amperes);
    public static Current operator -(Current a) => new(-a.Amperes);
    public static Current operator *(Current a, double k) => new(a.Amperes * k);
    public static Current operator *(double k, Current a) => new(a.Amperes * k);
    public static Current operator /(Current a, double k) => new(a.Amperes / k);
    public static double operator /(Current a, Current b) => a.Amperes / b.Amperes;
    public static bool operator <(Current a, Current b) => a.Amperes < b.Amperes;
    public static bool operator >(Current a, Current b) => a.Amperes > b.Amperes;
    public static bool operator <=(Current a, Current b) => a.Amperes <= b.Amperes;
    public static bool operator >=(Current a, Current b) => a.Amperes >= b.Amperes;

    /// <inheritdoc />
    public int CompareTo(Current other) => Amperes.CompareTo(other.Amperes);

    /// <summary>Engineering notation that parses back to the same value, e.g. the text a fix suggests.</summary>
    public override string ToString() => QuantityFormat.Format(Si, Dimension);
}
