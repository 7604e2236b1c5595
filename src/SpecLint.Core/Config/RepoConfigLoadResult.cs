using System.Collections.Immutable;
using SpecLint.Core.Spec;

namespace SpecLint.Core.Config;

/// <summary>A loaded configuration and the problems found in it.</summary>
/// <param name="Config">The configuration; defaults replace the parts that were invalid (or everything, for an unreadable file).</param>
/// <param name="Diagnostics">Problems, with the id <c>config-invalid</c>.</param>
internal sealed record RepoConfigLoadResult(RepoConfig Config, ImmutableArray<SpecDiagnostic> Diagnostics)
{
    /// <summary>True when the file had no problem.</summary>
    public bool IsValid => Diagnostics.IsEmpty;
}
