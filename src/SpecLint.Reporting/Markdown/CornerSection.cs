using System.Globalization;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Units;

namespace SpecLint.Reporting.Markdown;

/// <summary>The corners table and the Monte Carlo summary of one spec.</summary>
internal static class CornerSection
{
    public static IEnumerable<string> Lines(ToleranceResult t)
    {
        yield return "**Varied parameters**";
        yield return "";
        yield return "| Parameter | Low | Typical | High | From |";
        yield return "|---|---:|---:|---:|---|";
        foreach (var p in t.VariedParameters)
        {
            yield return $"| {MarkdownText.Cell(p.Label)} | {MarkdownText.Cell(p.Low)} | {MarkdownText.Cell(p.Typical)} | {MarkdownText.Cell(p.High)} | {MarkdownText.Cell(p.Source)} |";
        }

        yield return "";
        yield return "**Worst corners**";
        yield return "";
        yield return "| Extreme | Value | Corner |";
        yield return "|---|---:|---|";
        yield return $"| Phase margin, minimum | {(t.PhaseMarginMin is { } pm ? MetricRows.Deg(pm.Degrees) : "undefined")} | {MarkdownText.Cell(t.PhaseMarginMinAt.Describe())} |";
        yield return $"| Bandwidth, minimum | {(t.BandwidthMin is { } bmin ? MetricRows.Q(bmin.Hertz, Dimension.Frequency) : "–")} | {MarkdownText.Cell(t.BandwidthMinAt.Describe())} |";
        yield return $"| Bandwidth, maximum | {(t.BandwidthMax is { } bmax ? MetricRows.Q(bmax.Hertz, Dimension.Frequency) : "–")} | {MarkdownText.Cell(t.BandwidthMaxAt.Describe())} |";
        yield return string.Create(CultureInfo.InvariantCulture, $"| Peaking, maximum | {t.PeakingDbMax:0.00} dB | {MarkdownText.Cell(t.PeakingMaxAt.Describe())} |");
        yield return "";
        if (t.MonteCarlo is not { } mc)
        {
            yield break;
        }

        yield return string.Create(CultureInfo.InvariantCulture,
            $"**Monte Carlo**: {mc.Samples} samples, seed {mc.ConfiguredSeed}, {mc.Distribution} distribution; yield {100 * mc.Yield:0.0}% ({string.Join(", ", mc.YieldByCheck.Select(kv => $"{kv.Key} {100 * kv.Value:0.0}%"))}).");
        yield return "";
        yield return "| Percentile | Phase margin | Bandwidth |";
        yield return "|---:|---:|---:|";
        foreach (var k in mc.PhaseMarginPercentilesDeg.Keys)
        {
            var bw = mc.BandwidthPercentilesHz.TryGetValue(k, out var b) ? MetricRows.Q(b, Dimension.Frequency) : "–";
            yield return string.Create(CultureInfo.InvariantCulture, $"| {k} % | {MetricRows.Deg(mc.PhaseMarginPercentilesDeg[k])} | {bw} |");
        }

        yield return "";
        if (!mc.PhaseMarginHistogram.IsEmpty)
        {
            var max = mc.PhaseMarginHistogram.Max(b => b.Count);
            yield return "Phase-margin distribution:";
            yield return "";
            yield return "```text";
            foreach (var bin in mc.PhaseMarginHistogram)
            {
                var bar = max == 0 ? "" : new string('#', (int)Math.Round(40.0 * bin.Count / max));
                yield return string.Create(CultureInfo.InvariantCulture, $"{bin.From,6:0.0}° .. {bin.To,6:0.0}° | {bar} {bin.Count}");
            }

            yield return "```";
            yield return "";
        }
    }
}
