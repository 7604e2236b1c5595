using System.Collections.Immutable;
using SpecLint.Core.Spec;

namespace SpecLint.Core.Config;

/// <summary>The repository configuration <c>.speclint.yaml</c> (references.md §D8), with defaults for what it leaves out.</summary>
/// <param name="Path">The file it was read from, or null for the built-in defaults.</param>
/// <param name="Include">Glob patterns of spec files, relative to the configuration's folder.</param>
/// <param name="FailOn">Lowest severity that fails the run (never <see cref="ConfigSeverity.Off"/>).</param>
/// <param name="MonteCarlo">Monte Carlo settings.</param>
/// <param name="Rules">Per-rule settings by rule id.</param>
/// <param name="Locations">Where each key sits in the file.</param>
internal sealed record RepoConfig(
    string? Path,
    ImmutableArray<string> Include,
    ConfigSeverity FailOn,
    MonteCarloSettings MonteCarlo,
    ImmutableDictionary<string, RuleSettings> Rules,
    SourceMap Locations)
{
    /// <summary>The folder name looked for when <c>house-rules</c> is not written.</summary>
    public const string DefaultHouseRuleFolder = "house-rules/";

    /// <summary>The run-time budget of one house rule on one spec when <c>house-rule-budget</c> is not written.</summary>
    public static readonly TimeSpan DefaultHouseRuleBudget = TimeSpan.FromSeconds(2);

    /// <summary>
    /// Folders or globs of house-rule C# files, relative to the configuration's folder, as written under
    /// <c>house-rules</c>; empty when the key is absent (then <see cref="DefaultHouseRuleFolder"/> is used if it exists).
    /// </summary>
    public ImmutableArray<string> HouseRules { get; init; } = [];

    /// <summary>Glob patterns of files left out of a folder check, relative to the configuration's folder.</summary>
    public ImmutableArray<string> Exclude { get; init; } = [];

    /// <summary>How long one house rule may run on one spec before it is stopped.</summary>
    public TimeSpan HouseRuleBudget { get; init; } = DefaultHouseRuleBudget;

    /// <summary>The folder that holds this configuration file, or null for the built-in defaults.</summary>
    public string? Folder => Path is null ? null : System.IO.Path.GetDirectoryName(System.IO.Path.GetFullPath(Path));

    /// <summary>The file name looked for when walking up from a spec.</summary>
    public const string FileName = ".speclint.yaml";

    /// <summary>The default include pattern.</summary>
    public const string DefaultInclude = "**/*.tia.yaml";

    /// <summary>The configuration used when no file is found: <c>**/*.tia.yaml</c>, fail on error, 1000 samples, seed 1.</summary>
    public static RepoConfig Default { get; } = new(null, [DefaultInclude], ConfigSeverity.Error, MonteCarloSettings.Default,
        ImmutableDictionary<string, RuleSettings>.Empty.WithComparers(StringComparer.Ordinal), SourceMap.Empty);

    /// <summary>The settings of a rule, or null when the configuration does not mention it.</summary>
    public RuleSettings? ForRule(string ruleId) => Rules.GetValueOrDefault(ruleId);
}
