using SpecLint.Core.Config;
using SpecLint.Core.Spec.Model;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Checking;

/// <summary>
/// Runs every enabled rule on one analysed spec, with configuration applied. Fix searches get a check that
/// re-runs the other rules on each candidate, so a suggested value never trades one error for another.
/// </summary>
internal sealed class RuleRunner
{
    private readonly RuleCatalog _catalog;
    private readonly RepoConfig _config;
    private readonly ISpecAnalyzer _analyzer;

    /// <summary>Creates a runner for one configuration.</summary>
    public RuleRunner(RuleCatalog catalog, RepoConfig config, ISpecAnalyzer analyzer)
    {
        _catalog = catalog ?? throw new ArgumentNullException(nameof(catalog));
        _config = config ?? throw new ArgumentNullException(nameof(config));
        _analyzer = analyzer ?? throw new ArgumentNullException(nameof(analyzer));
    }

    /// <summary>The findings of all enabled rules, with configured severities, before waivers.</summary>
    public IReadOnlyList<Finding> Run(SpecAnalysis analysis, bool searchFixes = true)
    {
        ArgumentNullException.ThrowIfNull(analysis);
        HashSet<string>? baseline = null;
        if (searchFixes)
        {
            baseline = ErrorIds(Run(analysis, searchFixes: false));
        }

        var original = analysis.Spec;

        var findings = new List<Finding>();
        foreach (var rule in _catalog.Rules)
        {
            var ruleConfig = ConfigurationBinding.For(_config, rule.Descriptor.Id);
            if (ruleConfig.Off || !AppliesTo(rule.Descriptor.Id, original))
            {
                continue;
            }

            var context = new RuleContext(analysis, _analyzer, rule.Descriptor, ruleConfig, id => ConfigurationBinding.For(_config, id))
            {
                SearchFixes = searchFixes,
                OtherRulesCheck = baseline is null ? null : (candidate, ruleId) => NewErrors(original, candidate, ruleId, baseline),
            };
            foreach (var f in rule.Check(context))
            {
                // The configured severity applies to the rule's own findings; an engine finding about a house rule
                // (it threw, or ran out of time) keeps its own.
                findings.Add(ruleConfig.Severity is { } s && f.RuleId == rule.Descriptor.Id ? f with { Severity = s } : f);
            }
        }

        return findings;
    }

    // `rules: {id: {tags: [medical]}}` limits a rule to specs that carry one of the tags.
    private bool AppliesTo(string ruleId, TiaSpec spec) => AppliesTo(_config, ruleId, spec);

    /// <summary>Whether the configuration lets rule <paramref name="ruleId"/> run on <paramref name="spec"/> (its tags).</summary>
    internal static bool AppliesTo(RepoConfig config, string ruleId, TiaSpec spec) =>
        config.ForRule(ruleId) is not { Tags.IsEmpty: false } settings
        || settings.Tags.Any(t => spec.Tags.Contains(t, StringComparer.Ordinal));

    // A candidate may leave an unrelated error in place (a clipped output is not fixed by Cf), but must not
    // add a new one, nor leave an error that is about the very key being changed: two rules that both want a
    // different Cf must agree on one value.
    private IReadOnlyList<string> NewErrors(TiaSpec original, TiaSpec candidate, string ruleId, HashSet<string> baseline)
    {
        var changed = Fixes.SpecEdits.ChangedPointer(original, candidate);
        var analysis = _analyzer.Analyze(candidate, includeNoise: true, includeCorners: true);
        return [.. Run(analysis, searchFixes: false)
            .Where(f => f.Severity == Severity.Error && f.RuleId != ruleId)
            .Where(f => !baseline.Contains(f.RuleId) || f.Pointer == changed)
            .Select(f => f.RuleId)
            .Distinct(StringComparer.Ordinal)
            .Order(StringComparer.Ordinal)];
    }

    private static HashSet<string> ErrorIds(IEnumerable<Finding> findings) =>
        findings.Where(f => f.Severity == Severity.Error).Select(f => f.RuleId).ToHashSet(StringComparer.Ordinal);
}
