namespace SpecLint.Analyzers.Units;

/// <summary>One unit a quantity type can be read in (an accessor) or built from (a factory).</summary>
internal sealed class UnitDef
{
    public UnitDef(string symbol, double scale, string? accessor, string? factory, double offset = 0)
    {
        Symbol = symbol;
        Scale = scale;
        Accessor = accessor;
        Factory = factory;
        Offset = offset;
    }

    /// <summary>How users write the unit, e.g. "pF"; also the identity of the unit within its dimension.</summary>
    public string Symbol { get; }

    /// <summary>SI value of one unit (1e-12 for pF, π/180 for deg).</summary>
    public double Scale { get; }

    /// <summary>Added after scaling to reach SI: only °C (273.15) has one.</summary>
    public double Offset { get; }

    /// <summary>The property that reads a value in this unit, or null.</summary>
    public string? Accessor { get; }

    /// <summary>The static factory that builds a value from this unit, or null.</summary>
    public string? Factory { get; }

    public double ToSi(double value) => value * Scale + Offset;
}
