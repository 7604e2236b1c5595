using System.Globalization;
using System.Text.Json;
using SpecLint.Rules.Checking;

namespace SpecLint.Reporting.Changes;

/// <summary>The <c>accepted</c> member of the JSON output: the accepted-findings file and its stale entries.</summary>
internal static class AcceptedJson
{
    public static void Write(Utf8JsonWriter w, CheckRun run)
    {
        ArgumentNullException.ThrowIfNull(w);
        ArgumentNullException.ThrowIfNull(run);
        if (run.Acceptance is not { } a)
        {
            return;
        }

        w.WriteStartObject("accepted");
        w.WriteString("file", a.File);
        w.WriteNumber("entries", a.Entries.Length);
        w.WriteNumber("findingsCovered", a.Covered.Count);
        w.WriteStartArray("stale");
        foreach (var e in a.Stale)
        {
            w.WriteStartObject();
            w.WriteString("rule", e.Key.Rule);
            w.WriteString("spec", e.Key.Spec);
            w.WriteString("pointer", e.Key.Pointer);
            w.WriteNumber("line", e.Line);
            w.WriteString("date", e.Date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture));
            w.WriteEndObject();
        }

        w.WriteEndArray();
        w.WriteEndObject();
    }
}
