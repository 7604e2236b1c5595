using System.Collections.Immutable;
using System.Text.Json.Nodes;

namespace SpecLint.Core.Spec.Schema;

/// <summary>The JSON Schema (draft-07) of spec files (references.md §D3), embedded in the library.</summary>
internal static class SpecSchema
{
    private static readonly Lazy<SchemaValidator> Validator = new(() => new SchemaValidator("spec.schema.json"));

    /// <summary>The validator itself (tests compare its quick check with the schema library).</summary>
    internal static SchemaValidator Shared => Validator.Value;

    /// <summary>The schema text, as exported to <c>schema/speclint.schema.json</c> for editors.</summary>
    public static string Text => Validator.Value.Text;

    /// <summary>Validates a spec tree; every error is worded for people and names where to report it.</summary>
    public static ImmutableArray<SchemaViolation> Validate(JsonNode? root) => Validator.Value.Validate(root);
}
