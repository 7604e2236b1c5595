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

    /// <summary>Builds a frequency from an angular frequency ω in rad/s (f = ω / 2π), e.g. 1/(R·C).</summary>
    public static Frequency FromRadiansPerSecond(double radiansPerSecond) => new(radiansPerSecond / (2 * Math.PI));

    /// <summary>The angular frequency ω = 2π·f in rad/s.</summary>
    public double RadiansPerSecond => 2 * Math.PI * Hertz;

    /// <summary>Builds a value from hertz.</summary>
    public static Frequency FromHertz(double hertz) => new(hertz);

    /// <summary>Builds a value from kilohertz.</summary>
    public static Frequency FromKilohertz(double kilohertz) => new(kilohertz * 1e3);

    /// <summary>Builds a value from megahertz.</summary>
    public static Frequency FromMegahertz(double megahertz) => new(megahertz * 1e6);

    /// <summary>Builds a value from gigahertz.</summary>
    public static Frequency FromGigahertz(double gigahertz) => new(gigahertz * 1e9);

    /// <summary>The value in kilohertz.</summary>
    public double Kilohertz => Hertz / 1e3;

    /// <summary>The value in megahertz.</summary>
    public double Megahertz => Hertz / 1e6;

    /// <summary>The value in gigahertz.</summary>
    public double Gigahertz => Hertz / 1e9;

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
