using System.Text.Json;
using SpecLint.Rules.Checking;

namespace SpecLint.Reporting.Json;

/// <summary>The <c>corners</c> and <c>monteCarlo</c> members of a spec in the JSON output (DESIGN §5).</summary>
internal static class CornersJson
{
    public static void Write(Utf8JsonWriter w, SpecOutcome spec)
    {
        if (spec.Tolerances is not { } t)
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
        w.WriteNumber("varied", t.VariedParameters.Length);
        w.WriteEndObject();
        if (t.MonteCarlo is { } mc)
        {
            w.WriteStartObject("monteCarlo");
            w.WriteNumber("samples", mc.Samples);
            w.WriteNumber("seed", mc.Seed);
            w.WriteNumber("yield", mc.Yield);
            w.WriteEndObject();
        }
        else
        {
            w.WriteNull("monteCarlo");
        }
    }
}
