using SpecLint.Core.Config;
using SpecLint.Rules.Checking;

namespace SpecLint.Rules.Changes;

/// <summary>
/// Decides whether a change touches what every spec is judged by: a <c>.speclint.yaml</c> (or the file given
/// with <c>--config</c>) or a house-rule source of the repository configuration. Then every spec is re-checked.
/// </summary>
internal static class RecheckScope
{
    /// <summary>True when a file in <paramref name="changes"/> is configuration or (with house rules on) a house-rule source.</summary>
    public static bool TouchesEverySpec(GitChangeSet changes, string? configPath, bool houseRules)
    {
        ArgumentNullException.ThrowIfNull(changes);
        var configFile = configPath ?? RepoConfigLoader.FindFor(Path.Combine(Directory.GetCurrentDirectory(), "_"));
        var configRepoPath = configFile is null ? null : changes.RepoPath(configFile);
        var ruleSources = houseRules && configFile is not null
            ? HouseRuleMatchers(changes.RepoPath(Path.GetDirectoryName(Path.GetFullPath(configFile))!) ?? "", RepoConfigLoader.Load(configFile).Config)
            : [];
        foreach (var path in changes.Files.SelectMany(f => new[] { f.Path, f.PreviousPath }).OfType<string>())
        {
            if (Path.GetFileName(path) == RepoConfig.FileName || path == configRepoPath || ruleSources.Any(m => m(path)))
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>
    /// True when a file in <paramref name="changes"/> is a house-rule source of <paramref name="config"/>, whose
    /// entries are relative to <paramref name="folder"/> (the configuration's folder as a repository path, "" for the root).
    /// </summary>
    public static bool TouchesHouseRules(GitChangeSet changes, string folder, RepoConfig config)
    {
        ArgumentNullException.ThrowIfNull(changes);
        var matchers = HouseRuleMatchers(folder, config);
        return changes.Files.SelectMany(f => new[] { f.Path, f.PreviousPath }).OfType<string>().Any(p => matchers.Any(m => m(p)));
    }

    /// <summary>The configuration's folder as a repository path with a trailing slash, "" for the root.</summary>
    public static string FolderPrefix(string folder) => folder.Length == 0 || folder == "." ? "" : folder.TrimEnd('/') + "/";

    /// <summary>
    /// Tests for the repository paths that are house-rule sources of <paramref name="config"/>: its
    /// <c>house-rules</c> folders and globs (or the default folder), relative to <paramref name="folder"/>.
    /// </summary>
    public static List<Func<string, bool>> HouseRuleMatchers(string folder, RepoConfig config)
    {
        ArgumentNullException.ThrowIfNull(config);
        var prefix = FolderPrefix(folder);
        var entries = config.HouseRules.IsDefaultOrEmpty ? [RepoConfig.DefaultHouseRuleFolder] : config.HouseRules.ToList();
        var matchers = new List<Func<string, bool>>();
        foreach (var entry in entries)
        {
            var e = entry.Replace('\\', '/');
            e = e.StartsWith("./", StringComparison.Ordinal) ? e[2..] : e.TrimStart('/');
            if (e.IndexOfAny(['*', '?']) >= 0)
            {
                var glob = new GlobPattern(e);
                matchers.Add(p => p.StartsWith(prefix, StringComparison.Ordinal) && glob.IsMatch(p[prefix.Length..]));
            }
            else
            {
                var under = prefix + e.TrimEnd('/') + "/";
                matchers.Add(p => p.StartsWith(under, StringComparison.Ordinal) || p == under.TrimEnd('/'));
            }
        }

        return matchers;
    }
}
