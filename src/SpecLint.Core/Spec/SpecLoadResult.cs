using System.Collections.Immutable;
using SpecLint.Core.Spec.Model;

namespace SpecLint.Core.Spec;

/// <summary>The outcome of loading one spec file: the typed spec when the file is valid, and every problem found.</summary>
/// <param name="Spec">The spec, or null when any problem was found.</param>
/// <param name="Diagnostics">All problems, in file order.</param>
internal sealed record SpecLoadResult(TiaSpec? Spec, ImmutableArray<SpecDiagnostic> Diagnostics)
{
    /// <summary>True when the file loaded without a problem.</summary>
    public bool IsValid => Spec is not null && Diagnostics.IsEmpty;

    /// <summary>The file could not be read at all (missing, no permission, too large, not a regular file): nothing was parsed.</summary>
    public bool Unreadable { get; init; }
}
