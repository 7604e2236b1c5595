using System.Globalization;
using SpecLint.Rules.Changes;
using SpecLint.Rules.Checking;

namespace SpecLint.Reporting.Changes;

/// <summary>The terminal lines of a comparison with a base, and of the accepted-findings file's stale entries.</summary>
internal static class ChangesText
{
    public static IEnumerable<string> Lines(CheckRun run)
    {
        ArgumentNullException.ThrowIfNull(run);
        if (run.Changes is { } changes)
        {
            var count = changes.Specs.Length;
            yield return string.Create(CultureInfo.InvariantCulture,
                $"Against {changes.Ref} (merge base {changes.ShortBase}): {count} spec{(count == 1 ? "" : "s")} changed{(changes.AllSpecs ? " (configuration or house rules changed: every spec re-checked)" : "")}; gate: {(run.Gate == Gate.New ? "new findings only" : "all findings")}.");
            foreach (var n in changes.BaseNotes)
            {
                yield return $"  {n.File}:{n.Line}:{n.Column}: note {n.RuleId}: {n.Message}";
            }

            foreach (var c in changes.Specs)
            {
                var from = c.PreviousFile is null ? "" : $" (from {c.PreviousFile})";
                yield return string.Create(CultureInfo.InvariantCulture,
                    $"  {c.Status.Name()} {c.File}{from}: {c.Findings.New.Length} new, {c.Findings.Resolved.Length} resolved, {c.Findings.Unchanged.Length} unchanged finding{(c.Findings.Unchanged.Length == 1 ? "" : "s")}");
                foreach (var row in DeltaRows.For(c))
                {
                    yield return $"    {row.Metric}: {row.Before} → {row.After}{(row.Change.Length > 0 ? $" ({row.Change})" : "")}";
                }

                foreach (var p in c.BaseProblems)
                {
                    yield return $"    base version is not a valid spec, so nothing is compared: {p.File}:{p.Line}:{p.Column}: {p.Message}";
                }
            }
        }

        if (run.Acceptance is { } accepted)
        {
            foreach (var n in accepted.StaleNotes)
            {
                yield return string.Create(CultureInfo.InvariantCulture, $"{n.File}:{n.Line}:{n.Column}: note {n.RuleId}: {n.Message}");
            }
        }
    }
}
