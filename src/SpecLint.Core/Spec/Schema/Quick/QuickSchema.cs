using System.Text.Json.Nodes;
using System.Text.RegularExpressions;

namespace SpecLint.Core.Spec.Schema.Quick;

/// <summary>
/// One schema object compiled for the quick check (<see cref="QuickSchemaCompiler"/>): a walk over the YAML tree's
/// nodes that can only say "certainly valid". Whenever the answer could differ from the schema library's — an
/// error, a number that is not plain, text where counting or matching rules of libraries differ — it says no,
/// and the caller runs the library, which decides and words the errors.
/// </summary>
internal sealed class QuickSchema
{
    /// <summary>A boolean schema: true accepts everything, false nothing; null for an object schema.</summary>
    public bool? Always { get; set; }

    public QuickTypes Types { get; set; } = QuickTypes.Any;

    public QuickSchema? Ref { get; set; }

    public List<QuickSchema>? AllOf { get; set; }

    public List<string>? Required { get; set; }

    public Dictionary<string, QuickSchema>? Properties { get; set; }

    /// <summary>The schema of keys not in <see cref="Properties"/>; null accepts any.</summary>
    public QuickSchema? AdditionalProperties { get; set; }

    public QuickSchema? Items { get; set; }

    public bool UniqueItems { get; set; }

    public int? MinItems { get; set; }

    public int? MinLength { get; set; }

    public int? MaxLength { get; set; }

    public double? Minimum { get; set; }

    public double? Maximum { get; set; }

    public QuickPattern? Pattern { get; set; }

    /// <summary>Allowed values: strings and whole numbers only (the compiler refuses other enums).</summary>
    public List<object>? Enum { get; set; }

    /// <summary>True only when <paramref name="node"/> is valid against this schema for certain.</summary>
    public bool Accepts(JsonNode? node)
    {
        if (Always is { } always)
        {
            return always;
        }

        if (Ref is { } r && !r.Accepts(node))
        {
            return false;
        }

        if (AllOf is { } all)
        {
            foreach (var s in all)
            {
                if (!s.Accepts(node))
                {
                    return false;
                }
            }
        }

        var kind = QuickKinds.Of(node);
        if (kind == QuickKind.Unsure || !Types.Allows(kind))
        {
            return false;
        }

        return kind switch
        {
            QuickKind.String => AcceptsText(node!.GetValue<string>()),
            QuickKind.Integer or QuickKind.Number => AcceptsNumber(node!, kind),
            QuickKind.Object => AcceptsObject((JsonObject)node!),
            QuickKind.Array => AcceptsArray((JsonArray)node!),
            _ => Enum is null,
        };
    }

    private bool AcceptsText(string text)
    {
        if (Enum is { } values && !values.Contains(text))
        {
            return false;
        }

        if (MinLength is { } min && !QuickText.CertainlyAtLeast(text, min))
        {
            return false;
        }

        if (MaxLength is { } max && !QuickText.CertainlyAtMost(text, max))
        {
            return false;
        }

        return Pattern is not { } p || p.CertainlyMatches(text);
    }

    private bool AcceptsNumber(JsonNode node, QuickKind kind)
    {
        var value = QuickKinds.Number(node);
        if (Enum is { } values)
        {
            // Only a whole number read as one compares for certain with a whole-number enum entry.
            if (kind != QuickKind.Integer || !node.AsValue().TryGetValue<long>(out var whole) || !values.Contains(whole))
            {
                return false;
            }
        }

        return (Minimum is not { } min || CertainlyOrdered(min, value, kind)) && (Maximum is not { } max || CertainlyOrdered(value, max, kind));
    }

    /// <summary>
    /// <paramref name="low"/> ≤ <paramref name="high"/> for certain: exact for whole numbers against a whole bound;
    /// otherwise with a margin, so a value on a bound is left to the library's own arithmetic.
    /// </summary>
    private static bool CertainlyOrdered(double low, double high, QuickKind kind) =>
        kind == QuickKind.Integer && Math.Floor(low) == low && Math.Floor(high) == high
            ? low <= high
            : high - low > 1e-9 * Math.Max(1, Math.Max(Math.Abs(low), Math.Abs(high)));

    private bool AcceptsObject(JsonObject map)
    {
        if (Enum is not null)
        {
            return false;
        }

        if (Required is { } required)
        {
            foreach (var key in required)
            {
                if (!map.ContainsKey(key))
                {
                    return false;
                }
            }
        }

        foreach (var (key, value) in map)
        {
            if (Properties is { } props && props.TryGetValue(key, out var schema))
            {
                if (!schema.Accepts(value))
                {
                    return false;
                }
            }
            else if (AdditionalProperties is { } extra && !extra.Accepts(value))
            {
                return false;
            }
        }

        return true;
    }

    private bool AcceptsArray(JsonArray list)
    {
        if (Enum is not null || (MinItems is { } min && list.Count < min))
        {
            return false;
        }

        if (Items is { } items)
        {
            foreach (var item in list)
            {
                if (!items.Accepts(item))
                {
                    return false;
                }
            }
        }

        return !UniqueItems || QuickKinds.CertainlyDistinct(list);
    }
}
