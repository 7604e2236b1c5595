using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Sarif;

/// <summary>
/// Writes findings as SARIF 2.1.0 for code scanning: one run, a driver rule for every rule given and every other id
/// that occurs (engine ids such as spec-invalid, house rules), results with repository-relative locations, stable
/// fingerprints, and waived findings as in-source suppressions. Output is deterministic: results are ordered by
/// file, line, column and rule, and nothing depends on the clock or the culture.
/// </summary>
internal static class SarifWriter
{
    /// <summary>The schema URI written as <c>$schema</c>.</summary>
    public const string SchemaUri = "https://json.schemastore.org/sarif-2.1.0.json";

    /// <summary>The property name of our fingerprint in <c>partialFingerprints</c>; bump the suffix if the hash input ever changes.</summary>
    public const string FingerprintKey = "speclintFinding/v1";

    /// <summary>Returns the SARIF log as JSON text (LF line ends).</summary>
    public static string Write(IEnumerable<RuleDescriptor> rules, IReadOnlyList<Finding> findings, SarifOptions options)
    {
        using var stream = new MemoryStream();
        Write(stream, rules, findings, options);
        return Encoding.UTF8.GetString(stream.ToArray());
    }

    /// <summary>Writes the SARIF log as UTF-8 JSON (no BOM) to <paramref name="stream"/>.</summary>
    public static void Write(Stream stream, IEnumerable<RuleDescriptor> rules, IReadOnlyList<Finding> findings, SarifOptions options)
    {
        ArgumentNullException.ThrowIfNull(stream);
        ArgumentNullException.ThrowIfNull(rules);
        ArgumentNullException.ThrowIfNull(findings);
        ArgumentNullException.ThrowIfNull(options);

        var descriptors = new Dictionary<string, RuleDescriptor>(StringComparer.Ordinal);
        foreach (var rule in rules)
        {
            descriptors.TryAdd(rule.Id, rule);
        }

        foreach (var finding in findings)
        {
            if (!descriptors.ContainsKey(finding.RuleId))
            {
                descriptors[finding.RuleId] = EngineRuleDescriptors.Find(finding.RuleId)
                    ?? new RuleDescriptor(finding.RuleId, finding.RuleId, finding.Severity);
            }
        }

        var ordered = descriptors.Values.OrderBy(d => d.Id, StringComparer.Ordinal).ToList();
        var index = ordered.Select((d, i) => (d.Id, i)).ToDictionary(x => x.Id, x => x.i, StringComparer.Ordinal);
        var results = findings
            .Select(f => (Finding: f, Uri: ArtifactUri(f.File, options.RepositoryRoot)))
            .OrderBy(r => r.Uri, StringComparer.Ordinal)
            .ThenBy(r => r.Finding.Line)
            .ThenBy(r => r.Finding.Column)
            .ThenBy(r => r.Finding.RuleId, StringComparer.Ordinal)
            .ThenBy(r => r.Finding.Pointer, StringComparer.Ordinal)
            .ThenBy(r => r.Finding.Message, StringComparer.Ordinal)
            .ToList();

        var writerOptions = new JsonWriterOptions
        {
            Indented = true,
            NewLine = "\n",
            // Keep Ω, µ, ° and quotes readable; SARIF viewers and diffs are read by people.
            Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
        };
        using var json = new Utf8JsonWriter(stream, writerOptions);
        json.WriteStartObject();
        json.WriteString("$schema", SchemaUri);
        json.WriteString("version", "2.1.0");
        json.WriteStartArray("runs");
        json.WriteStartObject();

        json.WriteStartObject("tool");
        json.WriteStartObject("driver");
        json.WriteString("name", "SpecLint");
        json.WriteString("version", options.ToolVersion);
        json.WriteString("informationUri", RuleHelpLinks.Project);
        json.WriteStartArray("rules");
        foreach (var rule in ordered)
        {
            WriteRule(json, rule, options.RulePages.TryGetValue(rule.Id, out var page) ? page : null, options.HouseRuleSources.GetValueOrDefault(rule.Id));
        }

        json.WriteEndArray();
        json.WriteEndObject();
        json.WriteEndObject();

        json.WriteString("columnKind", "utf16CodeUnits");
        json.WriteStartArray("results");
        var seen = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var (finding, uri) in results)
        {
            WriteResult(json, finding, uri, index[finding.RuleId], seen);
        }

