using SpecLint.Core.Config;

namespace SpecLint.Rules.Checking;

/// <summary>
/// Where a check gets a repository's house rules: compiled (or loaded from the cache) for one configuration.
/// The engine stays free of the compiler; the command line plugs the Roslyn-based source in.
/// </summary>
internal interface IHouseRuleSource
{
    /// <summary>The house rules <paramref name="config"/> names, with every problem found while building them.</summary>
    HouseRuleSet Load(RepoConfig config);
}
