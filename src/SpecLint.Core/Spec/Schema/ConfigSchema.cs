using System.Collections.Immutable;
using System.Text.Json.Nodes;

namespace SpecLint.Core.Spec.Schema;

/// <summary>The JSON Schema (draft-07) of the repository configuration <c>.speclint.yaml</c> (references.md §D8), embedded in the library.</summary>
internal static class ConfigSchema
{
    private static readonly Lazy<SchemaValidator> Validator = new(() => new SchemaValidator("config.schema.json"));

    /// <summary>The validator itself (tests compare its quick check with the schema library).</summary>
    internal static SchemaValidator Shared => Validator.Value;

    /// <summary>The schema text.</summary>
    public static string Text => Validator.Value.Text;

    /// <summary>Validates a configuration tree.</summary>
    public static ImmutableArray<SchemaViolation> Validate(JsonNode? root) => Validator.Value.Validate(root);
}
