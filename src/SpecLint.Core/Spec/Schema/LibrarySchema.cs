using System.Text.Json;
using Json.Schema;

namespace SpecLint.Core.Spec.Schema;

/// <summary>
/// One of our schemas compiled by the schema library. A class of its own so that nothing else refers to the
/// library's types: the library registers every dialect and meta-schema when it first loads, which a run of files
/// that pass the quick check never needs.
/// </summary>
internal sealed class LibrarySchema(string text)
{
    private readonly JsonSchema _schema = JsonSchema.FromText(text);

    /// <summary>The library's verdict alone.</summary>
    public bool Accepts(JsonElement document) =>
        _schema.Evaluate(document, new EvaluationOptions { OutputFormat = OutputFormat.Flag }).IsValid;

    /// <summary>Every result, for wording errors.</summary>
    public EvaluationResults Evaluate(JsonElement document) =>
        _schema.Evaluate(document, new EvaluationOptions { OutputFormat = OutputFormat.List });
}
