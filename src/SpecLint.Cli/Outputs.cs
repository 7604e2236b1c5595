using SpecLint.Core.Files;
using SpecLint.Core.Text;
using SpecLint.Reporting;
using SpecLint.Reporting.Annotations;
using SpecLint.Reporting.Html;
using SpecLint.Reporting.Json;
using SpecLint.Reporting.Markdown;
using SpecLint.Reporting.Model;
using SpecLint.Reporting.Plots;
using SpecLint.Reporting.Sarif;
using SpecLint.Reporting.Terminal;
using SpecLint.Rules.Accepting;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Cli;

/// <summary>What a run should write besides the terminal output.</summary>
/// <param name="Format">text, json or github.</param>
/// <param name="ReportPath">Markdown report file (plots beside it), or null.</param>
/// <param name="HtmlPath">Standalone HTML report file, or null.</param>
/// <param name="SarifPath">SARIF 2.1.0 file, or null.</param>
/// <param name="Title">The report title.</param>
/// <param name="ShardData">Add the report's data to the JSON output, so 'merge' can write the report of a sharded run.</param>
internal sealed record OutputRequest(string Format, string? ReportPath = null, string? HtmlPath = null, string? SarifPath = null, string Title = ReportTitle.Default, bool ShardData = false);

/// <summary>
/// Writes a run's outputs. Files come first, each written atomically (see <see cref="AtomicFile"/>), so a
/// failure to write is reported before the terminal summary and its "Result" line, and turns the exit code
/// into 2; nothing already on disk is ever left half-written.
/// </summary>
internal static class Outputs
{
    /// <summary>Above this many analysed specs the HTML page links its charts from a folder beside it instead of inlining them.</summary>
    public const int InlineChartLimit = 100;

    /// <summary>Writes everything asked for; returns the run's exit code, or 2 when an output could not be written.</summary>
    public static int Write(CheckRun run, OutputRequest request, TextWriter output, TextWriter error)
    {
        var failed = false;
        void Try(string option, Action write) => failed |= !TryWrite(option, write, error);

        var data = new Lazy<ReportData>(() => ReportData.From(run));
        if (request.ReportPath is not null)
        {
            Try("--report", () => WriteMarkdown(data.Value, request.ReportPath, request.Title));
        }

        if (request.HtmlPath is not null)
        {
            Try("--html", () => WriteHtml(data.Value, request.HtmlPath, request.Title));
        }

        if (request.SarifPath is not null)
        {
            Try("--sarif", () => WriteSarif(run, request.SarifPath));
        }

        if (request.Format == "github")
        {
            Try("GITHUB_STEP_SUMMARY", () => AppendJobSummary(data.Value, request.Title));
        }

        switch (request.Format)
        {
            case "json":
                output.Write(request.ShardData ? ReportDataJson.AddTo(JsonReport.Write(run), data.Value) : JsonReport.Write(run));
                break;
            case "github":
                GitHubAnnotations.Write(output, GitHubAnnotations.Of(run), Directory.GetCurrentDirectory());
                output.WriteLine(TerminalReport.Summary(run, outputFailed: failed));
                break;
            default:
                TerminalReport.Write(run, output, UseColor(output), outputFailed: failed);
                break;
        }

        return failed ? ExitCodes.UnusableInput : run.ExitCode;
    }

    /// <summary>Runs <paramref name="write"/>; an output that cannot be written is reported on <paramref name="error"/> and gives false.</summary>
    public static bool TryWrite(string option, Action write, TextWriter error)
    {
        try
        {
            write();
            return true;
        }
        catch (OutputException e)
        {
            error.WriteLine($"speclint: {option}: {TextSafety.ForTerminal(e.Message)}; nothing was replaced there");
            return false;
        }
    }

    /// <summary>Writes the Markdown report of a run and its plots.</summary>
    public static void WriteMarkdown(CheckRun run, string reportPath, string title) => WriteMarkdown(ReportData.From(run), reportPath, title);

    /// <summary>Writes the HTML report of a run.</summary>
    public static void WriteHtml(CheckRun run, string htmlPath, string title) => WriteHtml(ReportData.From(run), htmlPath, title);

    /// <summary>Writes the Markdown report and its plots (in a "&lt;name&gt;-plots" folder beside it).</summary>
    public static void WriteMarkdown(ReportData run, string reportPath, string title)
    {
        var full = AtomicFile.OutputPath(reportPath);
        var dir = Path.GetDirectoryName(full)!;
        AtomicFile.CreateFolder(reportPath, dir);
        var plotFolder = Path.GetFileNameWithoutExtension(full) + "-plots";
        var plots = PlotFiles.Write(run, dir, plotFolder);
        var md = MarkdownReport.Render(run, dir, new MarkdownReport.Options(title, Extras: plots));
        AtomicFile.WriteAllText(full, md);
    }

