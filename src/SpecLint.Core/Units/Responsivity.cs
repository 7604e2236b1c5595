namespace SpecLint.Core.Units;

/// <summary>Photodetector responsivity in A/W.</summary>
public readonly record struct Responsivity(double AmperesPerWatt) : IQuantity<Responsivity>
{
    /// <inheritdoc />
    public static Dimension Dimension => Dimension.Responsivity;

    /// <inheritdoc />
    public static Responsivity FromSi(double si) => new(si);

    /// <inheritdoc />
    public double Si => AmperesPerWatt;

    /// <summary>Zero.</summary>
    public static Responsivity Zero => new(0);

    public static Responsivity operator +(Responsivity a, Responsivity b) => new(a.AmperesPerWatt + b.AmperesPerWatt);
    public static Responsivity operator -(Responsivity a, Responsivity b) => new(a.AmperesPerWatt - b.AmperesPerWatt);
    public static Responsivity operator -(Responsivity a) => new(-a.AmperesPerWatt);
    public static Responsivity operator *(Responsivity a, double k) => new(a.AmperesPerWatt * k);
    public static Responsivity operator *(double k, Responsivity a) => new(a.AmperesPerWatt * k);
    public static Responsivity operator /(Responsivity a, double k) => new(a.AmperesPerWatt / k);
    public static double operator /(Responsivity a, Responsivity b) => a.AmperesPerWatt / b.AmperesPerWatt;
    public static bool operator <(Responsivity a, Responsivity b) => a.AmperesPerWatt < b.AmperesPerWatt;
    public static bool operator >(Responsivity a, Responsivity b) => a.AmperesPerWatt > b.AmperesPerWatt;
    public static bool operator <=(Responsivity a, Responsivity b) => a.AmperesPerWatt <= b.AmperesPerWatt;
    public static bool operator >=(Responsivity a, Responsivity b) => a.AmperesPerWatt >= b.AmperesPerWatt;

    /// <inheritdoc />
    public int CompareTo(Responsivity other) => AmperesPerWatt.CompareTo(other.AmperesPerWatt);

    /// <summary>Engineering notation that parses back to the same value, e.g. the text a fix suggests.</summary>
    public override string ToString() => QuantityFormat.Format(Si, Dimension);
}
