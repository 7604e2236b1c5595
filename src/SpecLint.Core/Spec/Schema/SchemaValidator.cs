using System.Collections.Immutable;
using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;
using Json.Schema;
using SpecLint.Core.Spec.Schema.Quick;
using SpecLint.Core.Spec.Yaml;

namespace SpecLint.Core.Spec.Schema;

/// <summary>
/// Evaluates a JSON tree against one of our embedded schemas and words each error for people: the keyword's
/// message is rebuilt from the schema itself (allowed keys, expected types, the example in each description).
/// </summary>
internal sealed partial class SchemaValidator
{
    private readonly Lazy<LibrarySchema> _schema;
    private readonly Lazy<JsonNode> _schemaNodeLazy;
    private readonly QuickSchema? _quick;

    // One validation at a time: the schema library's evaluation caches state on the shared schema, and the
    // parsed schema tree fills itself in on first read; specs checked in parallel share this validator.
    private readonly Lock _gate = new();

    public SchemaValidator(string resourceFile)
    {
        Text = LoadResource(resourceFile);
        _quick = QuickSchemaCompiler.Compile(Text);
        // The library's validator and the schema tree that words errors are built on the first document that the
        // quick check does not pass: a run of valid files never pays for them (most of a cold start's JIT).
        _schemaNodeLazy = new(() => JsonNode.Parse(Text)!);
        _schema = new(() => new LibrarySchema(Text));
    }

    /// <summary>True when the schema compiled for the quick check (tests hold it to the library's verdicts).</summary>
    internal bool HasQuickCheck => _quick is not null;

    private JsonNode SchemaNode => _schemaNodeLazy.Value;

    public string Text { get; }

    [GeneratedRegex(@"Example: (.+?)\.(?:\s|$)", RegexOptions.CultureInvariant)]
    private static partial Regex ExampleRegex();

    public static string LoadResource(string file)
    {
        var name = "SpecLint.Core.Spec.Schema." + file;
        using var stream = typeof(SchemaValidator).Assembly.GetManifestResourceStream(name)
            ?? throw new InvalidOperationException($"embedded resource {name} is missing from the build");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }

    public ImmutableArray<SchemaViolation> Validate(JsonNode? root)
    {
        // Most files are valid, and the quick check proves that straight from the YAML tree, without the tree →
        // JSON text → JSON document round trip and without the lock (it shares nothing mutable).
        if (QuickAccepts(root))
        {
            return [];
        }

        lock (_gate)
        {
            return ValidateAlone(root);
        }
    }

    /// <summary>True when the quick check is sure that <paramref name="root"/> is valid; false means "ask the library".</summary>
    internal bool QuickAccepts(JsonNode? root) => _quick?.Accepts(root) == true;

    /// <summary>The schema library's verdict alone (tests compare it with the quick check's).</summary>
    internal bool LibraryAccepts(JsonNode? root)
    {
        lock (_gate)
        {
            using var doc = JsonDocument.Parse(root?.ToJsonString() ?? "null");
            return _schema.Value.Accepts(doc.RootElement);
        }
    }

    private ImmutableArray<SchemaViolation> ValidateAlone(JsonNode? root)
    {
        using var doc = JsonDocument.Parse(root?.ToJsonString() ?? "null");
        var results = _schema.Value.Evaluate(doc.RootElement);
        if (results.IsValid)
        {
            return [];
        }

        var violations = new List<SchemaViolation>();
        var seen = new HashSet<(string, string, string)>();
        var state = new WordingState();
        foreach (var r in new[] { results }.Concat(results.Details ?? []))
        {
            if (r.IsValid || r.Errors is null)
            {
                continue;
            }

            var at = r.InstanceLocation.ToString();
            foreach (var (key, libraryMessage) in r.Errors)
            {

                // SchemaLocation is unreliable in 8.0.5 (below items and additionalProperties it gains an extra
                // segment), so the schema is found by walking the evaluation path. A failing `false` subschema
                // reports under the key "": its keyword is the last segment and its owner the parent.
                var evaluationPath = r.EvaluationPath.ToString();
                var keyword = key.Length > 0 ? key : JsonPointerText.Split(evaluationPath) is { Count: > 0 } e ? e[^1] : "false";
                var owner = ResolveEvaluationPath(key.Length > 0 ? evaluationPath : JsonPointerText.Parent(evaluationPath));
                foreach (var v in Word(keyword, at, owner, root, libraryMessage, state))
                {
                    if (seen.Add((v.Pointer, v.Keyword, v.Message)))
                    {
                        violations.Add(v);
                    }
                }
            }
        }

        return [.. DropRequiredExplainedByTypo(violations)];
    }

