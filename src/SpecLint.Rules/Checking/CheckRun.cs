using System.Collections.Immutable;
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

    /// <summary>Every finding of the run, spec findings first.</summary>
    public IEnumerable<Finding> AllFindings => Specs.SelectMany(s => s.Findings).Concat(RunProblems);

    /// <summary>
    /// references.md §D5: 2 when any input was unusable (other files were still checked), 1 when an unwaived
    /// finding is at or above the fail level, 0 otherwise.
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

            return AllFindings.Any(f => !f.Waived && f.Severity >= FailOn) ? ExitCodes.FindingsAtFailLevel : ExitCodes.Clean;
        }
    }
}
