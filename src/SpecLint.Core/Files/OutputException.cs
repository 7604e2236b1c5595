namespace SpecLint.Core.Files;

/// <summary>An output that could not be written; its message is ready for the user (path and reason).</summary>
internal sealed class OutputException : IOException
{
    /// <summary>Creates the exception for <paramref name="path"/> with a reason.</summary>
    public OutputException(string path, string reason)
        : base($"cannot write '{path}': {reason}")
    {
        Path = path;
    }

    /// <summary>The path as the user gave it.</summary>
    public string Path { get; }
}