    /// <summary>A misspelt required key shows up twice (unknown + missing); the did-you-mean already says it all.</summary>
    private static IEnumerable<SchemaViolation> DropRequiredExplainedByTypo(List<SchemaViolation> violations)
    {
        var suggested = violations.Where(v => v.Keyword == "additionalProperties")
            .Select(v => (Parent: JsonPointerText.Parent(v.Pointer), Match: SuggestionRegex().Match(v.Message)))
            .Where(x => x.Match.Success)
            .Select(x => JsonPointerText.Append(x.Parent, x.Match.Groups[1].Value))
            .ToHashSet(StringComparer.Ordinal);
        return violations.Where(v => v.Keyword != "required" || !suggested.Contains(v.Pointer));
    }

    [GeneratedRegex("did you mean \"([^\"]+)\"", RegexOptions.CultureInvariant)]
    private static partial Regex SuggestionRegex();

    private IEnumerable<SchemaViolation> Word(string keyword, string at, JsonNode? owner, JsonNode? root, string libraryMessage, WordingState state)
    {
        var instance = Find(root, at);
        var propertySchema = PropertySchema(at);
        var example = ExampleOf(propertySchema);
        var eg = example is null ? "" : $", e.g. \"{example}\"";
        switch (keyword)
        {
            case "additionalProperties":
            {
                var name = JsonPointerText.Split(at) is { Count: > 0 } t ? t[^1] : "";
                var allowed = (owner?["properties"] as JsonObject)?.Select(p => p.Key).ToList() ?? [];
                var suggestion = state.SuggestionsLeft-- > 0 && name.Length <= WordingState.LongestSuggestedKey
                    ? EditDistance.Closest(name, allowed.Where(a => !state.KeysOf(root, JsonPointerText.Parent(at)).Contains(a)))
                    : null;
                var hint = suggestion is not null ? $"did you mean \"{suggestion}\"? " : "";
                var list = allowed.Count > 0 ? $"allowed keys here: {string.Join(", ", allowed)}" : "no keys are allowed here";
                yield return new(at, keyword, $"unknown key \"{name}\"; {hint}{list}", ViolationLocation.Key);
                break;
            }

            case "required":
            {
                var have = instance as JsonObject;
                var required = (owner?["required"] as JsonArray)?.Select(n => n!.GetValue<string>()) ?? [];
                foreach (var name in required.Where(n => have is null || !have.ContainsKey(n)))
                {
                    var child = JsonPointerText.Append(at, name);
                    var childExample = ExampleOf(PropertySchema(child));
                    var fix = childExample is null ? "" : $", e.g. \"{name}: {childExample}\"";
                    yield return new(child, keyword, $"missing required key \"{name}\"{fix}", ViolationLocation.Parent);
                }

                break;
            }

            case "type":
                yield return new(at, keyword, $"expected {ExpectedTypes(owner?["type"])}, found {Describe(instance)}{eg}", ViolationLocation.Value);
                break;

            case "enum":
            {
                var options = (owner?["enum"] as JsonArray)?.Select(n => n!.ToJsonString().Trim('"')).ToList() ?? [];
                var text = Shown(instance);
                var suggestion = instance is JsonValue v && v.TryGetValue<string>(out var s) ? EditDistance.Closest(s, options) : null;
                var hint = suggestion is not null && options.Count > 1 ? $"did you mean \"{suggestion}\"? " : "";
                var message = at switch
                {
                    "/spec" => $"version {text} is not supported; this SpecLint reads version 1, write \"spec: 1\"",
                    "/kind" => $"unknown kind {text}; the only kind in spec version 1 is \"transimpedance\"",
                    _ => $"{text} is not allowed here; {hint}use {OneOf(options)}",
                };
                yield return new(at, keyword, message, ViolationLocation.Value);
                break;
            }

            case "pattern":
                yield return new(at, keyword, $"{Shown(instance)} {PatternHint(at, propertySchema)}{eg}", ViolationLocation.Value);
                break;

            case "minLength":
                yield return new(at, keyword, $"the text is empty; write something here{eg}", ViolationLocation.Value);
                break;

            case "maxLength":
                yield return new(at, keyword, $"the text is longer than {owner?["maxLength"]} characters; shorten it", ViolationLocation.Value);
                break;

            case "uniqueItems":
                yield return new(at, keyword, "the list repeats an entry; keep each entry once", ViolationLocation.Value);
                break;

            case "minItems":
                yield return new(at, keyword, $"the list is empty; give at least {owner?["minItems"]} entry{eg}", ViolationLocation.Value);
                break;

            case "minimum" or "maximum":
                yield return new(at, keyword, $"{Shown(instance)} must be {(keyword == "minimum" ? "at least" : "at most")} {owner?[keyword]}{eg}", ViolationLocation.Value);
                break;

            case "propertyNames":
            case "false" when at.Length > 0:
                yield return new(at, keyword, $"\"{JsonPointerText.Split(at)[^1]}\" is not a valid id; use lower-case words joined by '-', e.g. phase-margin", ViolationLocation.Key);
                break;

            default:
                // Keywords that aggregate others (allOf, properties, items) carry no message of their own worth showing.
                if (keyword is "allOf" or "properties" or "items" or "$ref" or "additionalItems")
                {
                    yield break;
                }

                yield return new(at, keyword, libraryMessage + eg, ViolationLocation.Value);
                break;
        }
    }

