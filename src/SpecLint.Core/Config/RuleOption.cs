using System.Text.Json;
using System.Text.Json.Nodes;
using SpecLint.Core.Spec;
using SpecLint.Core.Units;

namespace SpecLint.Core.Config;

/// <summary>One rule-specific option as written (e.g. <c>floor: 50 deg</c>); the rule decides what it means.</summary>
/// <param name="Name">The option key.</param>
/// <param name="Value">The value as JSON (text, number or boolean).</param>
/// <param name="RawText">The scalar exactly as written, for the unit parser.</param>
/// <param name="Position">Where the value sits in <c>.speclint.yaml</c>.</param>
internal sealed record RuleOption(string Name, JsonNode? Value, string RawText, SourcePosition Position)
{
    /// <summary>Parses the option as a quantity of <paramref name="dimension"/>; false with a message when it is not one.</summary>
    public bool TryGetQuantity(Dimension dimension, out ParsedQuantity? value, out string? error) =>
        QuantityParser.TryParse(RawText, dimension, out value, out error);

    /// <summary>The value as a number when it is written as one.</summary>
    public double? AsNumber() => Value is JsonValue v && v.GetValueKind() == JsonValueKind.Number ? v.GetValue<double>() : null;

    /// <summary>The value as true/false when it is written as one.</summary>
    public bool? AsBoolean() => Value is JsonValue v && v.GetValueKind() is JsonValueKind.True or JsonValueKind.False ? v.GetValue<bool>() : null;
}
