using System.Collections.Immutable;
using Microsoft.CodeAnalysis;
using SpecLint.Rules.Engine;

namespace SpecLint.HouseRules.Compiling;

/// <summary>
/// What house rules compile against: the .NET reference assemblies shipped in a package (so the compile does
/// not depend on which runtime is installed) plus SpecLint's Core and Rules libraries, whose public surface is
/// the rule API.
/// </summary>
internal static class References
{
    private static readonly Lazy<ImmutableArray<MetadataReference>> Lazy = new(Build);

    public static ImmutableArray<MetadataReference> All => Lazy.Value;

    private static ImmutableArray<MetadataReference> Build()
    {
        var speclint = new[] { typeof(IRule).Assembly, typeof(Core.Units.Capacitance).Assembly }
            .Select(a => a.Location)
            .Where(l => l.Length > 0)
            .Select(l => (MetadataReference)MetadataReference.CreateFromFile(l));
        return [.. Basic.Reference.Assemblies.Net100.References.All, .. speclint];
    }
}
