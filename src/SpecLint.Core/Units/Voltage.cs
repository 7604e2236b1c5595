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

    /// <summary>Builds a value from volts.</summary>
    public static Voltage FromVolts(double volts) => new(volts);

    /// <summary>Builds a value from millivolts.</summary>
    public static Voltage FromMillivolts(double millivolts) => new(millivolts / 1e3);

    /// <summary>Builds a value from microvolts.</summary>
    public static Voltage FromMicrovolts(double microvolts) => new(microvolts / 1e6);

    /// <summary>The value in millivolts.</summary>
    public double Millivolts => Volts * 1e3;

    /// <summary>The value in microvolts.</summary>
    public double Microvolts => Volts * 1e6;

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
