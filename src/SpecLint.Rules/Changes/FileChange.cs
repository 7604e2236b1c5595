namespace SpecLint.Rules.Changes;

/// <summary>One file that differs between the merge base and the working tree; paths are relative to the repository root, forward slashes.</summary>
/// <param name="Status">What happened to it.</param>
/// <param name="Path">The path on the head (for a deleted file, its path at the base).</param>
/// <param name="PreviousPath">The path at the base for a renamed file, else null.</param>
internal sealed record FileChange(ChangeStatus Status, string Path, string? PreviousPath = null)
{
    /// <summary>Where the base version lives: the previous path of a rename, else the path; null for an added file.</summary>
    public string? BasePath => Status switch
    {
        ChangeStatus.Added => null,
        ChangeStatus.Renamed => PreviousPath,
        _ => Path,
    };
}
