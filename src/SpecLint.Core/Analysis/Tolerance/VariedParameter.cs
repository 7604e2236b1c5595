namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>A parameter the tolerance analysis varies, with its limits as factors or values.</summary>
/// <param name="Pointer">JSON Pointer of the spec key.</param>
/// <param name="Label">Short name, e.g. "Cf".</param>
/// <param name="Low">The low limit, formatted with its unit.</param>
/// <param name="Typical">The typical value, formatted with its unit.</param>
/// <param name="High">The high limit, formatted with its unit.</param>
/// <param name="Source">Where the spread comes from, e.g. "±0.25 pF (C) and C0G ±30 ppm/K over -10 °C .. 60 °C".</param>
public sealed record VariedParameter(string Pointer, string Label, string Low, string Typical, string High, string Source);
