using System.Globalization;
using System.Reflection;
using System.Text;
using SpecLint.Reporting.Changes;
using SpecLint.Reporting.Model;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Markdown;

/// <summary>
/// The review report: run context, a summary table of every spec, findings grouped by spec with links to
/// their lines, waived findings, and per-spec metrics. Deterministic: no wall-clock time unless asked.
/// </summary>
internal sealed class MarkdownReport
{
    private readonly ReportData _run;
    private readonly string _reportDirectory;
    private readonly StringBuilder _md = new();

    private MarkdownReport(ReportData run, string reportDirectory)
    {
        _run = run;
        _reportDirectory = reportDirectory;
    }

    /// <summary>Options for the report.</summary>
    /// <param name="Title">The first heading.</param>
    /// <param name="GeneratedAt">A time to print in the run context, or null for none (reruns stay identical).</param>
    /// <param name="Extras">Per-spec Markdown appended after each spec's metrics (plots), by spec file.</param>
    public sealed record Options(string Title = ReportTitle.Default, DateTimeOffset? GeneratedAt = null, IReadOnlyDictionary<string, string>? Extras = null);

    /// <summary>The tool version printed in the run context.</summary>
    public static string ToolVersion =>
        typeof(MarkdownReport).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion.Split('+')[0] ?? "0.0.0";

    /// <summary>Renders the report; links are relative to <paramref name="reportDirectory"/>.</summary>
    public static string Render(CheckRun run, string reportDirectory, Options? options = null) =>
        Render(ReportData.From(run ?? throw new ArgumentNullException(nameof(run))), reportDirectory, options);

    /// <summary>Renders the report of a run or of merged shards; links are relative to <paramref name="reportDirectory"/>.</summary>
    public static string Render(ReportData run, string reportDirectory, Options? options = null)
    {
        ArgumentNullException.ThrowIfNull(run);
        var r = new MarkdownReport(run, Path.GetFullPath(reportDirectory));
        r.Build(options ?? new Options());
        return r._md.ToString();
    }

    private void Build(Options options)
    {
        Line($"# {options.Title}");
        Line();
        foreach (var line in ChangesMarkdown.Lines(_run, options.Extras))
        {
            Line(line);
        }

        RunContext(options);
        Summary();
        Findings();
        Waived();
        foreach (var spec in _run.Specs.Where(s => s.Section is not null))
        {
            SpecSection(spec, options);
        }
    }

    private void RunContext(Options options)
    {
        var files = _run.Specs.Length;
        Line($"SpecLint {ToolVersion} checked {files} spec file{(files == 1 ? "" : "s")}; fail level `{_run.FailOn.Name()}`; " +
             (_run.ConfigFiles.IsEmpty ? "no `.speclint.yaml` (built-in defaults)." : "configuration " + string.Join(", ", _run.ConfigFiles.Select(c => $"`{Rel(c)}`")) + "."));
        if (_run.HouseRules.Length > 0)
        {
            Line();
            Line("House rules of this repository ran beside the built-in rules: " +
                 string.Join(", ", _run.HouseRules.Select(h => $"`{h.Id}` ({Rel(h.Source)})")) + ".");
        }

        if (options.GeneratedAt is { } at)
        {
            Line();
            Line("Generated " + at.ToString("yyyy-MM-dd HH:mm 'UTC'", CultureInfo.InvariantCulture) + ".");
        }

        Line();
        var verdict = _run.ExitCode switch
        {
            ExitCodes.Clean => "**Result: pass.**",
            ExitCodes.FindingsAtFailLevel => "**Result: fail**: findings at or above the fail level.",
            _ => "**Result: fail**: some input could not be read.",
        };
        Line(verdict);
        Line();
        Line("> SpecLint is a design aid. Its figures come from a linear small-signal model of the datasheet values in each spec: verify every channel on the bench. Where a design involves hazardous voltages or laser sources, local codes and licensed practice take precedence.");
        Line();
    }

    private void Summary()
    {
        Line("## Summary");
        Line();
        Line("| Spec | Result | Phase margin | Bandwidth | Input noise (rms) | Output range | Findings |");
        Line("|---|---|---:|---:|---:|---|---|");
        foreach (var s in _run.Specs)
        {
            Line($"| [{MarkdownText.Cell(s.Name)}]({MarkdownText.Target(Rel(s.File))}) | {s.Result} | {s.PhaseMargin} | {s.Bandwidth} | {s.InputNoise} | {s.OutputRange} | {Counts(s)} |");
        }

        Line();
    }

