namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>The value one varied parameter takes at a corner.</summary>
/// <param name="Pointer">JSON Pointer of the spec key (or a derived name such as "/conditions/temperature").</param>
/// <param name="Label">Short name for messages, e.g. "Cf", "GBW".</param>
/// <param name="End">Which end of its spread.</param>
/// <param name="Value">The value, formatted with its unit, e.g. "0.75 pF".</param>
public sealed record CornerSetting(string Pointer, string Label, CornerEnd End, string Value)
{
    /// <summary>
    /// The exact value in SI units (a factor for "/feedback/dielectric"), so a corner can be rebuilt
    /// (<see cref="ToleranceAnalyzer.CircuitAt"/>); <see cref="Value"/> is rounded for people.
    /// </summary>
    public double SiValue { get; init; }
}
