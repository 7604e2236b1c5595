namespace SpecLint.Core.Units;

/// <summary>A voltage gain held as a linear ratio (V/V); specs may write it in dB.</summary>
public readonly record struct Gain(double Linear) : IQuantity<Gain>
{
    /// <inheritdoc />
    public static Dimension Dimension => Dimension.Gain;

    /// <inheritdoc />
    public static Gain FromSi(double si) => new(si);

    /// <summary>Builds a gain from decibels (20·log10 of a voltage ratio).</summary>
    public static Gain FromDecibels(double db) => new(Math.Pow(10, db / 20));

    /// <inheritdoc />
    public double Si => Linear;

    /// <summary>The gain in dB, 20·log10(V/V).</summary>
    public double Decibels => 20 * Math.Log10(Linear);

    public static bool operator <(Gain a, Gain b) => a.Linear < b.Linear;
    public static bool operator >(Gain a, Gain b) => a.Linear > b.Linear;
    public static bool operator <=(Gain a, Gain b) => a.Linear <= b.Linear;
    public static bool operator >=(Gain a, Gain b) => a.Linear >= b.Linear;

    /// <inheritdoc />
    public int CompareTo(Gain other) => Linear.CompareTo(other.Linear);

    /// <inheritdoc />
    public override string ToString() => QuantityFormat.Format(Si, Dimension);
}
