using System.Text.Json;
using SpecLint.Rules.Checking;

namespace SpecLint.Reporting.Json;

/// <summary>The <c>corners</c> and <c>monteCarlo</c> members of a spec in the JSON output (references.md §D5).</summary>
internal static class CornersJson
{
    public static void Write(Utf8JsonWriter w, SpecOutcome spec) => Write(w, spec.Tolerances);

    public static void Write(Utf8JsonWriter w, Core.Analysis.Tolerance.ToleranceResult? tolerances)
    {
        if (tolerances is not { } t)
        {
            w.WriteNull("corners");
            w.WriteNull("monteCarlo");
            return;
        }

        w.WriteStartObject("corners");
        JsonReport.Nullable(w, "phaseMarginDegMin", t.PhaseMarginMin?.Degrees);
        JsonReport.Nullable(w, "bandwidthHzMin", t.BandwidthMin?.Hertz);
        JsonReport.Nullable(w, "bandwidthHzMax", t.BandwidthMax?.Hertz);
        JsonReport.Nullable(w, "peakingDbMax", t.PeakingDbMax);

        // Extensions beyond the contract: which corner gives each extreme, and what was varied.
        JsonReport.Nullable(w, "phaseMarginDegMax", t.PhaseMarginMax?.Degrees);
        w.WriteString("phaseMarginMinCorner", t.PhaseMarginMinAt.Describe());
        w.WriteString("bandwidthMinCorner", t.BandwidthMinAt.Describe());
        w.WriteString("bandwidthMaxCorner", t.BandwidthMaxAt.Describe());
        w.WriteString("peakingMaxCorner", t.PeakingMaxAt.Describe());
        w.WriteBoolean("unstableCornerExists", t.UnstableCornerExists);
        w.WriteStartArray("varied");
        foreach (var p in t.VariedParameters)
        {
            w.WriteStartObject();
            w.WriteString("pointer", p.Pointer);
            w.WriteString("label", p.Label);
            w.WriteString("low", p.Low);
            w.WriteString("typical", p.Typical);
            w.WriteString("high", p.High);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        w.WriteEndObject();
        if (t.MonteCarlo is { } mc)
        {
            w.WriteStartObject("monteCarlo");
            w.WriteNumber("samples", mc.Samples);
            w.WriteNumber("seed", mc.ConfiguredSeed);
            w.WriteNumber("yield", mc.Yield);
            w.WriteString("distribution", mc.Distribution);
            w.WriteStartObject("yieldByCheck");
            foreach (var (check, y) in mc.YieldByCheck)
            {
                w.WriteNumber(check, y);
            }

            w.WriteEndObject();
            w.WriteStartObject("phaseMarginDegPercentiles");
            foreach (var (pct, v) in mc.PhaseMarginPercentilesDeg)
            {
                w.WriteNumber(pct.ToString(System.Globalization.CultureInfo.InvariantCulture), v);
            }

            w.WriteEndObject();
            w.WriteStartObject("bandwidthHzPercentiles");
            foreach (var (pct, v) in mc.BandwidthPercentilesHz)
            {
                w.WriteNumber(pct.ToString(System.Globalization.CultureInfo.InvariantCulture), v);
            }

            w.WriteEndObject();
            w.WriteEndObject();
        }
        else
        {
            w.WriteNull("monteCarlo");
        }
    }
}
