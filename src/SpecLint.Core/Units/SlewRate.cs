namespace SpecLint.Core.Units;

/// <summary>Slew rate in V/s (written V/µs in specs).</summary>
public readonly record struct SlewRate(double VoltsPerSecond) : IQuantity<SlewRate>
{
    /// <inheritdoc />
    public static Dimension Dimension => Dimension.SlewRate;

    /// <inheritdoc />
    public static SlewRate FromSi(double si) => new(si);

    /// <inheritdoc />
    public double Si => VoltsPerSecond;

    /// <summary>Builds a value from voltsPerSecond.</summary>
    public static SlewRate FromVoltsPerSecond(double voltsPerSecond) => new(voltsPerSecond);

    /// <summary>Builds a value from voltsPerMicrosecond.</summary>
    public static SlewRate FromVoltsPerMicrosecond(double voltsPerMicrosecond) => new(voltsPerMicrosecond * 1e6);

    /// <summary>The value in voltsPerMicrosecond.</summary>
    public double VoltsPerMicrosecond => VoltsPerSecond / 1e6;

    /// <summary>Zero.</summary>
    public static SlewRate Zero => new(0);

    public static SlewRate operator +(SlewRate a, SlewRate b) => new(a.VoltsPerSecond + b.VoltsPerSecond);
    public static SlewRate operator -(SlewRate a, SlewRate b) => new(a.VoltsPerSecond - b.VoltsPerSecond);
    public static SlewRate operator -(SlewRate a) => new(-a.VoltsPerSecond);
    public static SlewRate operator *(SlewRate a, double k) => new(a.VoltsPerSecond * k);
    public static SlewRate operator *(double k, SlewRate a) => new(a.VoltsPerSecond * k);
    public static SlewRate operator /(SlewRate a, double k) => new(a.VoltsPerSecond / k);
    public static double operator /(SlewRate a, SlewRate b) => a.VoltsPerSecond / b.VoltsPerSecond;
    public static bool operator <(SlewRate a, SlewRate b) => a.VoltsPerSecond < b.VoltsPerSecond;
    public static bool operator >(SlewRate a, SlewRate b) => a.VoltsPerSecond > b.VoltsPerSecond;
    public static bool operator <=(SlewRate a, SlewRate b) => a.VoltsPerSecond <= b.VoltsPerSecond;
    public static bool operator >=(SlewRate a, SlewRate b) => a.VoltsPerSecond >= b.VoltsPerSecond;

    /// <inheritdoc />
    public int CompareTo(SlewRate other) => VoltsPerSecond.CompareTo(other.VoltsPerSecond);

    /// <summary>Engineering notation that parses back to the same value, e.g. the text a fix suggests.</summary>
    public override string ToString() => QuantityFormat.Format(Si, Dimension);
}
