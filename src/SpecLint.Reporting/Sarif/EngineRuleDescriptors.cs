using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Sarif;

/// <summary>
/// Descriptors for the ids the engine reports under itself (<see cref="RuleIds.EngineIds"/>): they have no rule
/// class, but SARIF needs a driver rule for every result, and code scanning shows its text.
/// </summary>
internal static class EngineRuleDescriptors
{
    /// <summary>All engine descriptors, by id.</summary>
    public static IReadOnlyDictionary<string, RuleDescriptor> All { get; } = new Dictionary<string, RuleDescriptor>(StringComparer.Ordinal)
    {
        [RuleIds.SpecInvalid] = new(RuleIds.SpecInvalid, "The spec file is readable: YAML syntax, schema and units", Severity.Error),
        [RuleIds.ConfigInvalid] = new(RuleIds.ConfigInvalid, "The repository configuration file is readable", Severity.Error),
        [RuleIds.WaiverExpired] = new(RuleIds.WaiverExpired, "Waivers in the spec have not passed their expiry date", Severity.Error),
        [RuleIds.WaiverUnmatched] = new(RuleIds.WaiverUnmatched, "Every live waiver still matches a finding", Severity.Warning),
        [RuleIds.AnalysisFailed] = new(RuleIds.AnalysisFailed, "The circuit analysis produced a result for the spec", Severity.Error),
        [RuleIds.NoSpecs] = new(RuleIds.NoSpecs, "The check found at least one spec file", Severity.Error),
    };

    /// <summary>The descriptor of an engine id, or null for any other id.</summary>
    public static RuleDescriptor? Find(string id) => All.TryGetValue(id, out var d) ? d : null;
}
