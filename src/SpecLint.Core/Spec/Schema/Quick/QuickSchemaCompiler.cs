using System.Globalization;
using System.Text.Json;

namespace SpecLint.Core.Spec.Schema.Quick;

/// <summary>
/// Compiles a draft-07 schema into <see cref="QuickSchema"/> nodes, once per process. Only the keywords our
/// schemas use are known; a schema with any other keyword (or a <c>$ref</c> beside other keywords, which draft-07
/// ignores) compiles to null and every document then goes to the schema library.
/// </summary>
internal sealed class QuickSchemaCompiler
{
    private static readonly HashSet<string> Annotations = new(StringComparer.Ordinal)
    {
        "$schema", "$id", "$comment", "title", "description", "examples", "default", "definitions",
    };

    private readonly JsonElement _root;
    private readonly Dictionary<string, QuickSchema> _byPointer = new(StringComparer.Ordinal);

    private QuickSchemaCompiler(JsonElement root)
    {
        _root = root;
    }

    /// <summary>The compiled schema, or null when it uses something the quick check does not know.</summary>
    public static QuickSchema? Compile(string schemaText)
    {
        using var doc = JsonDocument.Parse(schemaText);
        try
        {
            return new QuickSchemaCompiler(doc.RootElement).Node(doc.RootElement, "");
        }
        catch (NotSupportedException)
        {
            return null;
        }
    }

    private QuickSchema Node(JsonElement e, string pointer)
    {
        if (_byPointer.TryGetValue(pointer, out var known))
        {
            return known;
        }

        // Registered before its children so that a $ref back to it (recursion) finds it.
        var node = new QuickSchema();
        _byPointer[pointer] = node;
        if (e.ValueKind is JsonValueKind.True or JsonValueKind.False)
        {
            node.Always = e.ValueKind == JsonValueKind.True;
            return node;
        }

        if (e.ValueKind != JsonValueKind.Object)
        {
            throw new NotSupportedException(pointer);
        }

        // Plain loops rather than LINQ over JSON elements here: generic code over the library's value types cannot
        // be compiled ahead of time into our assembly, and this runs in every cold start.
        var hasRef = e.TryGetProperty("$ref", out _);
        foreach (var p in e.EnumerateObject())
        {
            if (hasRef && p.Name != "$ref" && !Annotations.Contains(p.Name))
            {
                throw new NotSupportedException(pointer);
            }

            Keyword(node, p, pointer + "/" + Escape(p.Name));
        }

        return node;
    }

    private void Keyword(QuickSchema node, JsonProperty p, string at)
    {
        var v = p.Value;
        switch (p.Name)
        {
            case var _ when Annotations.Contains(p.Name):
                break;
            case "$ref":
                node.Ref = Target(v.GetString()!);
                break;
            case "type":
                if (v.ValueKind != JsonValueKind.Array)
                {
                    node.Types = TypeOf(v);
                    break;
                }

                node.Types = QuickTypes.None;
                foreach (var t in v.EnumerateArray())
                {
                    node.Types |= TypeOf(t);
                }

                break;
            case "allOf":
                node.AllOf = [];
                foreach (var s in v.EnumerateArray())
                {
                    node.AllOf.Add(Node(s, at + "/" + node.AllOf.Count.ToString(CultureInfo.InvariantCulture)));
                }

                break;
            case "required":
                node.Required = [];
                foreach (var s in v.EnumerateArray())
                {
                    node.Required.Add(s.GetString()!);
                }

                break;
            case "properties":
                node.Properties = new(StringComparer.Ordinal);
                foreach (var q in v.EnumerateObject())
                {
                    node.Properties[q.Name] = Node(q.Value, at + "/" + Escape(q.Name));
                }

                break;
            case "additionalProperties":
                node.AdditionalProperties = Node(v, at);
                break;
            case "items" when v.ValueKind != JsonValueKind.Array:
                node.Items = Node(v, at);
                break;
            case "uniqueItems":
                node.UniqueItems = v.GetBoolean();
                break;
            case "minItems":
                node.MinItems = v.GetInt32();
                break;
            case "minLength":
                node.MinLength = v.GetInt32();
                break;
            case "maxLength":
                node.MaxLength = v.GetInt32();
                break;
            case "minimum":
                node.Minimum = v.GetDouble();
                break;
            case "maximum":
                node.Maximum = v.GetDouble();
                break;
            case "pattern":
                node.Pattern = new QuickPattern(v.GetString()!);
                break;
            case "enum":
                node.Enum = [];
                foreach (var item in v.EnumerateArray())
                {
                    node.Enum.Add(EnumValue(item));
                }

                break;
            default:
                throw new NotSupportedException(at);
        }
    }

    private static object EnumValue(JsonElement e) => e.ValueKind switch
    {
        JsonValueKind.String => e.GetString()!,
        JsonValueKind.Number when e.TryGetInt64(out var whole) => whole,
        _ => throw new NotSupportedException("enum value " + e.GetRawText()),
    };

    private static QuickTypes TypeOf(JsonElement name) =>
        QuickTypesExtensions.FromName(name.GetString() ?? "") ?? throw new NotSupportedException("type " + name.GetRawText());

    private QuickSchema Target(string reference)
    {
        if (!reference.StartsWith('#'))
        {
            throw new NotSupportedException(reference);
        }

        var pointer = Uri.UnescapeDataString(reference[1..]);
        var e = _root;
        foreach (var token in pointer.Split('/')[1..])
        {
            var name = token.Replace("~1", "/", StringComparison.Ordinal).Replace("~0", "~", StringComparison.Ordinal);
            if (e.ValueKind != JsonValueKind.Object || !e.TryGetProperty(name, out e))
            {
                throw new NotSupportedException(reference);
            }
        }

        return Node(e, pointer);
    }

    private static string Escape(string name) => name.Replace("~", "~0", StringComparison.Ordinal).Replace("/", "~1", StringComparison.Ordinal);
}
