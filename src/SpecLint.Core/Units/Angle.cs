namespace SpecLint.Core.Units;

/// <summary>A plane angle held in radians; specs and reports use degrees.</summary>
public readonly record struct Angle(double Radians) : IQuantity<Angle>
{
    /// <inheritdoc />
    public static Dimension Dimension => Dimension.Angle;

    /// <inheritdoc />
    public static Angle FromSi(double si) => new(si);

    /// <summary>Builds an angle from degrees.</summary>
    public static Angle FromDegrees(double degrees) => new(degrees * Math.PI / 180);

    /// <summary>Builds an angle from radians.</summary>
    public static Angle FromRadians(double radians) => new(radians);

    /// <inheritdoc />
    public double Si => Radians;

    /// <summary>The angle in degrees.</summary>
    public double Degrees => Radians * 180 / Math.PI;

    public static Angle operator +(Angle a, Angle b) => new(a.Radians + b.Radians);
    public static Angle operator -(Angle a, Angle b) => new(a.Radians - b.Radians);
    public static bool operator <(Angle a, Angle b) => a.Radians < b.Radians;
    public static bool operator >(Angle a, Angle b) => a.Radians > b.Radians;
    public static bool operator <=(Angle a, Angle b) => a.Radians <= b.Radians;
    public static bool operator >=(Angle a, Angle b) => a.Radians >= b.Radians;

    /// <inheritdoc />
    public int CompareTo(Angle other) => Radians.CompareTo(other.Radians);

    /// <inheritdoc />
    public override string ToString() => QuantityFormat.Format(Si, Dimension);
}
