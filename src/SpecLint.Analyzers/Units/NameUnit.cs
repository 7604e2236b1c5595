namespace SpecLint.Analyzers.Units;

/// <summary>What a name says about its value: a dimension, and a unit when the name spells one.</summary>
internal sealed class NameUnit
{
    public NameUnit(QuantityDef quantity, UnitDef? unit, string suffix)
    {
        Quantity = quantity;
        Unit = unit;
        Suffix = suffix;
    }

    public QuantityDef Quantity { get; }

    /// <summary>Null when the name only names a dimension ("capacitance"), not a unit.</summary>
    public UnitDef? Unit { get; }

    /// <summary>The end of the name that carries the unit or dimension, as written.</summary>
    public string Suffix { get; }

    /// <summary>How a message names it: the unit symbol, or the dimension in lower case.</summary>
    public string Describe() => Unit?.Symbol ?? Quantity.WithArticle;
}
