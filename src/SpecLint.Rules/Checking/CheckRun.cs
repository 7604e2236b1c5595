using System.Collections.Immutable;
using SpecLint.Rules.Accepting;
using SpecLint.Rules.Changes;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Checking;

/// <summary>The result of one <c>check</c>: every spec's outcome plus problems outside any spec.</summary>
/// <param name="Specs">Outcomes in file order.</param>
/// <param name="RunProblems">Findings that belong to no spec: configuration errors, paths that do not exist.</param>
/// <param name="FailOn">The lowest severity that fails the run.</param>
/// <param name="ConfigFiles">The configuration files used (for the report's run context).</param>
internal sealed record CheckRun(
    ImmutableArray<SpecOutcome> Specs,
    ImmutableArray<Finding> RunProblems,
    Severity FailOn,
    ImmutableArray<string> ConfigFiles)
{
    /// <summary>The rules the run used: the built-in rules plus the house rules of every configuration it read.</summary>
    public RuleCatalog Catalog { get; init; } = RuleCatalog.BuiltIn;

    /// <summary>The comparison with a base (<c>--against</c>), or null for a plain check.</summary>
    public ChangeReport? Changes { get; init; }

    /// <summary>Which findings can fail the run when <see cref="Changes"/> is set.</summary>
    public Gate Gate { get; init; } = Gate.All;

    /// <summary>Findings accepted in a committed file (<c>--accepted</c>), or null.</summary>
    public Acceptance? Acceptance { get; init; }

    /// <summary>True when <paramref name="finding"/> was accepted in the accepted-findings file.</summary>
    public bool IsAccepted(Finding finding) => Acceptance?.Covers(finding) ?? false;

    /// <summary>
    /// True when a spec finding can fail the run: not waived, not accepted, and, under <c>--gate new</c>, new
    /// in this change.
    /// </summary>
    public bool Gates(Finding finding)
    {
        ArgumentNullException.ThrowIfNull(finding);
        return !finding.Waived && !IsAccepted(finding) && (Gate == Gate.All || Changes is null || Changes.IsNew(finding));
    }

    /// <summary>Every finding of the run, spec findings first.</summary>
    public IEnumerable<Finding> AllFindings => Specs.SelectMany(s => s.Findings).Concat(RunProblems);

    /// <summary>
    /// references.md §D5: 2 when any input was unusable (other files were still checked), 1 when a finding that
    /// <see cref="Gates"/> the run (or an unwaived run problem) is at or above the fail level, 0 otherwise.
    /// </summary>
    public int ExitCode
    {
        get
        {
            if (RunProblems.Any(f => f.Severity == Severity.Error && !f.Waived) || Specs.Any(s => s.IsUnusable)
                || AllFindings.Any(f => f.Severity == Severity.Error && RuleIds.HouseRuleIds.Contains(f.RuleId)))
            {
                return ExitCodes.UnusableInput;
            }

            var failing = Specs.SelectMany(s => s.Findings).Where(Gates).Concat(RunProblems.Where(f => !f.Waived));
            return failing.Any(f => f.Severity >= FailOn) ? ExitCodes.FindingsAtFailLevel : ExitCodes.Clean;
        }
    }
}
