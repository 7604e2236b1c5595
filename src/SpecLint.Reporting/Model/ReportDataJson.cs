using System.Collections.Immutable;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Nodes;
using SpecLint.Reporting.Changes;
using SpecLint.Reporting.Json;
using SpecLint.Rules.Changes;
using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Model;

/// <summary>
/// Carries a shard's <see cref="ReportData"/> in its JSON output (the <c>report</c> member, written only by
/// <c>check --shard</c>) and reads it back for <c>merge</c>. The text is the report's own display text and SVG, so
/// the merged report needs no analysis. <c>merge</c> drops the member: the merged JSON equals an unsharded run's.
/// </summary>
internal static class ReportDataJson
{
    /// <summary>The member name in a shard's JSON.</summary>
    public const string Member = "report";

    /// <summary><paramref name="json"/> (a run's JSON document) with <paramref name="data"/> added as its last member.</summary>
    public static string AddTo(string json, ReportData data)
    {
        ArgumentNullException.ThrowIfNull(data);
        var root = JsonNode.Parse(json)!.AsObject();
        using var buffer = new MemoryStream();
        using (var w = new Utf8JsonWriter(buffer))
        {
            Write(w, data);
        }

        root[Member] = JsonNode.Parse(buffer.ToArray());
        using var output = new MemoryStream();
        using (var w = new Utf8JsonWriter(output, new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping }))
        {
            root.WriteTo(w);
        }