    private static string Counts(ReportSpec s)
    {
        var live = s.Findings.Where(f => !f.Waived).ToList();
        if (live.Count == 0)
        {
            return s.Findings.Any(f => f.Waived) ? "waived only" : "none";
        }

        var parts = new[] { Severity.Error, Severity.Warning, Severity.Note }
            .Select(sev => (sev, n: live.Count(f => f.Severity == sev)))
            .Where(x => x.n > 0)
            .Select(x => string.Create(CultureInfo.InvariantCulture, $"{x.n} {x.sev.Name()}{(x.n == 1 ? "" : "s")}"));
        return string.Join(", ", parts);
    }

    private void Findings()
    {
        Line("## Findings");
        Line();
        var any = false;
        if (!_run.RunProblems.IsEmpty)
        {
            any = true;
            Line("### Run");
            Line();
            foreach (var f in _run.RunProblems)
            {
                FindingLine(f);
            }

            Line();
        }

        foreach (var s in _run.Specs)
        {
            var live = s.Findings.Where(f => !f.Waived).ToList();
            if (live.Count == 0)
            {
                continue;
            }

            any = true;
            Line($"### {MarkdownText.Cell(s.Name)}");
            Line();
            foreach (var f in live)
            {
                FindingLine(f);
            }

            Line();
        }

        if (!any)
        {
            Line("No findings.");
            Line();
        }
    }

    private void Waived()
    {
        var waived = _run.Specs.SelectMany(s => s.Findings.Where(f => f.Waived)).ToList();
        if (waived.Count == 0)
        {
            return;
        }

        Line("## Waived findings");
        Line();
        Line("| Spec | Rule | Where | Reason | Finding |");
        Line("|---|---|---|---|---|");
        foreach (var f in waived)
        {
            Line($"| {MarkdownText.Cell(Path.GetFileName(f.File))} | `{f.RuleId}` | [{MarkdownText.Cell(LineLabel(f))}]({LineLink(f)}) | {MarkdownText.Cell(f.WaiverReason ?? "")} | {MarkdownText.Cell(f.Message)} |");
        }

        Line();
    }

    private void FindingLine(Finding f)
    {
        var fix = f.Fix is { } x ? $" **Fix:** set `{x.Path}` to `{x.Value}`." : "";
        var setting = f.Setting is null ? "" : $" (setting {MarkdownText.Cell(f.Setting)})";
        Line($"- **{f.Severity.Name()}** `{f.RuleId}`{setting} at [{MarkdownText.Cell(LineLabel(f))}]({LineLink(f)}): {MarkdownText.Cell(f.Message)}{fix}");
    }

    private void SpecSection(ReportSpec s, Options options)
    {
        var section = s.Section!;
        Line($"## {MarkdownText.Cell(s.Name)}");
        Line();
        var title = s.Title is { Length: > 0 } t ? MarkdownText.Cell(t) + ". " : "";
        Line($"{title}File [{MarkdownText.Cell(Rel(s.File))}]({MarkdownText.Target(Rel(s.File))}). Nominal values at {section.Temperature} °C; noise at the hottest temperature.");
        Line();
        if (section.Settings.IsDefaultOrEmpty)
        {
            Line("| Metric | Value | Note |");
            Line("|---|---:|---|");
            foreach (var (metric, value, note) in section.Metrics)
            {
                Line($"| {metric} | {MarkdownText.Cell(value)} | {MarkdownText.Cell(note)} |");
            }
        }
        else
        {
            // One column per gain setting.
            Line($"| Metric | {string.Join(" | ", section.Settings.Select(n => "setting " + MarkdownText.Cell(n)))} | Note |");
            Line($"|---|{string.Concat(section.Settings.Select(_ => "---:|"))}---|");
            foreach (var m in section.Metrics)
            {
                Line($"| {m.Metric} | {string.Join(" | ", m.Values.Select(MarkdownText.Cell))} | {MarkdownText.Cell(m.Note)} |");
            }
        }

        Line();
        foreach (var l in section.Corners)
        {
            Line(l);
        }

        if (options.Extras is not null && options.Extras.TryGetValue(s.File, out var extra))
        {
            Line(extra.TrimEnd());
            Line();
        }
    }

    private string LineLabel(Finding f) => $"{Rel(f.File)}:{f.Line}:{f.Column}";

    private string LineLink(Finding f) => MarkdownText.Target(Rel(f.File)) + "#L" + f.Line.ToString(CultureInfo.InvariantCulture);

    private string Rel(string file) => Path.GetRelativePath(_reportDirectory, Path.GetFullPath(file)).Replace('\\', '/');

    private void Line(string text = "") => _md.Append(text).Append('\n');
}
