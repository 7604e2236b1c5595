using System.Collections.Immutable;
using System.Globalization;
using SpecLint.Core.Units;
using SpecLint.Reporting.Changes;
using SpecLint.Reporting.Markdown;
using SpecLint.Reporting.Plots;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Model;

/// <summary>
/// Everything the Markdown and HTML reports show, as display text and drawn charts. A check builds it from its
/// run; <c>merge</c> rebuilds it from the shards' JSON (see <see cref="ReportDataJson"/>), so a sharded run's
/// report is rendered by the same code from the same text as an unsharded one.
/// </summary>
/// <param name="Specs">Every spec file, in file order.</param>
/// <param name="RunProblems">Findings outside any spec.</param>
/// <param name="FailOn">The run's fail level.</param>
/// <param name="ConfigFiles">The configuration files read, ordinal.</param>
/// <param name="HouseRules">The house rules that ran, in the catalog's order.</param>
/// <param name="ExitCode">The run's exit code.</param>
/// <param name="Changes">The comparison with a base, or null.</param>
internal sealed record ReportData(
    ImmutableArray<ReportSpec> Specs,
    ImmutableArray<Finding> RunProblems,
    Severity FailOn,
    ImmutableArray<string> ConfigFiles,
    ImmutableArray<ReportHouseRule> HouseRules,
    int ExitCode,
    ReportChanges? Changes)
{
    /// <summary>The report's view of <paramref name="run"/>; charts are drawn only when a writer asks for them.</summary>
    public static ReportData From(CheckRun run)
    {
        ArgumentNullException.ThrowIfNull(run);
        var houseRules = run.Catalog.Rules.Select(r => r.Descriptor).Where(d => run.Catalog.IsHouseRule(d.Id))
            .Select(d => new ReportHouseRule(d.Id, d.Title, d.DefaultSeverity, run.Catalog.HouseRuleSource(d.Id)!, run.Catalog.Page(d.Id)));
        ReportChanges? changes = run.Changes is { } c
            ? new ReportChanges(c.Ref, c.ShortBase, c.AllSpecs, run.Gate, [.. c.Specs.Select(s => new ReportChange(
                s.File, s.PreviousFile, s.Name, s.Status, s.Findings.New, s.Findings.Resolved, s.Findings.Unchanged.Length, s.BaseProblems,
                [.. DeltaRows.For(s)], () => ChangeCharts(s.Before?.Analysis, s.After?.Analysis, s.Name)))]) { BaseNotes = c.BaseNotes }
            : null;
        return new ReportData([.. run.Specs.Select(s => Spec(s, run.FailOn))], run.RunProblems, run.FailOn, run.ConfigFiles, [.. houseRules], run.ExitCode, changes);
    }

    private static ReportSpec Spec(SpecOutcome s, Severity failOn)
    {
        var a = s.Analysis;
        var result = s.IsUnusable ? "unreadable" : s.WorstSeverity is { } w && w >= failOn ? "fail" : "pass";
        var worst = s.Tolerances?.PhaseMarginMin is { } m ? $" (worst {MetricRows.Deg(m.Degrees)})" : "";
        var pm = a is null ? "–" : a.PhaseMargin is { } p ? MetricRows.Deg(p.Degrees) + worst : "undefined";
        var bw = a?.Bandwidth is { } b ? MetricRows.Q(b.Hertz, Dimension.Frequency) : "–";
        var noise = a?.Noise is { } n ? MetricRows.Q(n.InputRms.Amperes, Dimension.Current) : "–";
        var range = a is null ? "–" : $"{MetricRows.Q(a.Output.Min.Volts, Dimension.Voltage)} .. {MetricRows.Q(a.Output.Max.Volts, Dimension.Voltage)}";
        var section = a is null ? null : new ReportSection(
            a.Circuit.Temperature.Celsius.ToString("0.#", CultureInfo.InvariantCulture),
            [.. MetricRows.For(a).Select(r => new ReportMetric(r.Metric, r.Value, r.Note))],
            s.Tolerances is { } tol ? [.. CornerSection.Lines(tol)] : []);
        if (!s.Settings.IsDefaultOrEmpty)
        {
            section = SettingsSection(s);
            return new ReportSpec(s.File, s.Name, s.Spec?.Title, result, pm, bw, noise, range, s.Findings, section, () => SettingCharts(s));
        }

        return new ReportSpec(s.File, s.Name, s.Spec?.Title, result, pm, bw, noise, range, s.Findings, section, () => SpecCharts(a, s.Name));
    }

    /// <summary>A channel with more than one gain: one column per setting, and each setting's corner lines under its name.</summary>
    private static ReportSection? SettingsSection(SpecOutcome s)
    {
        var analysed = s.Settings.Where(x => x.Analysis is not null).ToList();
        if (analysed.Count == 0)
        {
            return null;
        }

        var rows = analysed.Select(x => MetricRows.For(x.Analysis!).ToList()).ToList();
        // A note that quotes one setting's figures would mislead in a shared column: kept only where all agree.
        var metrics = rows[0].Select((r, i) => new ReportMetric(r.Metric, r.Value, rows.All(row => i < row.Count && row[i].Note == r.Note) ? r.Note : "")
        {
            Values = [.. rows.Select(row => i < row.Count && row[i].Metric == r.Metric ? row[i].Value : "–")],
        });
        var corners = analysed
            .Where(x => x.Tolerances is not null)
            .SelectMany(x => CornerSection.Lines(x.Tolerances!).Prepend("").Prepend($"### Setting {MarkdownText.Cell(x.Name)}: tolerances"));
        return new ReportSection(
            analysed[0].Analysis!.Circuit.Temperature.Celsius.ToString("0.#", CultureInfo.InvariantCulture),
            [.. metrics],
            [.. corners])
        {
            Settings = [.. analysed.Select(x => x.Name)],
        };
    }

    private static IReadOnlyList<ReportChart> SettingCharts(SpecOutcome s)
    {
        var analysed = s.Settings.Where(x => x.Analysis is not null).Select(x => (x.Name, x.Analysis!)).ToList();
        return analysed.Count == 0 ? [] : Draw(SettingPlots.Build(analysed, s.Name), s.Name);
    }

    private static IReadOnlyList<ReportChart> SpecCharts(Core.Analysis.AnalysisResult? analysis, string name) =>
        analysis is null ? [] : Draw(SpecPlots.Build(analysis, name), name);

    private static IReadOnlyList<ReportChart> ChangeCharts(Core.Analysis.AnalysisResult? before, Core.Analysis.AnalysisResult? after, string name) =>
        before is null || after is null ? [] : Draw(ChangePlots.Build(before, after, name), name);

    private static List<ReportChart> Draw(IReadOnlyList<(string Suffix, Chart Chart)> charts, string name) =>
        [.. charts.Select(x => new ReportChart(x.Suffix, x.Chart.Title, SvgChartWriter.Write(x.Chart with { Id = PlotFiles.SafeName(name) + "-" + x.Suffix })))];
}
