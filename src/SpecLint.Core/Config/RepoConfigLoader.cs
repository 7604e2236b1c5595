using System.Collections.Immutable;
using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
using SpecLint.Core.Files;
using SpecLint.Core.Spec;
using SpecLint.Core.Spec.Schema;
using SpecLint.Core.Spec.Yaml;

namespace SpecLint.Core.Config;

/// <summary>Finds and reads <c>.speclint.yaml</c> with the same YAML hardening and schema checks as spec files.</summary>
internal static class RepoConfigLoader
{
    /// <summary>
    /// The nearest <c>.speclint.yaml</c> at or above the spec's folder, or null. The walk stops at the filesystem
    /// root and after the first folder that holds <c>.git</c> (the repository root), so a file outside the
    /// repository never applies.
    /// </summary>
    public static string? FindFor(string specPath)
    {
        ArgumentNullException.ThrowIfNull(specPath);
        var full = System.IO.Path.GetFullPath(specPath);
        var dir = Directory.Exists(full) ? new DirectoryInfo(full) : new FileInfo(full).Directory;
        while (dir is not null)
        {
            var candidate = System.IO.Path.Combine(dir.FullName, RepoConfig.FileName);
            if (File.Exists(candidate))
            {
                return candidate;
            }

            var git = System.IO.Path.Combine(dir.FullName, ".git");
            if (Directory.Exists(git) || File.Exists(git))
            {
                return null;
            }

            dir = dir.Parent;
        }

        return null;
    }

    /// <summary>Reads a configuration file; <paramref name="displayPath"/> is the path messages show.</summary>
    public static RepoConfigLoadResult Load(string path, string? displayPath = null)
    {
        ArgumentNullException.ThrowIfNull(path);
        var shown = displayPath ?? path;
        try
        {
            var info = new FileInfo(path);
            if (FileKinds.Of(path) == FileKind.Regular && info.Length > YamlTreeReader.MaxFileBytes)
            {
                return Invalid(shown, YamlTreeReader.TooLargeMessage(info.Length));
            }

            return BoundedFileReader.TryRead(path, YamlTreeReader.MaxFileBytes, out var bytes, out var why)
                ? Load(YamlTreeReader.Read(bytes), shown, path)
                : Invalid(shown, why);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException or ArgumentException)
        {
            return Invalid(shown, $"cannot read the file: {e.Message}");
        }
    }

    /// <summary>Reads configuration text already in memory.</summary>
    public static RepoConfigLoadResult LoadText(string text, string displayPath) =>
        Load(YamlTreeReader.Read(text), displayPath, displayPath);

    /// <summary>The configuration that applies to a spec: the nearest file's, or the defaults when there is none.</summary>
    public static RepoConfigLoadResult LoadFor(string specPath) =>
        FindFor(specPath) is { } found ? Load(found) : new RepoConfigLoadResult(RepoConfig.Default, []);

    private static RepoConfigLoadResult Invalid(string shown, string message) =>
        new(RepoConfig.Default, [new SpecDiagnostic(shown, 1, 1, SpecDiagnostic.ConfigInvalid, "", message)]);

