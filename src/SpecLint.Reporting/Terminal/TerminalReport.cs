using System.Globalization;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Terminal;

/// <summary>
/// The terminal output of references.md §D6: one line per finding, <c>file:line:col: severity rule-id: message</c>,
/// then a summary. Colour only on a terminal and never when NO_COLOR is set.
/// </summary>
internal static class TerminalReport
{
    /// <summary>Writes the findings and the summary.</summary>
    public static void Write(CheckRun run, TextWriter output, bool color, bool outputFailed = false)
    {
        ArgumentNullException.ThrowIfNull(run);
        ArgumentNullException.ThrowIfNull(output);
        foreach (var f in run.RunProblems.Concat(run.Specs.SelectMany(s => s.Findings)))
        {
            output.WriteLine(Line(f, color));
        }

        output.WriteLine(Summary(run, outputFailed));
    }

    /// <summary>One finding as a line, optionally with the severity coloured.</summary>
    public static string Line(Finding f, bool color)
    {
        ArgumentNullException.ThrowIfNull(f);
        if (!color)
        {
            return f.ToString();
        }

        var code = f.Waived ? "2" : f.Severity switch { Severity.Error => "1;31", Severity.Warning => "33", _ => "36" };
        return $"{f.File}:{f.Line}:{f.Column}: \u001b[{code}m{f.Severity.Name()}\u001b[0m {f.RuleId}: {f.Message}{(f.Waived ? " (waived: " + f.WaiverReason + ")" : "")}";
    }

    /// <summary>The closing summary line(s).</summary>
    /// <param name="run">The run.</param>
    /// <param name="outputFailed">True when a report file could not be written (already reported); the result is then "fail".</param>
    public static string Summary(CheckRun run, bool outputFailed = false)
    {
        ArgumentNullException.ThrowIfNull(run);
        var all = run.AllFindings.ToList();
        int Count(Severity s) => all.Count(f => !f.Waived && f.Severity == s);
        var waived = all.Count(f => f.Waived);
        var specs = run.Specs.Length;
        var unreadable = run.Specs.Count(s => s.IsUnreadable);
        var invalid = run.Specs.Count(s => s.IsUnusable && !s.IsUnreadable);
        var text = string.Create(CultureInfo.InvariantCulture,
            $"{specs} spec{(specs == 1 ? "" : "s")} checked: {Count(Severity.Error)} error{Plural(Count(Severity.Error))}, {Count(Severity.Warning)} warning{Plural(Count(Severity.Warning))}, {Count(Severity.Note)} note{Plural(Count(Severity.Note))}");
        if (waived > 0)
        {
            text += string.Create(CultureInfo.InvariantCulture, $", {waived} waived");
        }

        if (invalid > 0)
        {
            text += string.Create(CultureInfo.InvariantCulture, $"; {invalid} spec{Plural(invalid)} invalid");
        }

        if (unreadable > 0)
        {
            text += string.Create(CultureInfo.InvariantCulture, $"; {unreadable} file{Plural(unreadable)} could not be read");
        }

        var verdict = outputFailed ? "fail: an output could not be written" : run.ExitCode switch
        {
            ExitCodes.Clean => $"pass (fail level: {run.FailOn.Name()})",
            ExitCodes.FindingsAtFailLevel => $"fail: findings at or above '{run.FailOn.Name()}'",
            _ => "fail: unusable input",
        };
        return text + "." + Environment.NewLine + "Result: " + verdict + ". SpecLint is a design aid: verify on the bench.";
    }

    private static string Plural(int n) => n == 1 ? "" : "s";
}
