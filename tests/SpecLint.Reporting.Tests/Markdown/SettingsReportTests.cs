using Markdig;
using Markdig.Extensions.Tables;
using Markdig.Syntax;
using Markdig.Syntax.Inlines;
using SpecLint.Reporting.Markdown;
using SpecLint.Reporting.Model;
using SpecLint.Reporting.Plots;
using SpecLint.Rules.Checking;

namespace SpecLint.Reporting.Tests.Markdown;

/// <summary>A channel with more than one gain in the report: one column per setting, one curve per setting.</summary>
public sealed class SettingsReportTests : IDisposable
{
    private const string Switched = """
        spec: 1
        kind: transimpedance
        name: meter
        conditions:
          temperature: 25 °C
          supply: { positive: 5 V, negative: 0 V }
        bias: 0.2 V
        input:
          type: photodiode
          capacitance: 60 pF
          current: { min: 1 nA, max: 100 µA }
        amplifier:
          gbw: 8 MHz
          voltage-noise: 7 nV/√Hz
          current-noise: 3 fA/√Hz
          input-capacitance: { common-mode: 3 pF, differential: 1 pF }
          bias-current: 5 pA
          offset-voltage: 0.5 mV
          output-swing: { to-negative: 20 mV, to-positive: 20 mV }
        feedback:
          settings:
            - { name: low, resistance: 20 kΩ, capacitance: 22 pF, input: { current: { min: 1 µA, max: 200 µA } } }
            - { name: high, resistance: 200 MΩ, capacitance: 0.3 pF, input: { current: { min: 100 pA, max: 20 nA } }, requirements: { bandwidth: 2 kHz } }
          switch: { on-resistance: 35 Ω, off-capacitance: 4 pF }
        """;

    private static readonly MarkdownPipeline Pipeline = new MarkdownPipelineBuilder().UseAdvancedExtensions().Build();
    private readonly DirectoryInfo _root = Directory.CreateTempSubdirectory("speclint-settings-");

    public void Dispose() => _root.Delete(recursive: true);

    private CheckRun Run()
    {
        File.WriteAllText(Path.Combine(_root.FullName, "meter.tia.yaml"), Switched);
        return CheckRunner.Run(new CheckOptions { Paths = [_root.FullName], Today = new DateOnly(2027, 1, 1) });
    }

    [Fact]
    public void The_metric_table_has_a_column_per_setting_with_each_settings_figures()
    {
        var run = Run();
        var doc = Markdig.Markdown.Parse(MarkdownReport.Render(run, Path.Combine(_root.FullName, "out")), Pipeline);
        var table = doc.Descendants<Table>().Single(t => Cells(t.OfType<TableRow>().First()).FirstOrDefault() == "Metric");
        var rows = table.OfType<TableRow>().ToList();
        Assert.Equal(["Metric", "setting low", "setting high", "Note"], Cells(rows[0]));

        var settings = run.Specs[0].Settings;
        var bandwidth = rows.Single(r => Cells(r)[0] == "−3 dB bandwidth");
        Assert.Equal(MetricRows.Q(settings[0].Analysis!.Bandwidth!.Value.Hertz, Core.Units.Dimension.Frequency), Cells(bandwidth)[1]);
        Assert.Equal(MetricRows.Q(settings[1].Analysis!.Bandwidth!.Value.Hertz, Core.Units.Dimension.Frequency), Cells(bandwidth)[2]);

        // The high setting's finding says which setting it is about.
        var item = doc.Descendants<ListItemBlock>().Select(Text).Single(t => t.Contains("bandwidth", StringComparison.Ordinal) && t.Contains("required", StringComparison.Ordinal));
        Assert.Contains("(setting high)", item, StringComparison.Ordinal);
    }

    [Fact]
    public void Each_chart_draws_one_curve_per_setting()
    {
        var run = Run();
        var charts = SettingPlots.Build([.. run.Specs[0].Settings.Select(s => (s.Name, s.Analysis!))], "meter");
        Assert.Equal(["loop-gain", "transimpedance", "noise"], charts.Select(c => c.Suffix));
        var loop = charts[0].Chart;
        Assert.Equal(["|T| low", "|T| high", "∠T low", "∠T high"], loop.Series.Select(s => s.Name));
        Assert.Equal(["|Zt| low", "|Zt| high"], charts[1].Chart.Series.Select(s => s.Name));
        Assert.Equal(["total, low", "total, high"], charts[2].Chart.Series.Select(s => s.Name));

        // The curves are each setting's own: at DC the transimpedance is that setting's Rf plus the switch.
        Assert.Equal(20_035, charts[1].Chart.Series[0].Points[0].Y, 20_035 * 1e-3);
        Assert.Equal(200e6, charts[1].Chart.Series[1].Points[0].Y, 200e6 * 1e-3);
    }

    private static List<string> Cells(TableRow row) =>
        [.. row.OfType<TableCell>().Select(c => string.Concat(c.Descendants<LiteralInline>().Select(l => l.Content.ToString())).Trim())];

    private static string Text(ListItemBlock item) =>
        string.Concat(item.Descendants<LiteralInline>().Select(l => l.Content.ToString()));
}
