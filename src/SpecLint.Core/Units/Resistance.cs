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

    /// <summary>Builds a value from ohms.</summary>
    public static Resistance FromOhms(double ohms) => new(ohms);

    /// <summary>Builds a value from kiloohms.</summary>
    public static Resistance FromKiloohms(double kiloohms) => new(kiloohms * 1e3);

    /// <summary>Builds a value from megaohms.</summary>
    public static Resistance FromMegaohms(double megaohms) => new(megaohms * 1e6);

    /// <summary>Builds a value from gigaohms.</summary>
    public static Resistance FromGigaohms(double gigaohms) => new(gigaohms * 1e9);

    /// <summary>The value in kiloohms.</summary>
    public double Kiloohms => Ohms / 1e3;

    /// <summary>The value in megaohms.</summary>
    public double Megaohms => Ohms / 1e6;

    /// <summary>The value in gigaohms.</summary>
    public double Gigaohms => Ohms / 1e9;

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
