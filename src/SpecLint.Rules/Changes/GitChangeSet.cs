using System.Collections.Immutable;

namespace SpecLint.Rules.Changes;

/// <summary>
/// The files that differ between the merge base of a ref and HEAD, plus what the working tree changes on top
/// (edits not yet committed, new files not yet added). Base versions are read straight from git's object store.
/// </summary>
/// <param name="Root">The repository's top folder, as reached from the working directory.</param>
/// <param name="Ref">The ref as the user wrote it.</param>
/// <param name="MergeBase">The merge base commit.</param>
/// <param name="Files">Changed files, ordinal by path.</param>
internal sealed record GitChangeSet(string Root, string Ref, string MergeBase, ImmutableArray<FileChange> Files)
{
    /// <summary>The bytes of <paramref name="repoPath"/> at the merge base, or null when it is not there.</summary>
    public byte[]? BaseBytes(string repoPath)
    {
        ArgumentNullException.ThrowIfNull(repoPath);
        var result = GitCommand.Run(Root, "cat-file", "blob", $"{MergeBase}:{repoPath}");
        return result.Ok ? result.Output : null;
    }

    /// <summary>The path of a file relative to the repository root (forward slashes), or null when it lies outside.</summary>
    public string? RepoPath(string file)
    {
        var relative = Path.GetRelativePath(Root, Path.GetFullPath(file)).Replace('\\', '/');
        return relative.StartsWith("../", StringComparison.Ordinal) || relative == ".." || Path.IsPathRooted(relative) ? null : relative;
    }

    /// <summary>A repository path as a path relative to the working directory, the way files are shown elsewhere.</summary>
    public static string Display(string root, string repoPath)
    {
        var full = Path.GetFullPath(Path.Combine(root, repoPath));
        var relative = Path.GetRelativePath(Directory.GetCurrentDirectory(), full);
        return (relative.StartsWith("..", StringComparison.Ordinal) ? full : relative).Replace('\\', '/');
    }
}
