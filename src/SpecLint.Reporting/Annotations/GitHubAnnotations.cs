using System.Globalization;
using System.Text;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Annotations;

/// <summary>
/// GitHub Actions workflow commands (<c>::error file=…,line=…,col=…,title=…::message</c>) so findings show on the
/// pull request's changed lines. Escaping follows the Actions toolkit (<c>packages/core/src/command.ts</c>).
/// </summary>
/// <remarks>
/// <para>Waived findings are not annotated: a live waiver is a reviewed decision recorded in the spec, and repeating
/// it on every pull request would teach people to ignore annotations. They stay visible in the report, the job
/// summary and SARIF (as suppressions).</para>
/// <para>GitHub shows at most 10 error and 10 warning annotations per step. Every line is printed anyway, most
/// serious first, because the raw log is still complete; when the limit is passed a plain note says where to find
/// the rest (the job summary and the log).</para>
/// </remarks>
internal static class GitHubAnnotations
{
    /// <summary>Error annotations GitHub shows per step.</summary>
    public const int ErrorLimitPerStep = 10;

    /// <summary>Warning annotations GitHub shows per step.</summary>
    public const int WarningLimitPerStep = 10;

    /// <summary>Escapes a command's message: % → %25, CR → %0D, LF → %0A, so a message cannot end the command or start another.</summary>
    public static string EscapeData(string value) =>
        (value ?? "").Replace("%", "%25", StringComparison.Ordinal)
            .Replace("\r", "%0D", StringComparison.Ordinal)
            .Replace("\n", "%0A", StringComparison.Ordinal);

    /// <summary>Escapes a property value: as <see cref="EscapeData"/>, plus : → %3A and , → %2C, the property separators.</summary>
    public static string EscapeProperty(string value) =>
        EscapeData(value).Replace(":", "%3A", StringComparison.Ordinal).Replace(",", "%2C", StringComparison.Ordinal);

    /// <summary>The workflow-command name for a severity: error, warning or notice.</summary>
    public static string Command(Severity severity) => severity switch
    {
        Severity.Error => "error",
        Severity.Warning => "warning",
        _ => "notice",
    };

    /// <summary>One annotation line for a finding, or null for a waived one (see remarks).</summary>
    public static string? Format(Finding finding, string? repositoryRoot = null)
    {
        ArgumentNullException.ThrowIfNull(finding);
        if (finding.Waived)
        {
            return null;
        }

        var line = new StringBuilder("::").Append(Command(finding.Severity))
            .Append(" file=").Append(EscapeProperty(RepositoryPath.Relative(finding.File, repositoryRoot)))
            .Append(",line=").Append(Math.Max(1, finding.Line).ToString(CultureInfo.InvariantCulture))
            .Append(",col=").Append(Math.Max(1, finding.Column).ToString(CultureInfo.InvariantCulture))
            .Append(",title=").Append(EscapeProperty("SpecLint " + finding.RuleId))
            .Append("::").Append(EscapeData(Message(finding)));
        return line.ToString();
    }

    /// <summary>
    /// What a run annotates: its findings that are not accepted (compared with a base, only the new ones and the
    /// run's problems, so the diff shows what the change introduced), then each stale entry of the
    /// accepted-findings file as a notice at its line there, so the change that fixed a finding also shows which
    /// entry can go.
    /// </summary>
    public static IReadOnlyList<Finding> Of(CheckRun run)
    {
        ArgumentNullException.ThrowIfNull(run);
        var findings = run.Changes is null ? run.AllFindings : run.Specs.SelectMany(s => s.Findings).Where(run.Changes.IsNew).Concat(run.RunProblems);
        return [.. findings.Where(f => !run.IsAccepted(f)), .. run.Acceptance?.StaleNotes ?? []];
    }

    /// <summary>
    /// Prints one line per unwaived finding, errors first, then warnings and notes, each by file, line and column;
    /// then, when GitHub will hide some, a plain note saying so.
    /// </summary>
    public static AnnotationCounts Write(TextWriter output, IEnumerable<Finding> findings, string? repositoryRoot = null)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(findings);
        var all = findings.ToList();
        var shown = all.Where(f => !f.Waived)
            .OrderByDescending(f => f.Severity)
            .ThenBy(f => RepositoryPath.Relative(f.File, repositoryRoot), StringComparer.Ordinal)
            .ThenBy(f => f.Line)
            .ThenBy(f => f.Column)
            .ThenBy(f => f.RuleId, StringComparer.Ordinal)
            .ThenBy(f => f.Message, StringComparer.Ordinal)
            .ToList();
        foreach (var finding in shown)
        {
            output.Write(Format(finding, repositoryRoot));
            output.Write('\n');
        }

        var counts = new AnnotationCounts(
            shown.Count(f => f.Severity == Severity.Error),
            shown.Count(f => f.Severity == Severity.Warning),
            shown.Count(f => f.Severity == Severity.Note),
            all.Count - shown.Count);
        if (counts.OverGitHubLimit)
        {
            output.Write(string.Create(
                CultureInfo.InvariantCulture,
                $"SpecLint: {counts.Errors} errors and {counts.Warnings} warnings annotated; GitHub shows only {ErrorLimitPerStep} of each per step, so the rest are in this log and the job summary.\n"));
        }

        return counts;
    }

    private static string Message(Finding finding)
    {
        var text = finding.Message.Trim() + finding.SettingSuffix;
        return finding.Fix is { } fix ? $"{text} (suggested: {fix.Path} = {fix.Value})" : text;
    }
}
