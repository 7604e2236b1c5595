namespace SpecLint.Core.Units;

/// <summary>A value of one physical dimension, held in SI units.</summary>
/// <typeparam name="TSelf">The concrete quantity type.</typeparam>
public interface IQuantity<TSelf> : IComparable<TSelf>
    where TSelf : struct, IQuantity<TSelf>
{
    /// <summary>The dimension every value of this type has.</summary>
    static abstract Dimension Dimension { get; }

    /// <summary>Builds a value from its SI magnitude.</summary>
    static abstract TSelf FromSi(double si);

    /// <summary>The magnitude in SI units (ohm, farad, hertz, volt, ampere, ...).</summary>
    double Si { get; }
}
