using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using SpecLint.Core.Analysis;
using SpecLint.Reporting.Changes;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Json;

/// <summary>
/// The machine-readable output of references.md §D5. Field names are a contract: extend, never rename. Written
/// with a forward-only writer so key order and number formatting are identical on every run.
/// </summary>
internal static class JsonReport
{
    /// <summary>The JSON document for a run, indented, with a trailing newline.</summary>
    public static string Write(CheckRun run)
    {
        using var text = new StringWriter(System.Globalization.CultureInfo.InvariantCulture) { NewLine = "\n" };
        Write(run, text);
        return text.ToString();
    }

    /// <summary>
    /// Writes the JSON document for a run to <paramref name="output"/>, one spec at a time: a run of thousands of
    /// specs never holds the whole document in memory (as bytes, then again as a string).
    /// </summary>
    public static void Write(CheckRun run, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(run);
        ArgumentNullException.ThrowIfNull(output);
        using var buffer = new MemoryStream();
        var decoder = Encoding.UTF8.GetDecoder();
        var chars = new char[4096];
        void Drain(Utf8JsonWriter w)
        {
            w.Flush();
            var bytes = buffer.GetBuffer().AsSpan(0, (int)buffer.Length);
            while (!bytes.IsEmpty)
            {
                decoder.Convert(bytes, chars, flush: false, out var used, out var produced, out _);
                output.Write(chars, 0, produced);
                bytes = bytes[used..];
            }

            buffer.SetLength(0);
        }

        using (var w = new Utf8JsonWriter(buffer, new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping }))
        {
            w.WriteStartObject();
            w.WriteNumber("version", 1);
            w.WriteStartArray("specs");
            foreach (var spec in run.Specs)
            {
                WriteSpec(w, spec, run);
                Drain(w);
            }

            w.WriteEndArray();
            w.WriteStartArray("problems");
            foreach (var f in run.RunProblems)
            {
                WriteFinding(w, f);
            }

            w.WriteEndArray();
            ChangesJson.Write(w, run);
            AcceptedJson.Write(w, run);
            w.WriteString("failOn", run.FailOn.Name());
            w.WriteNumber("exitCode", run.ExitCode);
            w.WriteEndObject();
            Drain(w);
        }

        output.Write('\n');
    }

    private static void WriteSpec(Utf8JsonWriter w, SpecOutcome spec, CheckRun run)
    {
        w.WriteStartObject();
        w.WriteString("file", spec.File);
        w.WriteString("name", spec.Spec?.Name);
        if (spec.Analysis is { } a)
        {
            WriteMetrics(w, a);
        }
        else
        {
            w.WriteNull("metrics");
        }

        CornersJson.Write(w, spec);
        w.WriteStartArray("findings");
        foreach (var f in spec.Findings)
        {
            WriteFinding(w, f, run.IsAccepted(f));
        }

        w.WriteEndArray();
        if (!spec.Settings.IsDefaultOrEmpty)
        {
            WriteSettings(w, spec, run);
        }

        w.WriteEndObject();
    }

    /// <summary>A channel with more than one gain: each setting's figures and findings (the spec's own members hold the first setting's figures).</summary>
    private static void WriteSettings(Utf8JsonWriter w, SpecOutcome spec, CheckRun run)
    {
        w.WriteStartArray("settings");
        foreach (var s in spec.Settings)
        {
            w.WriteStartObject();
            w.WriteString("name", s.Name);
            if (s.Analysis is { } a)
            {
                WriteMetrics(w, a);
            }
            else
            {
                w.WriteNull("metrics");
            }

            CornersJson.Write(w, s.Tolerances);
            w.WriteStartArray("findings");
            foreach (var f in s.Findings)
            {
                WriteFinding(w, f, run.IsAccepted(f));
            }

            w.WriteEndArray();
            w.WriteEndObject();
        }

        w.WriteEndArray();
    }

    private static void WriteMetrics(Utf8JsonWriter w, AnalysisResult a)
    {
        w.WriteStartObject("metrics");
        w.WriteNumber("transimpedanceOhm", a.Transimpedance.Ohms);
        Nullable(w, "bandwidthHz", a.Bandwidth?.Hertz);
        Nullable(w, "phaseMarginDeg", a.PhaseMargin?.Degrees);
        Nullable(w, "crossoverHz", a.Crossover?.Hertz);
        w.WriteNumber("peakingDb", a.PeakingDb);
        Nullable(w, "noiseGainHighFrequency", double.IsFinite(a.NoiseGainHighFrequency) ? a.NoiseGainHighFrequency : null);
        Nullable(w, "outputNoiseRmsV", a.Noise?.OutputRms.Volts);
        Nullable(w, "inputNoiseRmsA", a.Noise?.InputRms.Amperes);
        if (a.Noise is { } n)
        {
            w.WriteStartArray("noiseBandHz");
            w.WriteNumberValue(n.BandLow.Hertz);
            w.WriteNumberValue(n.BandHigh.Hertz);
            w.WriteEndArray();
        }
        else
        {
            w.WriteNull("noiseBandHz");
        }

        w.WriteNumber("outputMinV", a.Output.Min.Volts);
        w.WriteNumber("outputMaxV", a.Output.Max.Volts);

        // Extensions beyond the contract.
        w.WriteNumber("loopGainDc", a.LoopGainDc);
        w.WriteNumber("shotToRfThermalRatio", a.ShotToRfThermalRatio);
        Nullable(w, "noiseTemperatureK", a.Noise?.Temperature.Kelvin);
        Nullable(w, "snrAtMinimumDb", a.Noise?.SnrAtMinimumDb);
        Nullable(w, "noiseEquivalentPowerW", a.Noise?.NoiseEquivalentPower?.Watts);
        w.WriteNumber("headroomLowV", a.Output.HeadroomLow.Volts);
        w.WriteNumber("headroomHighV", a.Output.HeadroomHigh.Volts);
        w.WriteStartArray("crossings");
        foreach (var c in a.Crossings)
        {
            w.WriteStartObject();
            w.WriteNumber("frequencyHz", c.Frequency.Hertz);
            w.WriteString("direction", c.Direction.ToString().ToLowerInvariant());
            w.WriteNumber("phaseDeg", c.Phase.Degrees);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        w.WriteEndObject();
    }

    internal static void WriteFinding(Utf8JsonWriter w, Finding f, bool accepted = false)
    {
        w.WriteStartObject();
        w.WriteString("rule", f.RuleId);
        w.WriteString("severity", f.Severity.Name());
        w.WriteString("message", f.Message);
        w.WriteString("file", f.File);
        w.WriteNumber("line", f.Line);
        w.WriteNumber("column", f.Column);
        w.WriteString("pointer", f.Pointer);
        if (f.Setting is not null)
        {
            w.WriteString("setting", f.Setting);
        }

        if (f.Fix is { } fix)
        {
            w.WriteStartObject("fix");
            w.WriteString("path", fix.Path);
            w.WriteString("value", fix.Value);
            w.WriteEndObject();
        }

        w.WriteBoolean("waived", f.Waived);
        if (f.WaiverReason is not null)
        {
            w.WriteString("waiverReason", f.WaiverReason);
        }

        if (accepted)
        {
            w.WriteBoolean("accepted", true);
        }

        w.WriteEndObject();
    }

    internal static void Nullable(Utf8JsonWriter w, string name, double? value)
    {
        if (value is { } v && double.IsFinite(v))
        {
            w.WriteNumber(name, v);
        }
        else
        {
            w.WriteNull(name);
        }
    }
}
