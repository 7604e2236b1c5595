using System.Text.RegularExpressions;
using Markdig;
using Markdig.Extensions.Tables;
using Markdig.Syntax;
using Markdig.Syntax.Inlines;
using SpecLint.Reporting.Markdown;
using SpecLint.Rules.Checking;

namespace SpecLint.Reporting.Tests.Markdown;

public sealed partial class MarkdownReportTests : IDisposable
{
    private static readonly MarkdownPipeline Pipeline = new MarkdownPipelineBuilder().UseAdvancedExtensions().Build();
    private readonly DirectoryInfo _root = Directory.CreateTempSubdirectory("speclint-md-");

    [GeneratedRegex(@"#L(?<line>\d+)$")]
    private static partial Regex LineAnchor();

    public void Dispose() => _root.Delete(recursive: true);

    private CheckRun RunOnTwoSpecs()
    {
        var hw = Directory.CreateDirectory(Path.Combine(_root.FullName, "hw"));
        File.WriteAllText(Path.Combine(hw.FullName, "a.tia.yaml"), ReportSpecs.Clean);
        File.WriteAllText(Path.Combine(hw.FullName, "b.tia.yaml"), ReportSpecs.Unstable);
        return CheckRunner.Run(new CheckOptions { Paths = [hw.FullName], Today = new DateOnly(2027, 1, 1) });
    }

    private string Render(CheckRun run)
    {
        var reportDir = Path.Combine(_root.FullName, "out");
        return MarkdownReport.Render(run, reportDir);
    }

    [Fact]
    public void Summary_table_has_a_row_per_spec_and_the_key_columns()
    {
        var run = RunOnTwoSpecs();
        var doc = Markdig.Markdown.Parse(Render(run), Pipeline);
        var summary = doc.Descendants<Table>().First();
        var rows = summary.OfType<TableRow>().ToList();
        Assert.True(rows[0].IsHeader);
        var headers = rows[0].OfType<TableCell>().Select(CellText).ToList();
        Assert.Equal(["Spec", "Result", "Phase margin", "Bandwidth", "Input noise (rms)", "Output range", "Findings"], headers);
        Assert.Equal(run.Specs.Length, rows.Count - 1);
        Assert.Contains(rows.Skip(1), r => CellText((TableCell)r[1]) == "fail");
        Assert.Contains(rows.Skip(1), r => CellText((TableCell)r[1]) == "pass");
    }

    [Fact]
    public void Finding_links_point_at_existing_lines_of_the_spec_files()
    {
        var run = RunOnTwoSpecs();
        var reportDir = Path.Combine(_root.FullName, "out");
        var doc = Markdig.Markdown.Parse(Render(run), Pipeline);
        var lineLinks = doc.Descendants<LinkInline>().Where(l => l.Url is not null && LineAnchor().IsMatch(l.Url)).ToList();
        Assert.NotEmpty(lineLinks);
        foreach (var link in lineLinks)
        {
            var url = link.Url!;
            var file = Path.GetFullPath(Path.Combine(reportDir, url[..url.IndexOf('#', StringComparison.Ordinal)]));
            Assert.True(File.Exists(file), url);
            var line = int.Parse(LineAnchor().Match(url).Groups["line"].Value, System.Globalization.CultureInfo.InvariantCulture);
            Assert.InRange(line, 1, File.ReadAllLines(file).Length);
        }

        var findings = run.AllFindings.Count(f => !f.Waived);
        Assert.Equal(findings, lineLinks.Count);
    }

    [Fact]
    public void Metric_tables_carry_units_in_engineering_notation()
    {
        var run = RunOnTwoSpecs();
        var doc = Markdig.Markdown.Parse(Render(run), Pipeline);
        var metricTables = doc.Descendants<Table>().Where(t => CellText((TableCell)((TableRow)t[0])[0]) == "Metric").ToList();
        Assert.Equal(2, metricTables.Count);
        var values = metricTables[0].OfType<TableRow>().Skip(1).ToDictionary(r => CellText((TableCell)r[0]), r => CellText((TableCell)r[1]));
        Assert.Matches(@"^[\d.]+ [kMG]?Ω$", values["DC transimpedance"]);
        Assert.Matches(@"^[\d.]+ [kM]?Hz$", values["−3 dB bandwidth"]);
        Assert.Matches(@"^[\d.]+°$", values["Phase margin"]);
        Assert.Matches(@"^[\d.]+ [fpnµ]A$", values["Input-referred noise, rms"]);
    }

    [Fact]
    public void Report_states_it_is_a_design_aid_and_has_no_timestamp_by_default()
    {
        var run = RunOnTwoSpecs();
        var md = Render(run);
        Assert.Contains("verify every channel on the bench", md, StringComparison.Ordinal);
        Assert.DoesNotContain("Generated", md, StringComparison.Ordinal);
        Assert.Equal(md, Render(RunOnTwoSpecs()));
    }

    private static string CellText(TableCell cell) =>
        string.Concat(cell.Descendants<LiteralInline>().Select(l => l.Content.ToString())).Trim();
}
