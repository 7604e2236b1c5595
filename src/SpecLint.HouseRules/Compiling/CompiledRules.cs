using System.Collections.Immutable;

namespace SpecLint.HouseRules.Compiling;

/// <summary>What compiling a folder of house rules produced: the assembly (when it compiled) and every problem.</summary>
/// <param name="Image">The instrumented assembly, or null when there were errors.</param>
/// <param name="Symbols">Its portable PDB (for the .cs line of a throw), or null.</param>
/// <param name="Problems">Errors and warnings at their source positions.</param>
/// <param name="Rules">The classes that implement IRule.</param>
internal sealed record CompiledRules(byte[]? Image, byte[]? Symbols, ImmutableArray<CompileProblem> Problems, ImmutableArray<DeclaredType> Rules);
