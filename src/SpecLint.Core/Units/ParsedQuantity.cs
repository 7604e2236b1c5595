namespace SpecLint.Core.Units;

/// <summary>A spec value after parsing: its typical value and the limits its tolerance or range allows, all SI.</summary>
/// <param name="Dimension">The dimension the value was parsed as.</param>
/// <param name="Typ">The typical (nominal) value; for a range without a typical value, the midpoint.</param>
/// <param name="Min">The low limit.</param>
/// <param name="Max">The high limit.</param>
/// <param name="Form">How the spread was written.</param>
/// <param name="HasTypical">False for a range written without a typical value.</param>
public sealed record ParsedQuantity(Dimension Dimension, double Typ, double Min, double Max, ToleranceForm Form, bool HasTypical = true)
{
    /// <summary>The tolerance as written after the value (e.g. "±5%", "C", "+10%/-20%"), or null; fix suggestions keep it.</summary>
    public string? ToleranceText { get; init; }

    /// <summary>An exact value with no spread.</summary>
    public static ParsedQuantity Exact(Dimension dimension, double value) => new(dimension, value, value, value, ToleranceForm.None);
}
