using System.Collections.Frozen;

namespace SpecLint.HouseRules.Compiling;

/// <summary>
/// What a house rule may use: SpecLint's rule API, and from the base library math, strings, collections,
/// LINQ and formatting. Everything else is refused with the family it belongs to. This is a review aid
/// that keeps rules portable and deterministic; it is not a security boundary (the README says so).
/// </summary>
internal static class AllowList
{
    private static readonly FrozenSet<string> AllowedNamespaces = new[]
    {
        "System",
        "System.Collections",
        "System.Collections.Generic",
        "System.Collections.Immutable",
        "System.Collections.ObjectModel",
        "System.Collections.Frozen",
        "System.Linq",
        "System.Text",
        "System.Text.RegularExpressions",
        "System.Globalization",
        "System.Numerics",
        "System.Diagnostics.CodeAnalysis",
        "SpecLint.Core.Units",
        "SpecLint.Core.Spec.Model",
        "SpecLint.Core.Analysis",
        "SpecLint.Core.Analysis.Tolerance",
        "SpecLint.Rules.Engine",
        "SpecLint.Rules.Fixes",
    }.ToFrozenSet(StringComparer.Ordinal);

    // Types of allowed namespaces that still reach outside the spec, by full name.
    private static readonly FrozenDictionary<string, string> RefusedTypes = new Dictionary<string, string>(StringComparer.Ordinal)
    {
        ["System.Environment"] = ApiFamily.Environment,
        ["System.AppContext"] = ApiFamily.Environment,
        ["System.GC"] = ApiFamily.Environment,
        ["System.TimeZoneInfo"] = ApiFamily.Environment,
        ["System.Console"] = ApiFamily.Console,
        ["System.AppDomain"] = ApiFamily.AssemblyLoading,
        ["System.Activator"] = ApiFamily.Reflection,
        ["System.RuntimeTypeHandle"] = ApiFamily.Reflection,
        ["System.RuntimeMethodHandle"] = ApiFamily.Reflection,
        ["System.RuntimeFieldHandle"] = ApiFamily.Reflection,
        ["System.ArgIterator"] = ApiFamily.Unsafe,
        ["System.TypedReference"] = ApiFamily.Unsafe,
        ["System.RuntimeArgumentHandle"] = ApiFamily.Unsafe,
        ["System.Buffer"] = ApiFamily.Unsafe,
        ["System.TimeProvider"] = ApiFamily.Nondeterminism,
        ["System.Linq.ParallelEnumerable"] = ApiFamily.Threading,
        ["System.Linq.ParallelQuery"] = ApiFamily.Threading,
        ["System.Linq.ParallelQuery`1"] = ApiFamily.Threading,
        ["System.Linq.OrderedParallelQuery`1"] = ApiFamily.Threading,
        ["SpecLint.Rules.Engine.RuleCatalog"] = ApiFamily.Reflection,
    }.ToFrozenDictionary(StringComparer.Ordinal);

    // Members of allowed types that read the clock, draw unseeded random numbers or reach into the runtime.
    private static readonly FrozenDictionary<string, string> RefusedMembers = new Dictionary<string, string>(StringComparer.Ordinal)
    {
        ["System.DateTime.Now"] = ApiFamily.Nondeterminism,
        ["System.DateTime.UtcNow"] = ApiFamily.Nondeterminism,
        ["System.DateTime.Today"] = ApiFamily.Nondeterminism,
        ["System.DateTimeOffset.Now"] = ApiFamily.Nondeterminism,
        ["System.DateTimeOffset.UtcNow"] = ApiFamily.Nondeterminism,
        ["System.Random.Shared"] = ApiFamily.Nondeterminism,
        ["System.Guid.NewGuid"] = ApiFamily.Nondeterminism,
        ["System.Guid.CreateVersion7"] = ApiFamily.Nondeterminism,
        ["System.Delegate.Method"] = ApiFamily.Reflection,
        ["System.Delegate.DynamicInvoke"] = ApiFamily.Reflection,
        ["System.Delegate.CreateDelegate"] = ApiFamily.Reflection,
        ["System.MulticastDelegate.GetInvocationList"] = ApiFamily.Reflection,
        ["System.Type.*"] = ApiFamily.Reflection,
    }.ToFrozenDictionary(StringComparer.Ordinal);

    /// <summary>
    /// Null when a member of <paramref name="typeFullName"/> (namespace <paramref name="ns"/>) named
    /// <paramref name="member"/> may be used; otherwise the family that refuses it.
    /// </summary>
    public static string? Judge(string ns, string typeFullName, string? member)
    {
        if (RefusedTypes.TryGetValue(typeFullName, out var family))
        {
            return family;
        }

        if (member is not null)
        {
            if (RefusedMembers.TryGetValue(typeFullName + "." + member, out var m) || RefusedMembers.TryGetValue(typeFullName + ".*", out m))
            {
                return m;
            }
        }

        return AllowedNamespaces.Contains(ns) ? null : FamilyOf(ns, typeFullName);
    }

    private static string FamilyOf(string ns, string typeFullName)
    {
        static bool Under(string ns, string root) => ns == root || ns.StartsWith(root + ".", StringComparison.Ordinal);

        if (typeFullName is "System.Reflection.Assembly" or "System.Reflection.AssemblyName" || Under(ns, "System.Runtime.Loader"))
        {
            return ApiFamily.AssemblyLoading;
        }

        if (typeFullName == "System.Runtime.CompilerServices.Unsafe" || Under(ns, "System.Runtime.Intrinsics"))
        {
            return ApiFamily.Unsafe;
        }

        return ns switch
        {
            _ when Under(ns, "System.IO") => ApiFamily.Files,
            _ when Under(ns, "System.Net") => ApiFamily.Network,
            _ when Under(ns, "System.Diagnostics") => ApiFamily.Processes,
            _ when Under(ns, "System.Reflection") || Under(ns, "System.Linq.Expressions") || Under(ns, "System.Runtime.Serialization") => ApiFamily.Reflection,
            _ when Under(ns, "System.Threading") => ApiFamily.Threading,
            _ when Under(ns, "System.Runtime.InteropServices") => ApiFamily.Native,
            _ when Under(ns, "Microsoft.CSharp") => ApiFamily.Dynamic,
            _ when Under(ns, "Microsoft.Win32") => ApiFamily.Environment,
            _ => ApiFamily.NotAllowed,
        };
    }
}
