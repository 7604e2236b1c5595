using System.Collections.Immutable;
using System.Text;
using SpecLint.Core.Config;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Changes;

/// <summary>
/// What each base version is judged by: the base version of the head's configuration file, and the house rules
/// of that configuration at the base. The base's rules are built only when they differ from the head's (a
/// house-rule source changed, or the configuration names other sources or another budget); otherwise the head's
/// catalog is reused, so an unchanged set of rules is never compiled twice.
/// </summary>
/// <param name="changes">The comparison.</param>
/// <param name="options">The check's options: the configuration file given, the built-in catalog and the house-rule source (null: house rules off).</param>
/// <param name="headCatalog">The rules the head was checked with.</param>
internal sealed class BaseConfigs(GitChangeSet changes, CheckOptions options, RuleCatalog headCatalog)
{
    private readonly Dictionary<string, (RepoConfig Config, RuleCatalog Catalog)> _cache = new(StringComparer.Ordinal);
    private readonly Dictionary<string, Func<string, string>> _shownAs = new(StringComparer.Ordinal);
    private readonly List<Finding> _notes = [];

    /// <summary>
    /// Why the base's house rules could not be used (empty when they could), by file, line, column and message:
    /// the order does not depend on which specs a shard met them through.
    /// </summary>
    public ImmutableArray<Finding> Notes => [.. _notes
        .OrderBy(n => n.File, StringComparer.Ordinal).ThenBy(n => n.Line).ThenBy(n => n.Column).ThenBy(n => n.Message, StringComparer.Ordinal)];

    /// <summary>
    /// A base outcome as a reviewer reads it: a finding of a base-only house rule (one that threw, say) names the
    /// rule's file in the repository, not the temporary folder it was built from and that is gone by now.
    /// </summary>
    public SpecOutcome Shown(string specDisplayPath, SpecOutcome outcome)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        if (ConfigFile(specDisplayPath) is not { } full || !_shownAs.TryGetValue(full, out var shownAs))
        {
            return outcome;
        }

        ImmutableArray<Finding> Map(ImmutableArray<Finding> findings) => [.. findings.Select(f => shownAs(f.File) is var file && file != f.File ? f with { File = file } : f)];
        return outcome with
        {
            Findings = Map(outcome.Findings),
            Settings = [.. outcome.Settings.Select(s => s with { Findings = Map(s.Findings) })],
        };
    }

    /// <summary>The configuration and rules for the base version of the spec shown as <paramref name="specDisplayPath"/>.</summary>
    public (RepoConfig Config, RuleCatalog Catalog) For(string specDisplayPath)
    {
        if (ConfigFile(specDisplayPath) is not { } full)
        {
            return (RepoConfig.Default, headCatalog);
        }

        if (_cache.TryGetValue(full, out var cached))
        {
            return cached;
        }

        var result = Load(full);
        _cache[full] = result;
        return result;
    }

    /// <summary>The full path of the configuration file that governs a spec, or null when there is none.</summary>
    private string? ConfigFile(string specDisplayPath)
    {
        var file = options.ConfigPath ?? RepoConfigLoader.FindFor(specDisplayPath)
            ?? RepoConfigLoader.FindFor(Path.Combine(Directory.GetCurrentDirectory(), "_"));
        return file is null ? null : Path.GetFullPath(file);
    }

    private (RepoConfig Config, RuleCatalog Catalog) Load(string full)
    {
        // A configuration outside the repository has no base version: the head's file judges both.
        if (changes.RepoPath(full) is not { } repoPath)
        {
            return (RepoConfigLoader.Load(full).Config, headCatalog);
        }

        if (changes.BaseBytes(repoPath) is not { } bytes)
        {
            // No configuration at the base, so no house rules there either.
            return (RepoConfig.Default, options.HouseRules is null ? headCatalog : options.Catalog);
        }

        var text = Encoding.UTF8.GetString(bytes);
        var config = RepoConfigLoader.LoadText(text, full).Config;
        if (options.HouseRules is not { } source || !RulesDiffer(full, repoPath, config))
        {
            return (config, headCatalog);
        }

        var set = BaseHouseRules.Load(changes, source, repoPath, text, out var notes, out var shownAs);
        _notes.AddRange(notes);
        if (set is not null)
        {
            _shownAs[full] = shownAs;
        }

        return (config, set is null ? headCatalog : options.Catalog.With(set));
    }

    /// <summary>True when the house rules at the base may differ from the head's for this configuration.</summary>
    private bool RulesDiffer(string full, string repoPath, RepoConfig atBase)
    {
        var head = RepoConfigLoader.Load(full).Config;
        var slash = repoPath.LastIndexOf('/');
        var folder = slash < 0 ? "" : repoPath[..slash];
        return !head.HouseRules.SequenceEqual(atBase.HouseRules, StringComparer.Ordinal)
            || head.HouseRuleBudget != atBase.HouseRuleBudget
            || RecheckScope.TouchesHouseRules(changes, folder, head);
    }
}
