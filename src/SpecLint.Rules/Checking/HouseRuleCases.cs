using SpecLint.Core.Config;

namespace SpecLint.Rules.Checking;

/// <summary>Recognises the case specs that sit beside house rules (<c>&lt;folder&gt;/&lt;id&gt;/cases/*.tia.yaml</c>).</summary>
internal static class HouseRuleCases
{
    /// <summary>True when <paramref name="file"/> lies in a <c>cases</c> folder inside one of the configuration's house-rule folders.</summary>
    public static bool IsCase(string file, RepoConfig config)
    {
        ArgumentNullException.ThrowIfNull(file);
        ArgumentNullException.ThrowIfNull(config);
        if (config.Folder is not { } root)
        {
            return false;
        }

        var rel = Path.GetRelativePath(root, Path.GetFullPath(file)).Replace('\\', '/');
        var segments = rel.Split('/');
        if (segments.Length < 3 || segments[0] == ".." || !segments[..^1].Contains("cases", StringComparer.Ordinal))
        {
            return false;
        }

        var folders = config.HouseRules.IsEmpty ? [RepoConfig.DefaultHouseRuleFolder] : config.HouseRules;
        return folders.Any(f =>
        {
            var prefix = f.Split(['*', '?', '['])[0].TrimEnd('/');
            return prefix.Length == 0 || rel.StartsWith(prefix + "/", StringComparison.Ordinal);
        });
    }
}
