using SpecLint.Rules.Engine;

namespace SpecLint.HouseRules.Compiling;

/// <summary>A compiler or allow-list diagnostic, at a position in a house-rule source (1-based).</summary>
/// <param name="RuleId"><c>house-rule-invalid</c> or <c>house-rule-forbidden</c>.</param>
/// <param name="Severity">Error or warning.</param>
/// <param name="Path">The source, relative to the configuration's folder.</param>
/// <param name="Line">1-based line.</param>
/// <param name="Column">1-based column.</param>
/// <param name="Message">What is wrong, with the compiler's code where there is one.</param>
internal sealed record CompileProblem(string RuleId, Severity Severity, string Path, int Line, int Column, string Message);
