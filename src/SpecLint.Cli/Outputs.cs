using System.Text;
using SpecLint.Reporting.Annotations;
using SpecLint.Reporting.Html;
using SpecLint.Reporting.Json;
using SpecLint.Reporting.Markdown;
using SpecLint.Reporting.Plots;
using SpecLint.Reporting.Sarif;
using SpecLint.Reporting.Terminal;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Cli;

/// <summary>What a run should write besides the terminal output.</summary>
/// <param name="Format">text, json or github.</param>
/// <param name="ReportPath">Markdown report file (plots beside it), or null.</param>
/// <param name="HtmlPath">Standalone HTML report file, or null.</param>
/// <param name="SarifPath">SARIF 2.1.0 file, or null.</param>
/// <param name="Title">The report title.</param>
internal sealed record OutputRequest(string Format, string? ReportPath = null, string? HtmlPath = null, string? SarifPath = null, string Title = "SpecLint report");

/// <summary>Writes a run's outputs: the chosen terminal format and the files asked for.</summary>
internal static class Outputs
{
    private static readonly UTF8Encoding Utf8 = new(false);

    public static void Write(CheckRun run, OutputRequest request, TextWriter output)
    {
        switch (request.Format)
        {
            case "json":
                output.Write(JsonReport.Write(run));
                break;
            case "github":
                // Compared with a base, only what the change introduced is annotated on the diff.
                var annotated = run.Changes is null ? run.AllFindings : run.Specs.SelectMany(s => s.Findings).Where(run.Changes.IsNew).Concat(run.RunProblems);
                GitHubAnnotations.Write(output, annotated.Where(f => !run.IsAccepted(f)).ToList(), Directory.GetCurrentDirectory());
                output.WriteLine(TerminalReport.Summary(run));
                JobSummary.FromEnvironment()?.Append(MarkdownReport.Render(run, Directory.GetCurrentDirectory(), new MarkdownReport.Options(request.Title)));
                break;
            default:
                TerminalReport.Write(run, output, UseColor(output));
                break;
        }

        if (request.ReportPath is not null)
        {
            WriteMarkdown(run, request.ReportPath, request.Title);
        }

        if (request.HtmlPath is not null)
        {
            WriteHtml(run, request.HtmlPath, request.Title);
        }

        if (request.SarifPath is not null)
        {
            WriteSarif(run, request.SarifPath);
        }
    }

    /// <summary>Writes the Markdown report and its plots (in a "plots" folder beside it).</summary>
    public static void WriteMarkdown(CheckRun run, string reportPath, string title)
    {
        var full = Path.GetFullPath(reportPath);
        var dir = Path.GetDirectoryName(full)!;
        Directory.CreateDirectory(dir);
        var plotFolder = Path.GetFileNameWithoutExtension(full) + "-plots";
        var plots = PlotFiles.Write(run, dir, plotFolder);
        var md = MarkdownReport.Render(run, dir, new MarkdownReport.Options(title, Extras: plots));
        File.WriteAllText(full, md, Utf8);
    }

    /// <summary>Writes one standalone HTML page with the plots inline.</summary>
    public static void WriteHtml(CheckRun run, string htmlPath, string title)
    {
        var full = Path.GetFullPath(htmlPath);
        var dir = Path.GetDirectoryName(full)!;
        Directory.CreateDirectory(dir);
        var scratch = Directory.CreateTempSubdirectory("speclint-html-");
        try
        {
            var plots = PlotFiles.Write(run, scratch.FullName, "plots");
            var md = MarkdownReport.Render(run, dir, new MarkdownReport.Options(title, Extras: plots));
            File.WriteAllText(full, HtmlReport.Render(md, scratch.FullName, title), Utf8);
        }
        finally
        {
            scratch.Delete(recursive: true);
        }
    }

    /// <summary>Writes SARIF 2.1.0 for code scanning.</summary>
    public static void WriteSarif(CheckRun run, string sarifPath) => WriteSarif(run.Catalog, run.AllFindings.ToList(), sarifPath);

    /// <summary>Writes SARIF 2.1.0 for findings read back from JSON (merged shards): the built-in rules describe them.</summary>
    public static void WriteSarif(IReadOnlyList<Finding> findings, string sarifPath) => WriteSarif(RuleCatalog.BuiltIn, findings, sarifPath);

    private static void WriteSarif(RuleCatalog catalog, IReadOnlyList<Finding> findings, string sarifPath)
    {
        var full = Path.GetFullPath(sarifPath);
        Directory.CreateDirectory(Path.GetDirectoryName(full)!);
        var rules = catalog.Rules;
        var pages = rules.Select(r => r.Descriptor.Id).Select(id => (id, page: catalog.Page(id))).Where(x => x.page is not null).ToDictionary(x => x.id, x => x.page!);
        var houseRules = rules.Select(r => r.Descriptor.Id).Where(catalog.IsHouseRule).ToDictionary(id => id, id => catalog.HouseRuleSource(id)!);
        var options = new SarifOptions(MarkdownReport.ToolVersion) { RulePages = pages, RepositoryRoot = Directory.GetCurrentDirectory(), HouseRuleSources = houseRules };
        File.WriteAllText(full, SarifWriter.Write(rules.Select(r => r.Descriptor), findings, options), Utf8);
    }

    /// <summary>Writes a text file (UTF-8, no byte order mark), creating its folder.</summary>
    public static void WriteText(string path, string text)
    {
        var full = Path.GetFullPath(path);
        Directory.CreateDirectory(Path.GetDirectoryName(full)!);
        File.WriteAllText(full, text, Utf8);
    }

    private static bool UseColor(TextWriter output) =>
        ReferenceEquals(output, Console.Out)
        && !Console.IsOutputRedirected
        && string.IsNullOrEmpty(Environment.GetEnvironmentVariable("NO_COLOR"))
        && !string.Equals(Environment.GetEnvironmentVariable("TERM"), "dumb", StringComparison.Ordinal);
}