        json.WriteEndArray();
        json.WriteEndObject();
        json.WriteEndArray();
        json.WriteEndObject();
        json.Flush();
    }

    /// <summary>"phase-margin" → "PhaseMargin": SARIF's <c>name</c> is an identifier-like form of the id.</summary>
    public static string PascalName(string ruleId) =>
        string.Concat(ruleId.Split(['-', '_', '.', ' '], StringSplitOptions.RemoveEmptyEntries)
            .Select(part => char.ToUpperInvariant(part[0]) + part[1..]));

    /// <summary>
    /// A repository-relative URI reference with forward slashes and each segment percent-encoded; absolute paths
    /// outside <paramref name="repositoryRoot"/> (or with no root given) become <c>file://</c> URIs so they stay valid.
    /// </summary>
    public static string ArtifactUri(string file, string? repositoryRoot)
    {
        var path = RepositoryPath.Relative(file, repositoryRoot);
        return Path.IsPathRooted(path)
            ? new Uri(path).AbsoluteUri
            : string.Join('/', path.Split('/').Select(Uri.EscapeDataString));
    }

    private static void WriteRule(Utf8JsonWriter json, RuleDescriptor rule, string? page, string? houseRuleSource)
    {
        var helpUri = houseRuleSource is null ? RuleHelpLinks.For(rule.Id) : null;
        var full = (page is null ? null : RulePage.Condition(page)) ?? Sentence(rule.Title);
        json.WriteStartObject();
        json.WriteString("id", rule.Id);
        json.WriteString("name", PascalName(rule.Id));
        json.WriteStartObject("shortDescription");
        json.WriteString("text", Sentence(rule.Title));
        json.WriteEndObject();
        json.WriteStartObject("fullDescription");
        json.WriteString("text", full);
        json.WriteEndObject();
        json.WriteStartObject("help");
        if (page is null)
        {
            json.WriteString("text", helpUri is null ? $"{full} (a house rule declared in {houseRuleSource})" : $"{full} See {helpUri}");
        }
        else
        {
            json.WriteString("text", RulePage.PlainText(page));
            json.WriteString("markdown", page.Replace("\r\n", "\n", StringComparison.Ordinal).Trim());
        }

        json.WriteEndObject();
        if (helpUri is not null)
        {
            json.WriteString("helpUri", helpUri);
        }

        json.WriteStartObject("defaultConfiguration");
        json.WriteString("level", rule.DefaultSeverity.Name());
        json.WriteEndObject();
        if (houseRuleSource is not null)
        {
            json.WriteStartObject("properties");
            json.WriteStartArray("tags");
            json.WriteStringValue("house-rule");
            json.WriteEndArray();
            json.WriteEndObject();
        }

        json.WriteEndObject();
    }

    private static void WriteResult(Utf8JsonWriter json, Finding finding, string uri, int ruleIndex, Dictionary<string, int> seen)
    {
        json.WriteStartObject();
        json.WriteString("ruleId", finding.RuleId);
        json.WriteNumber("ruleIndex", ruleIndex);
        json.WriteString("level", finding.Severity.Name());
        json.WriteStartObject("message");
        json.WriteString("text", MessageText(finding));
        json.WriteEndObject();

        json.WriteStartArray("locations");
        json.WriteStartObject();
        json.WriteStartObject("physicalLocation");
        json.WriteStartObject("artifactLocation");
        json.WriteString("uri", uri);
        json.WriteEndObject();
        json.WriteStartObject("region");
        // SARIF lines and columns start at 1; a finding without a place points at the start of the file.
        json.WriteNumber("startLine", Math.Max(1, finding.Line));
        json.WriteNumber("startColumn", Math.Max(1, finding.Column));
        json.WriteEndObject();
        json.WriteEndObject();
        json.WriteEndObject();
        json.WriteEndArray();

        json.WriteStartObject("partialFingerprints");
        json.WriteString(FingerprintKey, Fingerprint(finding, uri, seen));
        json.WriteEndObject();

        if (finding.Waived)
        {
            json.WriteStartArray("suppressions");
            json.WriteStartObject();
            json.WriteString("kind", "inSource");
            json.WriteString("status", "accepted");
            json.WriteString("justification", string.IsNullOrWhiteSpace(finding.WaiverReason) ? "waived in the spec" : finding.WaiverReason);
            json.WriteEndObject();
            json.WriteEndArray();
        }

        json.WriteStartObject("properties");
        json.WriteString("pointer", finding.Pointer);
        if (finding.Setting is not null)
        {
            json.WriteString("setting", finding.Setting);
        }

        if (finding.Fix is { } fix)
        {
            // SARIF's own fixes[] needs the exact character span of the old value, which findings do not carry;
            // the suggestion travels here and in the message instead.
            json.WriteStartObject("fix");
            json.WriteString("path", fix.Path);
            json.WriteString("value", fix.Value);
            json.WriteEndObject();
        }

        json.WriteEndObject();
        json.WriteEndObject();
    }

    /// <summary>The message as code scanning shows it: its first sentence is the alert title, so it leads with the finding.</summary>
    internal static string MessageText(Finding finding)
    {
        // The setting leads, so the alert title says which gain it is about.
        var text = (finding.Setting is null ? "" : $"Setting {finding.Setting}: ") + Sentence(finding.Message);
        if (finding.Fix is { } fix)
        {
            text += $" Suggested fix: set {fix.Path} to {fix.Value}.";
        }

        return text;
    }

    private static string Sentence(string text)
    {
        var t = (text ?? "").Trim();
        if (t.Length == 0)
        {
            return "(no message)";
        }

        t = char.ToUpperInvariant(t[0]) + t[1..];
        return t[^1] is '.' or '!' or '?' ? t : t + ".";
    }

    /// <summary>
    /// Hash of rule id, file and JSON Pointer: stable across runs and line shifts, so an alert follows its key when
    /// lines are added above it. A second finding with the same three gets its ordinal mixed in.
    /// </summary>
    private static string Fingerprint(Finding finding, string uri, Dictionary<string, int> seen)
    {
        var key = finding.RuleId + "\n" + uri + "\n" + finding.Pointer;
        var n = seen[key] = seen.GetValueOrDefault(key) + 1;
        var input = n == 1 ? key : key + "\n#" + n.ToString(CultureInfo.InvariantCulture);
        return Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(input)))[..32];
    }
}
