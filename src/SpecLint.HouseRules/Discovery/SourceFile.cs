namespace SpecLint.HouseRules.Discovery;

/// <summary>One house-rule C# file.</summary>
/// <param name="RelativePath">Path relative to the configuration's folder, forward slashes: the name the compiler, the cache and the stack traces use.</param>
/// <param name="FullPath">Absolute path on disk.</param>
/// <param name="Text">The file's text.</param>
internal sealed record SourceFile(string RelativePath, string FullPath, string Text);
