namespace SpecLint.HouseRules.Compiling;

/// <summary>A class declared in the house-rule sources that implements <c>IRule</c>, with where it is written.</summary>
/// <param name="MetadataName">The name reflection finds it by.</param>
/// <param name="Path">Its source, relative to the configuration's folder.</param>
/// <param name="Line">1-based line of its name.</param>
/// <param name="Column">1-based column of its name.</param>
internal sealed record DeclaredType(string MetadataName, string Path, int Line, int Column);
