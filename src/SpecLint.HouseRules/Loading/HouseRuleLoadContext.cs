using System.Reflection;
using System.Runtime.Loader;

namespace SpecLint.HouseRules.Loading;

/// <summary>
/// A collectible load context for one compiled set of house rules. It resolves nothing itself, so SpecLint's
/// own assemblies and the framework come from the default context and <c>IRule</c> is one type on both sides.
/// </summary>
internal sealed class HouseRuleLoadContext() : AssemblyLoadContext("speclint-house-rules", isCollectible: true)
{
    protected override Assembly? Load(AssemblyName assemblyName) => null;
}
