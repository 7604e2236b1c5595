namespace SpecLint.Core.Spec.Schema;

/// <summary>One schema error, worded for the person editing the file.</summary>
/// <param name="Pointer">JSON Pointer of the node the message is about (for a missing key: the key it would have).</param>
/// <param name="Keyword">The JSON Schema keyword that failed (type, required, additionalProperties, ...).</param>
/// <param name="Message">Plain-English message with an example of the fix.</param>
/// <param name="Location">Where to report it: the value, the key that holds it, or the parent that lacks a key.</param>
internal sealed record SchemaViolation(string Pointer, string Keyword, string Message, ViolationLocation Location);
