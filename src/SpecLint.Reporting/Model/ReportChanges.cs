using System.Collections.Immutable;
using SpecLint.Reporting.Changes;
using SpecLint.Rules.Changes;
using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Model;

/// <summary>The comparison with a base as the report shows it.</summary>
/// <param name="Ref">The ref as given.</param>
/// <param name="ShortBase">The merge base, shortened.</param>
/// <param name="AllSpecs">True when a configuration or house-rule change re-checked every spec.</param>
/// <param name="Gate">Which findings fail the run.</param>
/// <param name="Specs">The changed specs, ordinal by file.</param>
internal sealed record ReportChanges(string Ref, string ShortBase, bool AllSpecs, Gate Gate, ImmutableArray<ReportChange> Specs)
{
    /// <summary>Notes about the base itself (its house rules did not build), by file and line.</summary>
    public ImmutableArray<Finding> BaseNotes { get; init; } = [];
}

/// <summary>One changed spec as the report shows it.</summary>
/// <param name="File">The head path (the base path for a deleted spec).</param>
/// <param name="PreviousFile">The base path of a rename, else null.</param>
/// <param name="Name">The spec's name.</param>
/// <param name="Status">added, changed, renamed or deleted.</param>
/// <param name="New">Findings on the head only.</param>
/// <param name="Resolved">Findings at the base only.</param>
/// <param name="Unchanged">How many findings are on both.</param>
/// <param name="BaseProblems">Why the base version could not be used.</param>
/// <param name="Deltas">The figures that moved.</param>
/// <param name="Charts">Draws the base-and-head charts when asked; none unless both versions were analysed.</param>
internal sealed record ReportChange(
    string File,
    string? PreviousFile,
    string Name,
    ChangeStatus Status,
    ImmutableArray<Finding> New,
    ImmutableArray<Finding> Resolved,
    int Unchanged,
    ImmutableArray<Finding> BaseProblems,
    ImmutableArray<DeltaRow> Deltas,
    Func<IReadOnlyList<ReportChart>> Charts);
