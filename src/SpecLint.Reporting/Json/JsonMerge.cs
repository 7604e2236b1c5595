using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Nodes;
using SpecLint.Rules.Accepting;
using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Json;

/// <summary>
/// Combines the JSON outputs of <c>check --shard i/n</c> runs into the document one unsharded run writes: specs
/// and changes in file order, run problems once each, stale accepted entries from every shard, the highest exit
/// code. Values are copied as written, so numbers keep their text.
/// </summary>
internal static class JsonMerge
{
    /// <summary>The merged document, or null with <paramref name="error"/> naming the file (and line and column) at fault.</summary>
    public static string? Merge(IReadOnlyList<(string Name, byte[] Bytes)> shards, out string? error)
    {
        ArgumentNullException.ThrowIfNull(shards);
        var docs = new List<(string Name, JsonObject Root)>();
        foreach (var (name, bytes) in shards)
        {
            JsonNode? node;
            try
            {
                node = JsonNode.Parse(bytes);
            }
            catch (JsonException e)
            {
                error = $"{name}:{(e.LineNumber ?? 0) + 1}:{(e.BytePositionInLine ?? 0) + 1}: not valid JSON: {e.Message.Split(" LineNumber", 2)[0]}";
                return null;
            }

            if (node is not JsonObject root || root["version"]?.GetValueKind() != JsonValueKind.Number || root["version"]!.GetValue<int>() != 1
                || root["specs"] is not JsonArray || root["problems"] is not JsonArray || root["failOn"] is null || root["exitCode"] is null)
            {
                error = $"{name}: not the JSON output of 'speclint check --format json' (version 1)";
                return null;
            }

            docs.Add((name, root));
        }

        if (docs.Count == 0)
        {
            error = "nothing to merge: name the JSON files of the shards";
            return null;
        }

        var first = docs[0];
        foreach (var (name, root) in docs.Skip(1))
        {
            foreach (var key in new[] { "failOn", "against" })
            {
                if (!JsonNode.DeepEquals(root[key], first.Root[key]))
                {
                    error = $"{name}: \"{key}\" differs from {first.Name}; merge only shards of one run";
                    return null;
                }
            }
        }

        var seen = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var (name, root) in docs)
        {
            foreach (var spec in root["specs"]!.AsArray())
            {
                var file = spec?["file"]?.GetValue<string>() ?? "";
                if (!seen.TryAdd(file, name))
                {
                    error = $"{name}: {file} is also in {seen[file]}; each spec must be in one shard only";
                    return null;
                }
            }
        }

        var merged = new JsonObject
        {
            ["version"] = 1,
            ["specs"] = ByFile(docs.SelectMany(d => d.Root["specs"]!.AsArray())),
            ["problems"] = Distinct(docs.SelectMany(d => d.Root["problems"]!.AsArray())),
        };
        if (first.Root["against"] is { } against)
        {
            merged["against"] = against.DeepClone();
            merged["changes"] = ByFile(docs.SelectMany(d => d.Root["changes"]?.AsArray() ?? []));
            var notes = ByPosition(Distinct(docs.SelectMany(d => d.Root["baseNotes"]?.AsArray() ?? [])));
            if (notes.Count > 0)
            {
                merged["baseNotes"] = notes;
            }
        }

        if (first.Root["accepted"] is { } accepted)
        {
            var all = docs.Select(d => d.Root["accepted"]).OfType<JsonObject>().ToList();
            merged["accepted"] = new JsonObject
            {
                ["file"] = accepted["file"]?.DeepClone(),
                ["entries"] = accepted["entries"]?.DeepClone(),
                ["findingsCovered"] = all.Sum(a => a["findingsCovered"]?.GetValue<int>() ?? 0),
                ["stale"] = new JsonArray([.. Distinct(all.SelectMany(a => a["stale"]?.AsArray() ?? []))
                    .OrderBy(s => s?["line"]?.GetValue<int>() ?? 0).Select(s => s!.DeepClone())]),
            };
        }

        merged["failOn"] = first.Root["failOn"]!.DeepClone();
        merged["exitCode"] = docs.Max(d => d.Root["exitCode"]!.GetValue<int>());
        error = null;
        return Write(merged);
    }

    /// <summary>The exit code recorded in a (merged) document.</summary>
    public static int ExitCode(string json) => JsonNode.Parse(json)!["exitCode"]!.GetValue<int>();

    /// <summary>The findings of a (merged) document, spec findings first, for SARIF.</summary>
    public static List<Finding> Findings(string json)
    {
        var root = JsonNode.Parse(json)!.AsObject();
        var findings = root["specs"]!.AsArray().SelectMany(s => s?["findings"]?.AsArray() ?? []).Concat(root["problems"]!.AsArray());
        var acceptedFile = root["accepted"]?["file"]?.GetValue<string>() ?? "";
        return [.. findings.OfType<JsonObject>().Select(f => f["accepted"]?.GetValue<bool>() == true ? Acceptance.AsSuppressed(ToFinding(f), acceptedFile) : ToFinding(f))];
    }

    internal static Finding ToFinding(JsonObject f)
    {
        SeverityNames.TryParse(f["severity"]?.GetValue<string>(), out var severity);
        var fix = f["fix"] is JsonObject x ? new FixSuggestion(x["path"]!.GetValue<string>(), x["value"]!.GetValue<string>()) : null;
        return new Finding(f["rule"]!.GetValue<string>(), severity, f["file"]!.GetValue<string>(), f["pointer"]?.GetValue<string>() ?? "",
            f["line"]!.GetValue<int>(), f["column"]!.GetValue<int>(), f["message"]!.GetValue<string>(), fix,
            f["waived"]?.GetValue<bool>() ?? false, f["waiverReason"]?.GetValue<string>())
        {
            Setting = f["setting"]?.GetValue<string>(),
        };
    }

    private static JsonArray ByFile(IEnumerable<JsonNode?> items) =>
        new([.. items.OrderBy(i => i?["file"]?.GetValue<string>() ?? "", StringComparer.Ordinal).Select(i => i?.DeepClone())]);

    /// <summary>Findings in the order <c>ChangeReport.BaseNotes</c> has them: file, line, column, message.</summary>
    private static JsonArray ByPosition(JsonArray items) =>
        new([.. items
            .OrderBy(i => i?["file"]?.GetValue<string>() ?? "", StringComparer.Ordinal)
            .ThenBy(i => i?["line"]?.GetValue<int>() ?? 0)
            .ThenBy(i => i?["column"]?.GetValue<int>() ?? 0)
            .ThenBy(i => i?["message"]?.GetValue<string>() ?? "", StringComparer.Ordinal)
            .Select(i => i?.DeepClone())]);

    private static JsonArray Distinct(IEnumerable<JsonNode?> items)
    {
        var kept = new List<JsonNode?>();
        foreach (var item in items)
        {
            if (!kept.Any(k => JsonNode.DeepEquals(k, item)))
            {
                kept.Add(item?.DeepClone());
            }
        }

        return new JsonArray([.. kept]);
    }

    private static string Write(JsonObject root)
    {
        using var buffer = new MemoryStream();
        using (var w = new Utf8JsonWriter(buffer, new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping }))
        {
            root.WriteTo(w);
        }

        return Encoding.UTF8.GetString(buffer.ToArray()) + "\n";
    }
}
