using System.Text;
using SpecLint.Core.Files;
using SpecLint.Reporting.Model;

namespace SpecLint.Reporting.Plots;

/// <summary>Writes the charts of every analysed spec beside a report and returns the Markdown that links them.</summary>
internal static class PlotFiles
{
    /// <summary>
    /// Writes <c>&lt;folder&gt;/&lt;spec&gt;.&lt;chart&gt;.svg</c> for each spec and returns per-spec Markdown, keyed by
    /// spec file. Specs that did not load have no charts.
    /// </summary>
    public static IReadOnlyDictionary<string, string> Write(ReportData data, string reportDirectory, string plotFolderName = "plots")
    {
        ArgumentNullException.ThrowIfNull(data);
        var folder = Path.Combine(reportDirectory, plotFolderName);
        return Build(data, plotFolderName, (file, svg) =>
        {
            AtomicFile.CreateFolder(Path.Combine(plotFolderName, file), folder);
            AtomicFile.WriteAllText(Path.Combine(folder, file), svg);
        });
    }

    /// <summary>
    /// Draws every chart and hands each SVG to <paramref name="sink"/> (file name, text) one spec at a time, so a
    /// caller can write or inline it without all charts of a large run being held at once; returns the
    /// per-spec Markdown that links them under <paramref name="plotFolderName"/>.
    /// </summary>
    public static IReadOnlyDictionary<string, string> Build(ReportData data, string plotFolderName, Action<string, string> sink)
    {
        ArgumentNullException.ThrowIfNull(data);
        ArgumentNullException.ThrowIfNull(sink);
        var links = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var spec in data.Specs.Where(s => s.Section is not null))
        {
            links[spec.File] = Sink(spec.Charts(), spec.Name, plotFolderName, sink);
        }

        foreach (var change in data.Changes?.Specs ?? [])
        {
            if (change.Charts() is { Count: > 0 } charts)
            {
                links[ChangePlots.LinkKey(change.File)] = Sink(charts, change.Name, plotFolderName, sink);
            }
        }

        return links;
    }

    /// <summary>A file-name-safe form of a spec name.</summary>
    public static string SafeName(string name) =>
        new(name.Select(c => char.IsAsciiLetterOrDigit(c) || c is '-' or '_' ? c : '-').ToArray());

    private static string Sink(IReadOnlyList<ReportChart> charts, string name, string plotFolderName, Action<string, string> sink)
    {
        var md = new StringBuilder();
        foreach (var chart in charts)
        {
            var file = $"{SafeName(name)}.{chart.Suffix}.svg";
            sink(file, chart.Svg);
            md.Append("![").Append(chart.Title).Append("](").Append(plotFolderName).Append('/').Append(file).Append(")\n\n");
        }

        return md.ToString();
    }
}
