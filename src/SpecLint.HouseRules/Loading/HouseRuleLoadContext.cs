using System.Reflection;
using System.Runtime.Loader;

namespace SpecLint.HouseRules.Loading;

/// <summary>
/// A load context of its own for one compiled set of house rules. It resolves nothing itself, so SpecLint's
/// own assemblies and the framework come from the default context and <c>IRule</c> is one type on both sides.
/// It is not collectible: a run loads a few rule sets and keeps them to its end, and collecting unloaded rule
/// assemblies under the background garbage collector crashed the runtime intermittently in long test runs.
/// </summary>
internal sealed class HouseRuleLoadContext() : AssemblyLoadContext("speclint-house-rules", isCollectible: false)
{
    protected override Assembly? Load(AssemblyName assemblyName) => null;
}
