namespace SpecLint.Core.Units;

/// <summary>Voltage noise spectral density in V/√Hz.</summary>
public readonly record struct VoltageNoiseDensity(double VoltsPerRootHertz) : IQuantity<VoltageNoiseDensity>
{
    /// <inheritdoc />
    public static Dimension Dimension => Dimension.VoltageNoiseDensity;

    /// <inheritdoc />
    public static VoltageNoiseDensity FromSi(double si) => new(si);

    /// <inheritdoc />
    public double Si => VoltsPerRootHertz;

    /// <summary>Builds a value from voltsPerRootHertz.</summary>
    public static VoltageNoiseDensity FromVoltsPerRootHertz(double voltsPerRootHertz) => new(voltsPerRootHertz);

    /// <summary>Builds a value from nanovoltsPerRootHertz.</summary>
    public static VoltageNoiseDensity FromNanovoltsPerRootHertz(double nanovoltsPerRootHertz) => new(nanovoltsPerRootHertz / 1e9);

    /// <summary>The value in nanovoltsPerRootHertz.</summary>
    public double NanovoltsPerRootHertz => VoltsPerRootHertz * 1e9;

    /// <summary>Zero.</summary>
    public static VoltageNoiseDensity Zero => new(0);

    public static VoltageNoiseDensity operator +(VoltageNoiseDensity a, VoltageNoiseDensity b) => new(a.VoltsPerRootHertz + b.VoltsPerRootHertz);
    public static VoltageNoiseDensity operator -(VoltageNoiseDensity a, VoltageNoiseDensity b) => new(a.VoltsPerRootHertz - b.VoltsPerRootHertz);
    public static VoltageNoiseDensity operator -(VoltageNoiseDensity a) => new(-a.VoltsPerRootHertz);
    public static VoltageNoiseDensity operator *(VoltageNoiseDensity a, double k) => new(a.VoltsPerRootHertz * k);
    public static VoltageNoiseDensity operator *(double k, VoltageNoiseDensity a) => new(a.VoltsPerRootHertz * k);
    public static VoltageNoiseDensity operator /(VoltageNoiseDensity a, double k) => new(a.VoltsPerRootHertz / k);
    public static double operator /(VoltageNoiseDensity a, VoltageNoiseDensity b) => a.VoltsPerRootHertz / b.VoltsPerRootHertz;
    public static bool operator <(VoltageNoiseDensity a, VoltageNoiseDensity b) => a.VoltsPerRootHertz < b.VoltsPerRootHertz;
    public static bool operator >(VoltageNoiseDensity a, VoltageNoiseDensity b) => a.VoltsPerRootHertz > b.VoltsPerRootHertz;
    public static bool operator <=(VoltageNoiseDensity a, VoltageNoiseDensity b) => a.VoltsPerRootHertz <= b.VoltsPerRootHertz;
    public static bool operator >=(VoltageNoiseDensity a, VoltageNoiseDensity b) => a.VoltsPerRootHertz >= b.VoltsPerRootHertz;

    /// <inheritdoc />
    public int CompareTo(VoltageNoiseDensity other) => VoltsPerRootHertz.CompareTo(other.VoltsPerRootHertz);

    /// <summary>Engineering notation that parses back to the same value, e.g. the text a fix suggests.</summary>
    public override string ToString() => QuantityFormat.Format(Si, Dimension);
}
