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
        var ruleSources = houseRules && configFile is not null ? HouseRuleMatchers(changes, configFile) : [];
        foreach (var path in changes.Files.SelectMany(f => new[] { f.Path, f.PreviousPath }).OfType<string>())
        {
            if (Path.GetFileName(path) == RepoConfig.FileName || path == configRepoPath || ruleSources.Any(m => m(path)))
            {
                return true;
            }
        }

        return false;
    }

    private static List<Func<string, bool>> HouseRuleMatchers(GitChangeSet changes, string configFile)
    {
        var config = RepoConfigLoader.Load(configFile).Config;
        var folder = changes.RepoPath(Path.GetDirectoryName(Path.GetFullPath(configFile))!) is { } f && f != "." ? f + "/" : "";
        var entries = config.HouseRules.IsDefaultOrEmpty ? [RepoConfig.DefaultHouseRuleFolder] : config.HouseRules.ToList();
        var matchers = new List<Func<string, bool>>();
        foreach (var entry in entries)
        {
            var e = entry.Replace('\\', '/');
            e = e.StartsWith("./", StringComparison.Ordinal) ? e[2..] : e.TrimStart('/');
            if (e.IndexOfAny(['*', '?']) >= 0)
            {
                var glob = new GlobPattern(e);
                matchers.Add(p => p.StartsWith(folder, StringComparison.Ordinal) && glob.IsMatch(p[folder.Length..]));
            }
            else
            {
                var prefix = folder + e.TrimEnd('/') + "/";
                matchers.Add(p => p.StartsWith(prefix, StringComparison.Ordinal) || p == prefix.TrimEnd('/'));
            }
        }

        return matchers;
    }
}
