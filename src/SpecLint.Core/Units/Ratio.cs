namespace SpecLint.Core.Units;

/// <summary>A dimensionless ratio held as a fraction (written in % in specs).</summary>
public readonly record struct Ratio(double Fraction) : IQuantity<Ratio>
{
    /// <inheritdoc />
    public static Dimension Dimension => Dimension.Ratio;

    /// <inheritdoc />
    public static Ratio FromSi(double si) => new(si);

    /// <inheritdoc />
    public double Si => Fraction;

    /// <summary>Zero.</summary>
    public static Ratio Zero => new(0);

    public static Ratio operator +(Ratio a, Ratio b) => new(a.Fraction + b.Fraction);
    public static Ratio operator -(Ratio a, Ratio b) => new(a.Fraction - b.Fraction);
    public static Ratio operator -(Ratio a) => new(-a.Fraction);
    public static Ratio operator *(Ratio a, double k) => new(a.Fraction * k);
    public static Ratio operator *(double k, Ratio a) => new(a.Fraction * k);
    public static Ratio operator /(Ratio a, double k) => new(a.Fraction / k);
    public static double operator /(Ratio a, Ratio b) => a.Fraction / b.Fraction;
    public static bool operator <(Ratio a, Ratio b) => a.Fraction < b.Fraction;
    public static bool operator >(Ratio a, Ratio b) => a.Fraction > b.Fraction;
    public static bool operator <=(Ratio a, Ratio b) => a.Fraction <= b.Fraction;
    public static bool operator >=(Ratio a, Ratio b) => a.Fraction >= b.Fraction;

    /// <inheritdoc />
    public int CompareTo(Ratio other) => Fraction.CompareTo(other.Fraction);

    /// <summary>Engineering notation that parses back to the same value, e.g. the text a fix suggests.</summary>
    public override string ToString() => QuantityFormat.Format(Si, Dimension);
}