    /// <summary>
    /// Writes one HTML page. Up to <see cref="InlineChartLimit"/> specs it is standalone with the charts inline;
    /// above that the charts go to a "&lt;name&gt;-plots" folder beside it and are linked, so the page stays a
    /// size a browser opens (three charts per spec for thousands of specs would be hundreds of megabytes).
    /// </summary>
    public static void WriteHtml(ReportData run, string htmlPath, string title)
    {
        var full = AtomicFile.OutputPath(htmlPath);
        var dir = Path.GetDirectoryName(full)!;
        AtomicFile.CreateFolder(htmlPath, dir);
        var analysed = run.Specs.Count(s => s.Section is not null);
        if (analysed > InlineChartLimit)
        {
            var plotFolder = Path.GetFileNameWithoutExtension(full) + "-plots";
            var linked = PlotFiles.Write(run, dir, plotFolder);
            var linkedMd = MarkdownReport.Render(run, dir, new MarkdownReport.Options(title, Extras: linked));
            AtomicFile.WriteAllText(full, HtmlReport.Render(linkedMd, _ => null, title));
            return;
        }

        var charts = new Dictionary<string, string>(StringComparer.Ordinal);
        var plots = PlotFiles.Build(run, "plots", (file, svg) => charts["plots/" + file] = svg);
        var md = MarkdownReport.Render(run, dir, new MarkdownReport.Options(title, Extras: plots));
        AtomicFile.WriteAllText(full, HtmlReport.Render(md, src => charts.GetValueOrDefault(src), title));
    }

    /// <summary>Writes SARIF 2.1.0 for code scanning.</summary>
    public static void WriteSarif(CheckRun run, string sarifPath) =>
        WriteSarif(run.Catalog, [.. run.AllFindings.Select(f => run.IsAccepted(f) ? Acceptance.AsSuppressed(f, run.Acceptance!.File) : f)], sarifPath);

    /// <summary>
    /// Writes SARIF 2.1.0 for findings read back from JSON (merged shards): the built-in rules and the shards' house
    /// rules describe them, as the catalog of an unsharded run does.
    /// </summary>
    public static void WriteSarif(IReadOnlyList<Finding> findings, IReadOnlyList<ReportHouseRule> houseRules, string sarifPath)
    {
        var builtIn = RuleCatalog.BuiltIn;
        var pages = builtIn.Rules.Select(r => r.Descriptor.Id).Select(id => (id, page: builtIn.Page(id)))
            .Concat(houseRules.Select(h => (id: h.Id, page: h.Page)))
            .Where(x => x.page is not null).ToDictionary(x => x.id, x => x.page!);
        var rules = builtIn.Rules.Select(r => r.Descriptor).Concat(houseRules.Select(h => h.Descriptor));
        WriteSarif(rules, findings, pages, houseRules.ToDictionary(h => h.Id, h => h.Source), sarifPath);
    }

    private static void WriteSarif(RuleCatalog catalog, IReadOnlyList<Finding> findings, string sarifPath)
    {
        var rules = catalog.Rules;
        var pages = rules.Select(r => r.Descriptor.Id).Select(id => (id, page: catalog.Page(id))).Where(x => x.page is not null).ToDictionary(x => x.id, x => x.page!);
        var houseRules = rules.Select(r => r.Descriptor.Id).Where(catalog.IsHouseRule).ToDictionary(id => id, id => catalog.HouseRuleSource(id)!);
        WriteSarif(rules.Select(r => r.Descriptor), findings, pages, houseRules, sarifPath);
    }

    private static void WriteSarif(IEnumerable<RuleDescriptor> rules, IReadOnlyList<Finding> findings, Dictionary<string, string> pages, Dictionary<string, string> houseRules, string sarifPath)
    {
        var options = new SarifOptions(MarkdownReport.ToolVersion) { RulePages = pages, RepositoryRoot = Directory.GetCurrentDirectory(), HouseRuleSources = houseRules };
        AtomicFile.WriteAllText(sarifPath, SarifWriter.Write(rules, findings, options));
    }

    /// <summary>Writes a text file atomically (UTF-8, no byte order mark).</summary>
    public static void WriteText(string path, string text) => AtomicFile.WriteAllText(path, text);

    /// <summary>Appends the report to the job summary file named by the environment, when there is one.</summary>
    private static void AppendJobSummary(ReportData run, string title)
    {
        if (JobSummary.FromEnvironment() is not { } summary)
        {
            return;
        }

        if (FileKinds.Of(summary.Path) is FileKind.Directory or FileKind.Special)
        {
            throw new OutputException(summary.Path, "the job summary must be a regular file");
        }

        var markdown = MarkdownReport.Render(run, Directory.GetCurrentDirectory(), new MarkdownReport.Options(title));
        try
        {
            summary.Append(markdown);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            throw new OutputException(summary.Path, e.Message);
        }
    }

    private static bool UseColor(TextWriter output) =>
        ReferenceEquals(output, Console.Out)
        && !Console.IsOutputRedirected
        && string.IsNullOrEmpty(Environment.GetEnvironmentVariable("NO_COLOR"))
        && !string.Equals(Environment.GetEnvironmentVariable("TERM"), "dumb", StringComparison.Ordinal);
}
