using SpecLint.Core.Config;
using SpecLint.HouseRules;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Cli;

/// <summary>The one place the command line creates the house-rule compiler, and the catalog a command sees from the working folder.</summary>
internal static class HouseRuleSources
{
    public static IHouseRuleSource Create() => new RoslynHouseRuleSource();

    /// <summary>
    /// The built-in rules plus the house rules of the configuration that applies to the working folder (or
    /// <paramref name="configPath"/>), with the problems met while building them.
    /// </summary>
    public static (RuleCatalog Catalog, IReadOnlyList<Finding> Problems, RepoConfig? Config) ForWorkingFolder(string? configPath = null, bool houseRules = true)
    {
        var path = configPath ?? RepoConfigLoader.FindFor(Path.Combine(Directory.GetCurrentDirectory(), "_"));
        if (path is null)
        {
            return (RuleCatalog.BuiltIn, [], null);
        }

        var loaded = RepoConfigLoader.Load(path, Path.GetRelativePath(Directory.GetCurrentDirectory(), path).Replace('\\', '/'));
        if (!houseRules)
        {
            return (RuleCatalog.BuiltIn, [], loaded.Config);
        }

        var set = Create().Load(loaded.Config);
        return (RuleCatalog.BuiltIn.With(set), set.Problems, loaded.Config);
    }
}
