using System.Globalization;
using SpecLint.Reporting.Markdown;
using SpecLint.Reporting.Model;
using SpecLint.Reporting.Plots;
using SpecLint.Rules.Changes;

namespace SpecLint.Reporting.Changes;

/// <summary>The "What this change does" section that opens the Markdown report (and so the job summary) of a comparison with a base.</summary>
internal static class ChangesMarkdown
{
    public const string Heading = "## What this change does";

    /// <summary>The section's lines; <paramref name="extras"/> holds the base-and-head charts by <see cref="ChangePlots.LinkKey"/>.</summary>
    public static IEnumerable<string> Lines(ReportData run, IReadOnlyDictionary<string, string>? extras = null)
    {
        ArgumentNullException.ThrowIfNull(run);
        if (run.Changes is not { } changes)
        {
            yield break;
        }

        yield return Heading;
        yield return "";
        var count = changes.Specs.Length;
        yield return string.Create(CultureInfo.InvariantCulture,
            $"Compared with `{MarkdownText.Cell(changes.Ref)}` (merge base `{changes.ShortBase}`): {count} spec{(count == 1 ? "" : "s")} changed{(changes.AllSpecs ? "; the configuration or the house rules changed, so every spec was re-checked" : "")}. Gate: {(changes.Gate == Gate.New ? "only new findings fail the run" : "every finding in the changed specs counts")}.");
        yield return "";
        foreach (var n in changes.BaseNotes)
        {
            yield return $"> **Note** `{MarkdownText.Cell(n.File)}:{n.Line}:{n.Column}`: {MarkdownText.Cell(n.Message)}";
            yield return "";
        }

        if (count == 0)
        {
            yield break;
        }

        yield return "| Spec | Status | New | Resolved | Unchanged |";
        yield return "|---|---|---:|---:|---:|";
        foreach (var c in changes.Specs)
        {
            var file = MarkdownText.Cell(c.File) + (c.PreviousFile is null ? "" : " (from " + MarkdownText.Cell(c.PreviousFile) + ")");
            yield return string.Create(CultureInfo.InvariantCulture,
                $"| {MarkdownText.Cell(c.Name)}<br>{file} | {c.Status.Name()} | {c.New.Length} | {c.Resolved.Length} | {c.Unchanged} |");
        }

        yield return "";
        var deltas = changes.Specs.SelectMany(c => c.Deltas.Select(r => (c, r))).ToList();
        if (deltas.Count > 0)
        {
            yield return "| Spec | Figure | Before | After | Change |";
            yield return "|---|---|---:|---:|---:|";
            foreach (var (c, r) in deltas)
            {
                yield return $"| {MarkdownText.Cell(c.Name)} | {r.Metric} | {MarkdownText.Cell(r.Before)} | {MarkdownText.Cell(r.After)} | {MarkdownText.Cell(r.Change)} |";
            }

            yield return "";
        }

        foreach (var c in changes.Specs)
        {
            var plots = extras?.GetValueOrDefault(ChangePlots.LinkKey(c.File));
            if (c.New.Length + c.Resolved.Length + c.BaseProblems.Length == 0 && plots is null)
            {
                continue;
            }

            yield return $"**{MarkdownText.Cell(c.Name)}**";
            yield return "";
            foreach (var f in c.New)
            {
                yield return $"- new: `{f.RuleId}` at line {f.Line}: {MarkdownText.Cell(f.Message)}";
            }

            foreach (var f in c.Resolved)
            {
                yield return $"- resolved: `{f.RuleId}`: {MarkdownText.Cell(f.Message)}";
            }

            foreach (var p in c.BaseProblems)
            {
                yield return $"- the base version is not a valid spec (line {p.Line}): {MarkdownText.Cell(p.Message)}";
            }

            yield return "";
            if (plots is not null)
            {
                yield return plots.TrimEnd('\n');
                yield return "";
            }
        }
    }
}
