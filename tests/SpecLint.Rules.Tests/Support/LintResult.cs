using System.Collections.Immutable;
using SpecLint.Core.Config;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Tests.Support;

/// <summary>The findings of one inline check, with the markers of the spec text.</summary>
internal sealed record LintResult(MarkedText Spec, SpecOutcome Outcome, RepoConfig Config, bool Corners = false)
{
    public ImmutableArray<Finding> Findings => Outcome.Findings;

    public string Yaml => Spec.Text;

    public IReadOnlyList<Finding> Of(string ruleId) => [.. Findings.Where(f => f.RuleId == ruleId)];

    /// <summary>The one finding of the rule; fails when there is none or more than one.</summary>
    public Finding Single(string ruleId)
    {
        var found = Of(ruleId);
        Assert.True(found.Count == 1, $"expected one '{ruleId}' finding, got {found.Count}:\n" + string.Join("\n", Findings));
        return found[0];
    }

    /// <summary>Asserts the rule reported nothing.</summary>
    public void Clean(string ruleId)
    {
        var found = Of(ruleId);
        Assert.True(found.Count == 0, $"expected no '{ruleId}' finding, got:\n" + string.Join("\n", found));
    }

    /// <summary>The one finding of the rule, asserted to sit at the spec's single marker with the given severity.</summary>
    public Finding SingleAtMark(string ruleId, Severity severity)
    {
        var f = Single(ruleId);
        Assert.Equal(severity, f.Severity);
        Assert.Equal(Spec.Mark, (f.Line, f.Column));
        Assert.Equal(Lint.SpecFile, f.File);
        return f;
    }

    /// <summary>Applies the finding's fix to the spec text, re-checks, and asserts the finding is gone and no new error appeared.</summary>
    public LintResult ApplyFixAndRecheck(Finding finding)
    {
        ArgumentNullException.ThrowIfNull(finding);
        var fix = Assert.IsType<FixSuggestion>(finding.Fix);
        var fixedYaml = Lint.ApplyFix(Yaml, fix);
        Assert.NotEqual(Yaml, fixedYaml);
        var again = new LintResult(MarkedText.Parse(fixedYaml), CheckRunner.CheckSpec(Lint.Load(fixedYaml), Config, new CheckOptions { Today = Lint.Today, Tolerances = Corners }), Config, Corners);
        again.Clean(finding.RuleId);
        var before = Findings.Where(f => f.Severity == Severity.Error).Select(f => f.RuleId).ToHashSet(StringComparer.Ordinal);
        var newErrors = again.Findings.Where(f => f.Severity == Severity.Error && !before.Contains(f.RuleId)).ToList();
        Assert.True(newErrors.Count == 0, "the fix brought new errors:\n" + string.Join("\n", newErrors));
        return again;
    }
}
