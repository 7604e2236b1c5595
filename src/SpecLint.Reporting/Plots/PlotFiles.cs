using System.Text;
using SpecLint.Core.Files;
using SpecLint.Rules.Checking;

namespace SpecLint.Reporting.Plots;

/// <summary>Writes the charts of every analysed spec beside a report and returns the Markdown that links them.</summary>
internal static class PlotFiles
{
    /// <summary>
    /// Writes <c>&lt;folder&gt;/&lt;spec&gt;.&lt;chart&gt;.svg</c> for each spec and returns per-spec Markdown, keyed by
    /// spec file. Specs that did not load have no charts.
    /// </summary>
    public static IReadOnlyDictionary<string, string> Write(CheckRun run, string reportDirectory, string plotFolderName = "plots")
    {
        ArgumentNullException.ThrowIfNull(run);
        var folder = Path.Combine(reportDirectory, plotFolderName);
        return Build(run, plotFolderName, (file, svg) =>
        {
            AtomicFile.CreateFolder(Path.Combine(plotFolderName, file), folder);
            AtomicFile.WriteAllText(Path.Combine(folder, file), svg);
        });
    }

    /// <summary>
    /// Renders every chart and hands each SVG to <paramref name="sink"/> (file name, text) one at a time, so a
    /// caller can write or inline it without all charts of a large run being held at once; returns the
    /// per-spec Markdown that links them under <paramref name="plotFolderName"/>.
    /// </summary>
    public static IReadOnlyDictionary<string, string> Build(CheckRun run, string plotFolderName, Action<string, string> sink)
    {
        ArgumentNullException.ThrowIfNull(run);
        ArgumentNullException.ThrowIfNull(sink);
        var links = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var spec in run.Specs)
        {
            if (spec.Analysis is not { } analysis)
            {
                continue;
            }

            var md = new StringBuilder();
            foreach (var (suffix, chart) in SpecPlots.Build(analysis, spec.Name))
            {
                var file = $"{SafeName(spec.Name)}.{suffix}.svg";
                sink(file, SvgChartWriter.Write(chart with { Id = SafeName(spec.Name) + "-" + suffix }));
                md.Append("![").Append(chart.Title).Append("](").Append(plotFolderName).Append('/').Append(file).Append(")\n\n");
            }

            links[spec.File] = md.ToString();
        }

        return links;
    }

    /// <summary>A file-name-safe form of a spec name.</summary>
    public static string SafeName(string name) =>
        new(name.Select(c => char.IsAsciiLetterOrDigit(c) || c is '-' or '_' ? c : '-').ToArray());
}
