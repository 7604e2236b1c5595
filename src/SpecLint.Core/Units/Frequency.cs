namespace SpecLint.Core.Units;

/// <summary>Frequency in hertz.</summary>
public readonly record struct Frequency(double Hertz) : IQuantity<Frequency>
{
    /// <inheritdoc />
    public static Dimension Dimension => Dimension.Frequency;

    /// <inheritdoc />
    public static Frequency FromSi(double si) => new(si);

    /// <inheritdoc />
    public double Si => Hertz;

    /// <summary>Zero.</summary>
    public static Frequency Zero => new(0);

    public static Frequency operator +(Frequency a, Frequency b) => new(a.Hertz + b.Hertz);
    public static Frequency operator -(Frequency a, Frequency b) => new(a.Hertz - b.Hertz);
    public static Frequency operator -(Frequency a) => new(-a.Hertz);
    public static Frequency operator *(Frequency a, double k) => new(a.Hertz * k);
    public static Frequency operator *(double k, Frequency a) => new(a.Hertz * k);
    public static Frequency operator /(Frequency a, double k) => new(a.Hertz / k);
    public static double operator /(Frequency a, Frequency b) => a.Hertz / b.Hertz;
    public static bool operator <(Frequency a, Frequency b) => a.Hertz < b.Hertz;
    public static bool operator >(Frequency a, Frequency b) => a.Hertz > b.Hertz;
    public static bool operator <=(Frequency a, Frequency b) => a.Hertz <= b.Hertz;
    public static bool operator >=(Frequency a, Frequency b) => a.Hertz >= b.Hertz;

    /// <inheritdoc />
    public int CompareTo(Frequency other) => Hertz.CompareTo(other.Hertz);

    /// <summary>Engineering notation that parses back to the same value, e.g. the text a fix suggests.</summary>
    public override string ToString() => QuantityFormat.Format(Si, Dimension);
}
