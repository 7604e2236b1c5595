namespace SpecLint.Core.Units;

/// <summary>Current in amperes.</summary>
public readonly record struct Current(double Amperes) : IQuantity<Current>
{
    /// <inheritdoc />
    public static Dimension Dimension => Dimension.Current;

    /// <inheritdoc />
    public static Current FromSi(double si) => new(si);

    /// <inheritdoc />
    public double Si => Amperes;

    /// <summary>Builds a value from amperes.</summary>
    public static Current FromAmperes(double amperes) => new(amperes);

    /// <summary>Builds a value from milliamperes.</summary>
    public static Current FromMilliamperes(double milliamperes) => new(milliamperes / 1e3);

    /// <summary>Builds a value from microamperes.</summary>
    public static Current FromMicroamperes(double microamperes) => new(microamperes / 1e6);

    /// <summary>Builds a value from nanoamperes.</summary>
    public static Current FromNanoamperes(double nanoamperes) => new(nanoamperes / 1e9);

    /// <summary>Builds a value from picoamperes.</summary>
    public static Current FromPicoamperes(double picoamperes) => new(picoamperes / 1e12);

    /// <summary>Builds a value from femtoamperes.</summary>
    public static Current FromFemtoamperes(double femtoamperes) => new(femtoamperes / 1e15);

    /// <summary>The value in milliamperes.</summary>
    public double Milliamperes => Amperes * 1e3;

    /// <summary>The value in microamperes.</summary>
    public double Microamperes => Amperes * 1e6;

    /// <summary>The value in nanoamperes.</summary>
    public double Nanoamperes => Amperes * 1e9;

    /// <summary>The value in picoamperes.</summary>
    public double Picoamperes => Amperes * 1e12;

    /// <summary>The value in femtoamperes.</summary>
    public double Femtoamperes => Amperes * 1e15;

    /// <summary>Zero.</summary>
    public static Current Zero => new(0);

    public static Current operator +(Current a, Current b) => new(a.Amperes + b.Amperes);
    public static Current operator -(Current a, Current b) => new(a.Amperes - b.Amperes);
    public static Current operator -(Current a) => new(-a.Amperes);
    public static Current operator *(Current a, double k) => new(a.Amperes * k);
    public static Current operator *(double k, Current a) => new(a.Amperes * k);
    public static Current operator /(Current a, double k) => new(a.Amperes / k);
    public static double operator /(Current a, Current b) => a.Amperes / b.Amperes;
    public static bool operator <(Current a, Current b) => a.Amperes < b.Amperes;
    public static bool operator >(Current a, Current b) => a.Amperes > b.Amperes;
    public static bool operator <=(Current a, Current b) => a.Amperes <= b.Amperes;
    public static bool operator >=(Current a, Current b) => a.Amperes >= b.Amperes;

    /// <inheritdoc />
    public int CompareTo(Current other) => Amperes.CompareTo(other.Amperes);

    /// <summary>Engineering notation that parses back to the same value, e.g. the text a fix suggests.</summary>
    public override string ToString() => QuantityFormat.Format(Si, Dimension);
}
