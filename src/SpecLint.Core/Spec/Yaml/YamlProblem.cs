namespace SpecLint.Core.Spec.Yaml;

/// <summary>Something wrong with the YAML itself (syntax, limits, duplicate keys), where it was found.</summary>
/// <param name="Line">1-based line.</param>
/// <param name="Column">1-based column.</param>
/// <param name="Pointer">JSON Pointer of the node concerned ("" for the whole file).</param>
/// <param name="Message">Plain-English message that says how to fix it.</param>
internal sealed record YamlProblem(int Line, int Column, string Pointer, string Message);