    private static string PatternHint(string at, JsonNode? propertySchema)
    {
        var last = JsonPointerText.Split(at) is { Count: > 0 } t ? t[^1] : "";
        var parent = JsonPointerText.Split(at) is { Count: > 1 } p ? p[0] : "";
        return (parent, last) switch
        {
            ("", "name") => "is not a valid name; use letters, digits, '.', '_' and '-', starting with a letter or digit",
            ("feedback", "dielectric") => "is not an EIA dielectric code such as C0G, NP0, U2J, X7R, X5R or Y5V",
            ("waivers", "rule") => "is not a rule id; rule ids are lower-case words joined by '-'",
            ("waivers", "expires") => "is not a date; write it as YYYY-MM-DD",
            _ when propertySchema is not null => "does not have the expected form: a number followed by its unit",
            _ => "does not have the expected form",
        };
    }

    private static string OneOf(List<string> options) => options.Count switch
    {
        0 => "an allowed value",
        1 => $"\"{options[0]}\"",
        _ => string.Join(", ", options.Take(options.Count - 1).Select(o => $"\"{o}\"")) + $" or \"{options[^1]}\"",
    };

    private static string ExpectedTypes(JsonNode? type)
    {
        var names = type is JsonArray a ? a.Select(n => n!.GetValue<string>()).ToList() : type is null ? [] : [type.GetValue<string>()];
        if (names.Contains("object") && names.Contains("string"))
        {
            return "a value with its unit, or a map { min, typ, max }";
        }

        if (names.Contains("string") && names.Contains("number"))
        {
            return "a value with its unit";
        }

        return string.Join(" or ", names.Select(n => n switch
        {
            "string" => "text",
            "integer" => "a whole number",
            "number" => "a number",
            "object" => "a map of keys",
            "array" => "a list",
            "boolean" => "true or false",
            "null" => "nothing",
            _ => n,
        }));
    }

    internal static string Describe(JsonNode? node) => node switch
    {
        null => "nothing (the value is empty)",
        JsonObject => "a map",
        JsonArray => "a list",
        JsonValue v when v.GetValueKind() == JsonValueKind.String => $"the text \"{v.GetValue<string>()}\"",
        JsonValue v when v.GetValueKind() is JsonValueKind.True or JsonValueKind.False => $"{v.ToJsonString()} (true/false)",
        JsonValue v => $"the number {v.ToJsonString()}",
        _ => "a value",
    };

