namespace SpecLint.Rules.Engine;

/// <summary>
/// Ids the engine itself reports under (the rules' ids live on their descriptors). Ids are what users type
/// in waivers and configuration: once published, never reuse or rename one.
/// </summary>
public static class RuleIds
{
    /// <summary>A spec file that cannot be read: YAML syntax, schema, units (references.md §D7).</summary>
    public const string SpecInvalid = "spec-invalid";

    /// <summary>A repository configuration file that cannot be read.</summary>
    public const string ConfigInvalid = "config-invalid";

    /// <summary>A waiver whose expiry date has passed (references.md §D7).</summary>
    public const string WaiverExpired = "waiver-expired";

    /// <summary>A live waiver that matched no finding: probably stale.</summary>
    public const string WaiverUnmatched = "waiver-unmatched";

    /// <summary>The analysis could not produce a result for a spec (a numerical failure, reported, not thrown).</summary>
    public const string AnalysisFailed = "analysis-failed";

    /// <summary>A check that found no spec file at all: a wrong path or include glob must not pass silently.</summary>
    public const string NoSpecs = "no-specs";

    /// <summary>A house rule that does not compile, or a house-rule folder that cannot be used (at the .cs line).</summary>
    public const string HouseRuleInvalid = "house-rule-invalid";

    /// <summary>A house rule that uses an API outside the allow-list (files, network, processes, reflection, ...).</summary>
    public const string HouseRuleForbidden = "house-rule-forbidden";

    /// <summary>A house rule that ran past its time budget on a spec and was stopped.</summary>
    public const string HouseRuleBudget = "house-rule-budget";

    /// <summary>A house rule that threw while checking a spec (at the .cs line of the throw).</summary>
    public const string HouseRuleFailed = "house-rule-failed";

    /// <summary>The house-rule ids: at error level they make the input unusable (exit 2), and they cannot be waived.</summary>
    public static IReadOnlyList<string> HouseRuleIds { get; } = [HouseRuleInvalid, HouseRuleForbidden, HouseRuleBudget, HouseRuleFailed];

    /// <summary>All engine ids.</summary>
    public static IReadOnlyList<string> EngineIds { get; } =
        [SpecInvalid, ConfigInvalid, WaiverExpired, WaiverUnmatched, AnalysisFailed, NoSpecs, HouseRuleInvalid, HouseRuleForbidden, HouseRuleBudget, HouseRuleFailed];
}
