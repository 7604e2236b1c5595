using System.Collections.Immutable;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Changes;

/// <summary>What a <c>check --against</c> found: the base it compared with and every changed spec.</summary>
/// <param name="Ref">The ref as given.</param>
/// <param name="MergeBase">The merge base commit.</param>
/// <param name="Specs">Changed specs, ordinal by file.</param>
/// <param name="AllSpecs">True when a configuration or house-rule change made every spec count as changed.</param>
internal sealed record ChangeReport(string Ref, string MergeBase, ImmutableArray<SpecChange> Specs, bool AllSpecs)
{
    private readonly HashSet<Finding> _new = Specs.SelectMany(s => s.Findings.New).ToHashSet();

    /// <summary>
    /// Notes about the base itself, at positions in its files: its house rules could not be built, so base versions
    /// were judged by the head's. They never fail the run: the change under review did not cause them.
    /// </summary>
    public ImmutableArray<Finding> BaseNotes { get; init; } = [];

    /// <summary>True when <paramref name="finding"/> is on the head only.</summary>
    public bool IsNew(Finding finding) => _new.Contains(finding);

    /// <summary>The merge base shortened for display.</summary>
    public string ShortBase => MergeBase[..Math.Min(12, MergeBase.Length)];
}