        return Encoding.UTF8.GetString(output.ToArray()) + "\n";
    }

    /// <summary>The report data of one shard document, or null with <paramref name="error"/> when it has none or it is damaged.</summary>
    public static ReportData? Read(string name, JsonObject root, out string? error)
    {
        ArgumentNullException.ThrowIfNull(root);
        if (root[Member] is not JsonObject report)
        {
            error = $"{name}: has no report data; write each shard with 'speclint check --shard i/n --format json' to merge its report";
            return null;
        }

        try
        {
            SeverityNames.TryParse(Text(root, "failOn"), out var failOn);
            var data = new ReportData(
                [.. Array(report, "specs").Select(Spec)],
                Findings(root, "problems"),
                failOn,
                [.. Array(report, "configFiles").Select(n => n?.GetValue<string>() ?? throw Damaged("configFiles"))],
                [.. Array(report, "houseRules").Select(HouseRule)],
                root["exitCode"]?.GetValue<int>() ?? throw Damaged("exitCode"),
                report["changes"] is JsonObject changes ? Changes(changes) : null);
            error = null;
            return data;
        }
        catch (Exception e) when (e is FormatException or InvalidOperationException)
        {
            error = $"{name}: the report data is damaged ({e.Message}); write the shard again";
            return null;
        }
    }

    private static void Write(Utf8JsonWriter w, ReportData data)
    {
        w.WriteStartObject();
        w.WriteStartArray("configFiles");
        foreach (var c in data.ConfigFiles)
        {
            w.WriteStringValue(c);
        }

        w.WriteEndArray();
        w.WriteStartArray("houseRules");
        foreach (var h in data.HouseRules)
        {
            w.WriteStartObject();
            w.WriteString("id", h.Id);
            w.WriteString("title", h.Title);
            w.WriteString("severity", h.DefaultSeverity.Name());
            w.WriteString("source", h.Source);
            w.WriteString("page", h.Page);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        w.WriteStartArray("specs");
        foreach (var s in data.Specs)
        {
            WriteSpec(w, s);
        }

        w.WriteEndArray();
        if (data.Changes is { } changes)
        {
            w.WriteStartObject("changes");
            w.WriteString("ref", changes.Ref);
            w.WriteString("base", changes.ShortBase);
            w.WriteBoolean("everySpec", changes.AllSpecs);
            w.WriteString("gate", changes.Gate == Gate.New ? "new" : "all");
            w.WriteStartArray("specs");
            foreach (var c in changes.Specs)
            {
                WriteChange(w, c);
            }

            w.WriteEndArray();
            if (!changes.BaseNotes.IsEmpty)
            {
                WriteFindings(w, "baseNotes", changes.BaseNotes);
            }

            w.WriteEndObject();
        }

        w.WriteEndObject();
    }

    private static void WriteSpec(Utf8JsonWriter w, ReportSpec s)
    {
        w.WriteStartObject();
        w.WriteString("file", s.File);
        w.WriteString("name", s.Name);
        w.WriteString("title", s.Title);
        w.WriteString("result", s.Result);
        w.WriteString("phaseMargin", s.PhaseMargin);
        w.WriteString("bandwidth", s.Bandwidth);
        w.WriteString("inputNoise", s.InputNoise);
        w.WriteString("outputRange", s.OutputRange);
        WriteFindings(w, "findings", s.Findings);
        if (s.Section is { } section)
        {
            w.WriteStartObject("section");
            w.WriteString("temperature", section.Temperature);
            w.WriteStartArray("metrics");
            foreach (var m in section.Metrics)
            {
                w.WriteStartArray();
                w.WriteStringValue(m.Metric);
                w.WriteStringValue(m.Value);
                w.WriteStringValue(m.Note);
                foreach (var v in m.Values)
                {
                    w.WriteStringValue(v);
                }

                w.WriteEndArray();
            }

            w.WriteEndArray();
            WriteStrings(w, "corners", section.Corners);
            if (!section.Settings.IsDefaultOrEmpty)
            {
                WriteStrings(w, "settings", section.Settings);
            }
            w.WriteEndObject();
        }

        WriteCharts(w, s.Section is null ? [] : s.Charts());
        w.WriteEndObject();
    }

    private static void WriteChange(Utf8JsonWriter w, ReportChange c)
    {
        w.WriteStartObject();
        w.WriteString("file", c.File);
        w.WriteString("previousFile", c.PreviousFile);
        w.WriteString("name", c.Name);
        w.WriteString("status", c.Status.Name());
        WriteFindings(w, "new", c.New);
        WriteFindings(w, "resolved", c.Resolved);
        w.WriteNumber("unchanged", c.Unchanged);
        WriteFindings(w, "baseProblems", c.BaseProblems);
        w.WriteStartArray("deltas");
        foreach (var d in c.Deltas)
        {
            w.WriteStartArray();
            w.WriteStringValue(d.Metric);
            w.WriteStringValue(d.Before);
            w.WriteStringValue(d.After);
            w.WriteStringValue(d.Change);
            w.WriteEndArray();
        }

        w.WriteEndArray();
        WriteCharts(w, c.Charts());
        w.WriteEndObject();
    }

    private static void WriteCharts(Utf8JsonWriter w, IReadOnlyList<ReportChart> charts)
    {
        w.WriteStartArray("charts");
        foreach (var chart in charts)
        {
            w.WriteStartObject();
            w.WriteString("suffix", chart.Suffix);
            w.WriteString("title", chart.Title);
            w.WriteString("svg", chart.Svg);
            w.WriteEndObject();
        }

        w.WriteEndArray();
    }

    private static void WriteFindings(Utf8JsonWriter w, string name, IEnumerable<Finding> findings)
    {
        w.WriteStartArray(name);
        foreach (var f in findings)
        {
            JsonReport.WriteFinding(w, f);
        }

        w.WriteEndArray();
    }

    private static void WriteStrings(Utf8JsonWriter w, string name, IEnumerable<string> values)
    {
        w.WriteStartArray(name);
        foreach (var v in values)
        {
            w.WriteStringValue(v);
        }

        w.WriteEndArray();
    }

    private static ReportSpec Spec(JsonNode? node)
    {
        var s = node as JsonObject ?? throw Damaged("specs");
        var charts = Charts(s);
        ReportSection? section = s["section"] is JsonObject x
            ? new ReportSection(
                Text(x, "temperature"),
                [.. Array(x, "metrics").Select(m => Row(m, 3, atLeast: true)).Select(r => new ReportMetric(r[0], r[1], r[2]) { Values = [.. r.Skip(3)] })],
                [.. Strings(x, "corners")])
            {
                Settings = x["settings"] is JsonArray ? [.. Strings(x, "settings")] : [],
            }
            : null;
        return new ReportSpec(Text(s, "file"), Text(s, "name"), s["title"]?.GetValue<string>(), Text(s, "result"), Text(s, "phaseMargin"), Text(s, "bandwidth"),
            Text(s, "inputNoise"), Text(s, "outputRange"), Findings(s, "findings"), section, () => charts);
    }

    private static ReportChanges Changes(JsonObject c) =>
        new(Text(c, "ref"), Text(c, "base"), c["everySpec"]?.GetValue<bool>() ?? throw Damaged("everySpec"), Text(c, "gate") == "new" ? Gate.New : Gate.All,
            [.. Array(c, "specs").Select(Change)])
        {
            BaseNotes = c["baseNotes"] is JsonArray ? Findings(c, "baseNotes") : [],
        };

    private static ReportChange Change(JsonNode? node)
    {
        var c = node as JsonObject ?? throw Damaged("changes");
        var status = Enum.GetValues<ChangeStatus>().FirstOrDefault(s => s.Name() == Text(c, "status"));
        var charts = Charts(c);
        return new ReportChange(Text(c, "file"), c["previousFile"]?.GetValue<string>(), Text(c, "name"), status, Findings(c, "new"), Findings(c, "resolved"),
            c["unchanged"]?.GetValue<int>() ?? throw Damaged("unchanged"), Findings(c, "baseProblems"),
            [.. Array(c, "deltas").Select(d => Row(d, 4)).Select(r => new DeltaRow(r[0], r[1], r[2], r[3]))], () => charts);
    }

    private static ReportHouseRule HouseRule(JsonNode? node)
    {
        var h = node as JsonObject ?? throw Damaged("houseRules");
        SeverityNames.TryParse(Text(h, "severity"), out var severity);
        return new ReportHouseRule(Text(h, "id"), Text(h, "title"), severity, Text(h, "source"), h["page"]?.GetValue<string>());
    }

    private static List<ReportChart> Charts(JsonObject o) =>
        [.. Array(o, "charts").Select(n => n as JsonObject ?? throw Damaged("charts")).Select(c => new ReportChart(Text(c, "suffix"), Text(c, "title"), Text(c, "svg")))];

    private static ImmutableArray<Finding> Findings(JsonObject o, string key) =>
        [.. Array(o, key).Select(n => n is JsonObject f && f["rule"] is not null && f["file"] is not null && f["line"] is not null && f["column"] is not null && f["message"] is not null
            ? JsonMerge.ToFinding(f)
            : throw Damaged(key))];

    private static string[] Row(JsonNode? node, int length, bool atLeast = false) =>
        node is JsonArray a && (a.Count == length || (atLeast && a.Count > length))
            ? [.. a.Select(v => v?.GetValue<string>() ?? throw Damaged("row"))]
            : throw Damaged("row");

    private static IEnumerable<string> Strings(JsonObject o, string key) => Array(o, key).Select(n => n?.GetValue<string>() ?? throw Damaged(key));

    private static JsonArray Array(JsonObject o, string key) => o[key] as JsonArray ?? throw Damaged(key);

    private static string Text(JsonObject o, string key) => o[key]?.GetValue<string>() ?? throw Damaged(key);

    private static FormatException Damaged(string key) => new($"'{key}' is missing or not what 'check --shard' writes");
}