    private static string Shown(JsonNode? node) => node switch
    {
        JsonValue v when v.GetValueKind() == JsonValueKind.String => $"\"{v.GetValue<string>()}\"",
        null => "an empty value",
        _ => node.ToJsonString(),
    };

    private static string? ExampleOf(JsonNode? propertySchema)
    {
        var description = propertySchema?["description"]?.GetValue<string>();
        if (description is null)
        {
            return null;
        }

        var m = ExampleRegex().Match(description);
        return m.Success ? m.Groups[1].Value : null;
    }

    private JsonNode? Resolve(string schemaPointer)
    {
        JsonNode? node = SchemaNode;
        foreach (var token in JsonPointerText.Split(schemaPointer))
        {
            node = node switch
            {
                JsonObject o => o[token],
                JsonArray a when int.TryParse(token, NumberStyles.None, CultureInfo.InvariantCulture, out var i) && i < a.Count => a[i],
                _ => null,
            };
        }

        return node;
    }

    /// <summary>Follows an evaluation path (which walks through <c>$ref</c>) from the schema root.</summary>
    private JsonNode? ResolveEvaluationPath(string evaluationPath)
    {
        JsonNode? node = SchemaNode;
        foreach (var token in JsonPointerText.Split(evaluationPath))
        {
            node = token == "$ref" && node?["$ref"]?.GetValue<string>() is { } r
                ? Resolve(r.TrimStart('#'))
                : node switch
                {
                    JsonObject o => o[token],
                    JsonArray a when int.TryParse(token, NumberStyles.None, CultureInfo.InvariantCulture, out var i) && i < a.Count => a[i],
                    _ => null,
                };
        }

        return node;
    }

    /// <summary>The schema written for an instance location (the one with its description), following properties, items and allOf/$ref.</summary>
    internal JsonNode? PropertySchema(string instancePointer)
    {
        JsonNode? node = SchemaNode;
        foreach (var token in JsonPointerText.Split(instancePointer))
        {
            var s = Deref(node);
            if (s is null)
            {
                return null;
            }

            if (s["properties"]?[token] is { } p)
            {
                node = p;
            }
            else if (s["items"] is JsonObject items && int.TryParse(token, NumberStyles.None, CultureInfo.InvariantCulture, out _))
            {
                node = items;
            }
            else if (s["additionalProperties"] is JsonObject extra)
            {
                node = extra;
            }
            else
            {
                return null;
            }
        }

        return node;
    }

    private JsonNode? Deref(JsonNode? node)
    {
        for (var guard = 0; guard < 8 && node is JsonObject o; guard++)
        {
            if (o["properties"] is not null || o["items"] is not null || o["additionalProperties"] is JsonObject)
            {
                return o;
            }

            if (o["$ref"]?.GetValue<string>() is { } r)
            {
                node = Resolve(r.TrimStart('#'));
            }
            else if (o["allOf"] is JsonArray { Count: > 0 } all)
            {
                node = all[0];
            }
            else
            {
                return o;
            }
        }

        return node;
    }

    private static JsonNode? Find(JsonNode? root, string pointer)
    {
        var node = root;
        foreach (var token in JsonPointerText.Split(pointer))
        {
            node = node switch
            {
                JsonObject o => o[token],
                JsonArray a when int.TryParse(token, NumberStyles.None, CultureInfo.InvariantCulture, out var i) && i < a.Count => a[i],
                _ => null,
            };
        }

        return node;
    }

    /// <summary>
    /// Per-validation memory that keeps wording linear in the number of problems: a file of thousands of unknown
    /// keys gets did-you-mean hints for the first ones only, and each map's own keys are collected once.
    /// </summary>
    private sealed class WordingState
    {
        public const int LongestSuggestedKey = 64;

        private readonly Dictionary<string, HashSet<string>> _keys = new(StringComparer.Ordinal);

        public int SuggestionsLeft { get; set; } = 100;

        public HashSet<string> KeysOf(JsonNode? root, string pointer)
        {
            if (!_keys.TryGetValue(pointer, out var keys))
            {
                keys = (Find(root, pointer) as JsonObject)?.Select(p => p.Key).ToHashSet(StringComparer.Ordinal) ?? [];
                _keys[pointer] = keys;
            }

            return keys;
        }
    }
}
