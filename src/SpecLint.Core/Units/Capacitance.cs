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

    /// <summary>Builds a value from farads.</summary>
    public static Capacitance FromFarads(double farads) => new(farads);

    /// <summary>Builds a value from microfarads.</summary>
    public static Capacitance FromMicrofarads(double microfarads) => new(microfarads / 1e6);

    /// <summary>Builds a value from nanofarads.</summary>
    public static Capacitance FromNanofarads(double nanofarads) => new(nanofarads / 1e9);

    /// <summary>Builds a value from picofarads.</summary>
    public static Capacitance FromPicofarads(double picofarads) => new(picofarads / 1e12);

    /// <summary>Builds a value from femtofarads.</summary>
    public static Capacitance FromFemtofarads(double femtofarads) => new(femtofarads / 1e15);

    /// <summary>The value in microfarads.</summary>
    public double Microfarads => Farads * 1e6;

    /// <summary>The value in nanofarads.</summary>
    public double Nanofarads => Farads * 1e9;

    /// <summary>The value in picofarads.</summary>
    public double Picofarads => Farads * 1e12;

    /// <summary>The value in femtofarads.</summary>
    public double Femtofarads => Farads * 1e15;

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
