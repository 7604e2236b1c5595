namespace SpecLint.Core.Units;

/// <summary>Current noise spectral density in A/√Hz.</summary>
public readonly record struct CurrentNoiseDensity(double AmperesPerRootHertz) : IQuantity<CurrentNoiseDensity>
{
    /// <inheritdoc />
    public static Dimension Dimension => Dimension.CurrentNoiseDensity;

    /// <inheritdoc />
    public static CurrentNoiseDensity FromSi(double si) => new(si);

    /// <inheritdoc />
    public double Si => AmperesPerRootHertz;

    /// <summary>Builds a value from amperesPerRootHertz.</summary>
    public static CurrentNoiseDensity FromAmperesPerRootHertz(double amperesPerRootHertz) => new(amperesPerRootHertz);

    /// <summary>Builds a value from picoamperesPerRootHertz.</summary>
    public static CurrentNoiseDensity FromPicoamperesPerRootHertz(double picoamperesPerRootHertz) => new(picoamperesPerRootHertz / 1e12);

    /// <summary>Builds a value from femtoamperesPerRootHertz.</summary>
    public static CurrentNoiseDensity FromFemtoamperesPerRootHertz(double femtoamperesPerRootHertz) => new(femtoamperesPerRootHertz / 1e15);

    /// <summary>The value in picoamperesPerRootHertz.</summary>
    public double PicoamperesPerRootHertz => AmperesPerRootHertz * 1e12;

    /// <summary>The value in femtoamperesPerRootHertz.</summary>
    public double FemtoamperesPerRootHertz => AmperesPerRootHertz * 1e15;

    /// <summary>Zero.</summary>
    public static CurrentNoiseDensity Zero => new(0);

    public static CurrentNoiseDensity operator +(CurrentNoiseDensity a, CurrentNoiseDensity b) => new(a.AmperesPerRootHertz + b.AmperesPerRootHertz);
    public static CurrentNoiseDensity operator -(CurrentNoiseDensity a, CurrentNoiseDensity b) => new(a.AmperesPerRootHertz - b.AmperesPerRootHertz);
    public static CurrentNoiseDensity operator -(CurrentNoiseDensity a) => new(-a.AmperesPerRootHertz);
    public static CurrentNoiseDensity operator *(CurrentNoiseDensity a, double k) => new(a.AmperesPerRootHertz * k);
    public static CurrentNoiseDensity operator *(double k, CurrentNoiseDensity a) => new(a.AmperesPerRootHertz * k);
    public static CurrentNoiseDensity operator /(CurrentNoiseDensity a, double k) => new(a.AmperesPerRootHertz / k);
    public static double operator /(CurrentNoiseDensity a, CurrentNoiseDensity b) => a.AmperesPerRootHertz / b.AmperesPerRootHertz;
    public static bool operator <(CurrentNoiseDensity a, CurrentNoiseDensity b) => a.AmperesPerRootHertz < b.AmperesPerRootHertz;
    public static bool operator >(CurrentNoiseDensity a, CurrentNoiseDensity b) => a.AmperesPerRootHertz > b.AmperesPerRootHertz;
    public static bool operator <=(CurrentNoiseDensity a, CurrentNoiseDensity b) => a.AmperesPerRootHertz <= b.AmperesPerRootHertz;
    public static bool operator >=(CurrentNoiseDensity a, CurrentNoiseDensity b) => a.AmperesPerRootHertz >= b.AmperesPerRootHertz;

    /// <inheritdoc />
    public int CompareTo(CurrentNoiseDensity other) => AmperesPerRootHertz.CompareTo(other.AmperesPerRootHertz);

    /// <summary>Engineering notation that parses back to the same value, e.g. the text a fix suggests.</summary>
    public override string ToString() => QuantityFormat.Format(Si, Dimension);
}
