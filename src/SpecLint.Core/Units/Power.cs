namespace SpecLint.Core.Units;

/// <summary>Power in watts.</summary>
public readonly record struct Power(double Watts) : IQuantity<Power>
{
    /// <inheritdoc />
    public static Dimension Dimension => Dimension.Power;

    /// <inheritdoc />
    public static Power FromSi(double si) => new(si);

    /// <inheritdoc />
    public double Si => Watts;

    /// <summary>Builds a value from watts.</summary>
    public static Power FromWatts(double watts) => new(watts);

    /// <summary>Builds a value from milliwatts.</summary>
    public static Power FromMilliwatts(double milliwatts) => new(milliwatts / 1e3);

    /// <summary>Builds a value from microwatts.</summary>
    public static Power FromMicrowatts(double microwatts) => new(microwatts / 1e6);

    /// <summary>Builds a value from nanowatts.</summary>
    public static Power FromNanowatts(double nanowatts) => new(nanowatts / 1e9);

    /// <summary>The value in milliwatts.</summary>
    public double Milliwatts => Watts * 1e3;

    /// <summary>The value in microwatts.</summary>
    public double Microwatts => Watts * 1e6;

    /// <summary>The value in nanowatts.</summary>
    public double Nanowatts => Watts * 1e9;

    /// <summary>Zero.</summary>
    public static Power Zero => new(0);

    public static Power operator +(Power a, Power b) => new(a.Watts + b.Watts);
    public static Power operator -(Power a, Power b) => new(a.Watts - b.Watts);
    public static Power operator -(Power a) => new(-a.Watts);
    public static Power operator *(Power a, double k) => new(a.Watts * k);
    public static Power operator *(double k, Power a) => new(a.Watts * k);
    public static Power operator /(Power a, double k) => new(a.Watts / k);
    public static double operator /(Power a, Power b) => a.Watts / b.Watts;
    public static bool operator <(Power a, Power b) => a.Watts < b.Watts;
    public static bool operator >(Power a, Power b) => a.Watts > b.Watts;
    public static bool operator <=(Power a, Power b) => a.Watts <= b.Watts;
    public static bool operator >=(Power a, Power b) => a.Watts >= b.Watts;

    /// <inheritdoc />
    public int CompareTo(Power other) => Watts.CompareTo(other.Watts);

    /// <summary>Engineering notation that parses back to the same value, e.g. the text a fix suggests.</summary>
    public override string ToString() => QuantityFormat.Format(Si, Dimension);
}
