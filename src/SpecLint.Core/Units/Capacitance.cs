namespace SpecLint.Core.Units;

/// <summary>Capacitance in farads.</summary>
public readonly record struct Capacitance(double Farads) : IQuantity<Capacitance>
{
    /// <inheritdoc />
    public static Dimension Dimension => Dimension.Capacitance;

    /// <inheritdoc />
    public static Capacitance FromSi(double si) => new(si);

    /// <inheritdoc />
    public double Si => Farads;

    /// <summary>Zero.</summary>
    public static Capacitance Zero => new(0);

    public static Capacitance operator +(Capacitance a, Capacitance b) => new(a.Farads + b.Farads);
    public static Capacitance operator -(Capacitance a, Capacitance b) => new(a.Farads - b.Farads);
    public static Capacitance operator -(Capacitance a) => new(-a.Farads);
    public static Capacitance operator *(Capacitance a, double k) => new(a.Farads * k);
    public static Capacitance operator *(double k, Capacitance a) => new(a.Farads * k);
    public static Capacitance operator /(Capacitance a, double k) => new(a.Farads / k);
    public static double operator /(Capacitance a, Capacitance b) => a.Farads / b.Farads;
    public static bool operator <(Capacitance a, Capacitance b) => a.Farads < b.Farads;
    public static bool operator >(Capacitance a, Capacitance b) => a.Farads > b.Farads;
    public static bool operator <=(Capacitance a, Capacitance b) => a.Farads <= b.Farads;
    public static bool operator >=(Capacitance a, Capacitance b) => a.Farads >= b.Farads;

    /// <inheritdoc />
    public int CompareTo(Capacitance other) => Farads.CompareTo(other.Farads);

    /// <summary>Engineering notation that parses back to the same value, e.g. the text a fix suggests.</summary>
    public override string ToString() => QuantityFormat.Format(Si, Dimension);
}