    private static RepoConfigLoadResult Load(YamlTree tree, string shown, string path)
    {
        if (tree.IsEmpty)
        {
            // A configuration with nothing in it (or only comments) means "all defaults", unlike an empty spec.
            return new RepoConfigLoadResult(RepoConfig.Default with { Path = path }, []);
        }

        var sink = new DiagnosticSink(shown, SpecDiagnostic.ConfigInvalid, tree);
        sink.AddYaml(tree.Problems);
        if (!tree.HasRoot)
        {
            return new RepoConfigLoadResult(RepoConfig.Default with { Path = path }, sink.ToImmutable());
        }

        // "---" alone gives a null document: treat it like an empty file.
        var root = tree.Root ?? new JsonObject();
        sink.AddSchema(ConfigSchema.Validate(root));
        var obj = root as JsonObject ?? [];
        var d = RepoConfig.Default;

        // Only when every entry is text: a number among the globs was reported by the schema at its position.
        var include = Ok("/include", sink) && obj["include"] is JsonArray inc
            && inc.All(n => n is JsonValue v && v.GetValueKind() == JsonValueKind.String)
            ? [.. inc.Select(n => n!.GetValue<string>())]
            : d.Include;
        ImmutableArray<string> exclude = Ok("/exclude", sink) && obj["exclude"] is JsonArray exc
            && exc.All(n => n is JsonValue v && v.GetValueKind() == JsonValueKind.String)
            ? [.. exc.Select(n => n!.GetValue<string>())]
            : [];
        var failOn = Ok("/fail-on", sink) && obj["fail-on"] is JsonValue f ? ParseSeverity(f.GetValue<string>()) : d.FailOn;

        var mc = d.MonteCarlo;
        if (obj["monte-carlo"] is JsonObject m && Ok("/monte-carlo", sink))
        {
            mc = new MonteCarloSettings(
                Ok("/monte-carlo/samples", sink) && WholeNumber(m["samples"]) is { } samples ? (int)samples : mc.Samples,
                Ok("/monte-carlo/seed", sink) && WholeNumber(m["seed"]) is { } seed ? seed : mc.Seed,
                Ok("/monte-carlo/distribution", sink) && m["distribution"] is JsonValue dist && dist.GetValue<string>() == "normal"
                    ? MonteCarloDistribution.Normal
                    : mc.Distribution);
        }

        var rules = ImmutableDictionary.CreateBuilder<string, RuleSettings>(StringComparer.Ordinal);
        if (obj["rules"] is JsonObject rulesNode && Ok("/rules", sink))
        {
            foreach (var (id, node) in rulesNode)
            {
                var at = JsonPointerText.Append("/rules", id);
                if (!Ok(at, sink) || node is not JsonObject entry)
                {
                    continue;
                }

                ConfigSeverity? severity = entry["severity"] is JsonValue sv && Ok(at + "/severity", sink) ? ParseSeverity(sv.GetValue<string>()) : null;
                ImmutableArray<string> tags = entry["tags"] is JsonArray tagList && Ok(at + "/tags", sink)
                    ? [.. tagList.Select(n => n!.GetValue<string>())]
                    : [];
                var options = ImmutableDictionary.CreateBuilder<string, RuleOption>(StringComparer.Ordinal);
                foreach (var (key, value) in entry)
                {
                    var optionAt = JsonPointerText.Append(at, key);
                    if (key is "severity" or "tags" || !Ok(optionAt, sink))
                    {
                        continue;
                    }

                    var raw = tree.ScalarText.TryGetValue(optionAt, out var t) ? t : value?.ToJsonString() ?? "";
                    options[key] = new RuleOption(key, value?.DeepClone(), raw, tree.Positions.GetValueOrDefault(optionAt, SourcePosition.FileStart));
                }

                rules[id] = new RuleSettings(id, severity, options.ToImmutable(), tree.Positions.GetValueOrDefault(at, SourcePosition.FileStart)) { Tags = tags };
            }
        }

        ImmutableArray<string> houseRules = Ok("/house-rules", sink) && obj["house-rules"] is JsonArray hr
            ? [.. hr.Select(n => n!.GetValue<string>())]
            : [];
        var budget = d.HouseRuleBudget;
        if (obj["house-rule-budget"] is JsonValue b && Ok("/house-rule-budget", sink))
        {
            if (DurationText.TryParse(b.GetValue<string>(), out var parsed, out var why))
            {
                budget = parsed;
            }
            else
            {
                sink.AtValue("/house-rule-budget", "house-rule-budget: " + why);
            }
        }

        var config = new RepoConfig(path, include, failOn, mc, rules.ToImmutable(), tree.ToSourceMap())
        {
            HouseRules = houseRules,
            HouseRuleBudget = budget,
            Exclude = exclude,
        };
        return new RepoConfigLoadResult(config, sink.ToImmutable());
    }

    /// <summary>A whole number, also when YAML wrote it as 1000.0 (the schema's "integer" accepts that).</summary>
    private static long? WholeNumber(JsonNode? node) =>
        node is JsonValue v && v.GetValueKind() == JsonValueKind.Number
            ? v.TryGetValue<long>(out var l) ? l : (long)v.GetValue<double>()
            : null;

    private static bool Ok(string pointer, DiagnosticSink sink) => !sink.HasFailed(pointer);

    private static ConfigSeverity ParseSeverity(string text) => text switch
    {
        "off" => ConfigSeverity.Off,
        "note" => ConfigSeverity.Note,
        "warning" => ConfigSeverity.Warning,
        _ => ConfigSeverity.Error,
    };
}
