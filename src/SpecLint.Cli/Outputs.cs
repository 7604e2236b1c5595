using System.Text;
using SpecLint.Reporting.Json;
using SpecLint.Reporting.Markdown;
using SpecLint.Reporting.Terminal;
using SpecLint.Rules.Checking;

namespace SpecLint.Cli;

/// <summary>Writes a run's outputs: the chosen terminal format and the report files asked for.</summary>
internal static class Outputs
{
    public static void Write(CheckRun run, string format, TextWriter output, string? reportPath)
    {
        switch (format)
        {
            case "json":
                output.Write(JsonReport.Write(run));
                break;
            default:
                TerminalReport.Write(run, output, UseColor(output));
                break;
        }

        if (reportPath is not null)
        {
            WriteReport(run, reportPath);
        }
    }

    public static void WriteReport(CheckRun run, string reportPath, string title = "SpecLint report")
    {
        var full = Path.GetFullPath(reportPath);
        var dir = Path.GetDirectoryName(full)!;
        Directory.CreateDirectory(dir);
        var md = MarkdownReport.Render(run, dir, new MarkdownReport.Options(title));
        File.WriteAllText(full, md, new UTF8Encoding(false));
    }

    private static bool UseColor(TextWriter output) =>
        ReferenceEquals(output, Console.Out)
        && !Console.IsOutputRedirected
        && string.IsNullOrEmpty(Environment.GetEnvironmentVariable("NO_COLOR"))
        && !string.Equals(Environment.GetEnvironmentVariable("TERM"), "dumb", StringComparison.Ordinal);
}
