namespace SpecLint.Core.Units;

/// <summary>Absolute temperature in kelvin; specs usually write it in °C.</summary>
public readonly record struct Temperature(double Kelvin) : IQuantity<Temperature>
{
    /// <summary>0 °C in kelvin (exact, SI Brochure 9th ed.).</summary>
    public const double ZeroCelsiusInKelvin = 273.15;

    /// <inheritdoc />
    public static Dimension Dimension => Dimension.Temperature;

    /// <inheritdoc />
    public static Temperature FromSi(double si) => new(si);

    /// <summary>Builds a temperature from degrees Celsius.</summary>
    public static Temperature FromCelsius(double celsius) => new(celsius + ZeroCelsiusInKelvin);

    /// <summary>Builds a temperature from kelvin.</summary>
    public static Temperature FromKelvin(double kelvin) => new(kelvin);

    /// <summary>The usual reference temperature of datasheets, 25 °C.</summary>
    public static Temperature Room => FromCelsius(25);

    /// <inheritdoc />
    public double Si => Kelvin;

    /// <summary>The temperature in degrees Celsius.</summary>
    public double Celsius => Kelvin - ZeroCelsiusInKelvin;

    public static bool operator <(Temperature a, Temperature b) => a.Kelvin < b.Kelvin;
    public static bool operator >(Temperature a, Temperature b) => a.Kelvin > b.Kelvin;
    public static bool operator <=(Temperature a, Temperature b) => a.Kelvin <= b.Kelvin;
    public static bool operator >=(Temperature a, Temperature b) => a.Kelvin >= b.Kelvin;

    /// <inheritdoc />
    public int CompareTo(Temperature other) => Kelvin.CompareTo(other.Kelvin);

    /// <inheritdoc />
    public override string ToString() => QuantityFormat.Format(Si, Dimension);
}
