namespace SpecLint.Core.Units;

/// <summary>Voltage in volts.</summary>
public readonly record struct Voltage(double Volts) : IQuantity<Voltage>
{
    /// <inheritdoc />
    public static Dimension Dimension => Dimension.Voltage;

    /// <inheritdoc />
    public static Voltage FromSi(double si) => new(si);

    /// <inheritdoc />
    public double Si => Volts;

    /// <summary>Zero.</summary>
    public static Voltage Zero => new(0);

    public static Voltage operator +(Voltage a, Voltage b) => new(a.Volts + b.Volts);
    public static Voltage operator -(Voltage a, Voltage b) => new(a.Volts - b.Volts);
    public static Voltage operator -(Voltage a) => new(-a.Volts);
    public static Voltage operator *(Voltage a, double k) => new(a.Volts * k);
    public static Voltage operator *(double k, Voltage a) => new(a.Volts * k);
    public static Voltage operator /(Voltage a, double k) => new(a.Volts / k);
    public static double operator /(Voltage a, Voltage b) => a.Volts / b.Volts;
    public static bool operator <(Voltage a, Voltage b) => a.Volts < b.Volts;
    public static bool operator >(Voltage a, Voltage b) => a.Volts > b.Volts;
    public static bool operator <=(Voltage a, Voltage b) => a.Volts <= b.Volts;
    public static bool operator >=(Voltage a, Voltage b) => a.Volts >= b.Volts;

    /// <inheritdoc />
    public int CompareTo(Voltage other) => Volts.CompareTo(other.Volts);

    /// <summary>Engineering notation that parses back to the same value, e.g. the text a fix suggests.</summary>
    public override string ToString() => QuantityFormat.Format(Si, Dimension);
}
