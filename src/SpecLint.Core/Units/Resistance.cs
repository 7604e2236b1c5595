namespace SpecLint.Core.Units;

/// <summary>Resistance in ohms.</summary>
public readonly record struct Resistance(double Ohms) : IQuantity<Resistance>
{
    /// <inheritdoc />
    public static Dimension Dimension => Dimension.Resistance;

    /// <inheritdoc />
    public static Resistance FromSi(double si) => new(si);

    /// <inheritdoc />
    public double Si => Ohms;

    /// <summary>Zero.</summary>
    public static Resistance Zero => new(0);

    public static Resistance operator +(Resistance a, Resistance b) => new(a.Ohms + b.Ohms);
    public static Resistance operator -(Resistance a, Resistance b) => new(a.Ohms - b.Ohms);
    public static Resistance operator -(Resistance a) => new(-a.Ohms);
    public static Resistance operator *(Resistance a, double k) => new(a.Ohms * k);
    public static Resistance operator *(double k, Resistance a) => new(a.Ohms * k);
    public static Resistance operator /(Resistance a, double k) => new(a.Ohms / k);
    public static double operator /(Resistance a, Resistance b) => a.Ohms / b.Ohms;
    public static bool operator <(Resistance a, Resistance b) => a.Ohms < b.Ohms;
    public static bool operator >(Resistance a, Resistance b) => a.Ohms > b.Ohms;
    public static bool operator <=(Resistance a, Resistance b) => a.Ohms <= b.Ohms;
    public static bool operator >=(Resistance a, Resistance b) => a.Ohms >= b.Ohms;

    /// <inheritdoc />
    public int CompareTo(Resistance other) => Ohms.CompareTo(other.Ohms);

    /// <summary>Engineering notation that parses back to the same value, e.g. the text a fix suggests.</summary>
    public override string ToString() => QuantityFormat.Format(Si, Dimension);
}
