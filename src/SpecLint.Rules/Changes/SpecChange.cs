using System.Collections.Immutable;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Changes;

/// <summary>One spec file's change: its status, both versions' outcomes and its findings by class.</summary>
/// <param name="Status">added, changed, renamed or deleted.</param>
/// <param name="File">The head path (for a deleted spec, its base path), relative to the working directory.</param>
/// <param name="PreviousFile">The base path when it differs (renames), else null.</param>
/// <param name="Before">The base version checked, or null (added, or the base version did not load).</param>
/// <param name="After">The head version checked, or null (deleted).</param>
/// <param name="Findings">New, resolved and unchanged findings.</param>
/// <param name="BaseProblems">Why the base version could not be used (it is not a valid spec), else empty.</param>
internal sealed record SpecChange(
    ChangeStatus Status,
    string File,
    string? PreviousFile,
    SpecOutcome? Before,
    SpecOutcome? After,
    FindingClasses Findings,
    ImmutableArray<Finding> BaseProblems)
{
    /// <summary>The base figures (for more than one gain, the first setting's), or null.</summary>
    public MetricSnapshot? MetricsBefore => MetricSnapshot.Of(Before);

    /// <summary>The head figures (for more than one gain, the first setting's), or null.</summary>
    public MetricSnapshot? MetricsAfter => MetricSnapshot.Of(After);

    /// <summary>The gain settings of either version, paired by name; empty when neither has more than one gain.</summary>
    public ImmutableArray<SettingChange> Settings => SettingChange.Pair(Before, After);

    /// <summary>The spec's name on the head, else at the base, else the file name.</summary>
    public string Name => After?.Spec?.Name ?? Before?.Spec?.Name ?? Path.GetFileName(File);
}
