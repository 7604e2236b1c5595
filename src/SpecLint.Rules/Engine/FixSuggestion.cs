namespace SpecLint.Rules.Engine;

/// <summary>
/// One replacement value that resolves a finding (references.md §D5 <c>fix</c>): the JSON Pointer of the spec key
/// and the text to write there. Rules only offer a fix after re-running the analysis with it.
/// </summary>
/// <param name="Path">JSON Pointer of the key to change, e.g. "/feedback/capacitance".</param>
/// <param name="Value">The text to write, in the quantity grammar, e.g. "3.3 pF".</param>
public sealed record FixSuggestion(string Path, string Value);
