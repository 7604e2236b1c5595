using System.Text.Json;
using SpecLint.Reporting.Json;
using SpecLint.Rules.Changes;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Changes;

/// <summary>The <c>against</c> and <c>changes</c> members of the JSON output (a comparison with a base).</summary>
internal static class ChangesJson
{
    public static void Write(Utf8JsonWriter w, CheckRun run)
    {
        ArgumentNullException.ThrowIfNull(w);
        ArgumentNullException.ThrowIfNull(run);
        if (run.Changes is not { } changes)
        {
            return;
        }

        w.WriteStartObject("against");
        w.WriteString("ref", changes.Ref);
        w.WriteString("mergeBase", changes.MergeBase);
        w.WriteString("gate", run.Gate == Gate.New ? "new" : "all");
        w.WriteBoolean("everySpec", changes.AllSpecs);
        w.WriteEndObject();
        w.WriteStartArray("changes");
        foreach (var c in changes.Specs)
        {
            w.WriteStartObject();
            w.WriteString("file", c.File);
            w.WriteString("previousFile", c.PreviousFile);
            w.WriteString("name", c.Name);
            w.WriteString("status", c.Status.Name());
            Metrics(w, "before", c.MetricsBefore);
            Metrics(w, "after", c.MetricsAfter);
            w.WriteStartObject("findings");
            Findings(w, "new", c.Findings.New, run);
            Findings(w, "resolved", c.Findings.Resolved, run);
            Findings(w, "unchanged", c.Findings.Unchanged, run);
            w.WriteEndObject();
            Findings(w, "baseProblems", c.BaseProblems, run);
            w.WriteEndObject();
        }

        w.WriteEndArray();

        // Only when there are some, so the output of every run whose base built stays as it was; outside "against",
        // which shards of one run must share, because a shard meets only the bases of its own specs.
        if (!changes.BaseNotes.IsEmpty)
        {
            Findings(w, "baseNotes", changes.BaseNotes, run);
        }
    }

    private static void Findings(Utf8JsonWriter w, string name, IEnumerable<Finding> findings, CheckRun run)
    {
        w.WriteStartArray(name);
        foreach (var f in findings)
        {
            JsonReport.WriteFinding(w, f, run.IsAccepted(f));
        }

        w.WriteEndArray();
    }

    private static void Metrics(Utf8JsonWriter w, string name, MetricSnapshot? m)
    {
        if (m is null)
        {
            w.WriteNull(name);
            return;
        }

        w.WriteStartObject(name);
        JsonReport.Nullable(w, "phaseMarginDeg", m.PhaseMarginDeg);
        JsonReport.Nullable(w, "phaseMarginDegMin", m.PhaseMarginDegMin);
        w.WriteString("phaseMarginMinCorner", m.PhaseMarginMinCorner);
        JsonReport.Nullable(w, "bandwidthHz", m.BandwidthHz);
        JsonReport.Nullable(w, "peakingDb", m.PeakingDb);
        JsonReport.Nullable(w, "inputNoiseRmsA", m.InputNoiseRmsA);
        JsonReport.Nullable(w, "outputMinV", m.OutputMinV);
        JsonReport.Nullable(w, "outputMaxV", m.OutputMaxV);
        JsonReport.Nullable(w, "yield", m.Yield);
        w.WriteEndObject();
    }
}
