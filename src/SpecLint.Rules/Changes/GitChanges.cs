using System.Collections.Immutable;
using System.Text;

namespace SpecLint.Rules.Changes;

/// <summary>Reads a <see cref="GitChangeSet"/> with the git command line; every failure a CI user can meet is a plain message.</summary>
internal static class GitChanges
{
    /// <summary>The changes since the merge base of <paramref name="reference"/> and HEAD, or null with <paramref name="error"/> set.</summary>
    public static GitChangeSet? Read(string folder, string reference, out string? error)
    {
        ArgumentNullException.ThrowIfNull(folder);
        ArgumentNullException.ThrowIfNull(reference);
        var prefix = GitCommand.Run(folder, "rev-parse", "--show-prefix");
        if (prefix.ExitCode == -1)
        {
            error = prefix.Error;
            return null;
        }

        if (!prefix.Ok)
        {
            error = $"--against: '{Path.GetFullPath(folder)}' is not inside a git repository; --against compares with the repository's history, so run it in a clone";
            return null;
        }

        var root = RootFrom(Path.GetFullPath(folder), prefix.Text.Trim());
        if (reference.Length == 0 || reference.StartsWith('-'))
        {
            error = $"--against: '{reference}' is not a ref; write a branch, tag or commit, e.g. origin/main";
            return null;
        }

        var target = GitCommand.Run(root, "rev-parse", "--verify", "--quiet", "--end-of-options", reference + "^{commit}");
        if (!target.Ok)
        {
            error = $"--against: unknown ref '{reference}': no branch, tag or commit of that name in this clone; fetch it first (e.g. git fetch origin {reference.Replace("origin/", "", StringComparison.Ordinal)}) or check the spelling";
            return null;
        }

        var head = GitCommand.Run(root, "rev-parse", "--verify", "--quiet", "HEAD^{commit}");
        if (!head.Ok)
        {
            error = "--against: the repository has no commit yet (HEAD names nothing); commit first";
            return null;
        }

        var mergeBase = GitCommand.Run(root, "merge-base", target.Text.Trim(), head.Text.Trim());
        if (!mergeBase.Ok)
        {
            var shallow = GitCommand.Run(root, "rev-parse", "--is-shallow-repository");
            error = shallow.Ok && shallow.Text.Trim() == "true"
                ? $"--against: this clone is shallow and does not contain the merge base of '{reference}' and HEAD; fetch the whole history (git fetch --unshallow, or actions/checkout with fetch-depth: 0) and run again"
                : $"--against: '{reference}' and HEAD have no common history, so there is no base to compare with";
            return null;
        }

        var baseCommit = mergeBase.Text.Trim();
        // Specs of one repository look alike, so git's usual 50 % similarity would pair a deleted channel with an
        // unrelated new one; 90 % still finds a move with a few values edited.
        var diff = GitCommand.Run(root, "diff", "--name-status", "-z", "-M90%", "--no-ext-diff", baseCommit, "--");
        var untracked = GitCommand.Run(root, "ls-files", "--others", "--exclude-standard", "-z");
        if (!diff.Ok || !untracked.Ok)
        {
            error = $"--against: git could not list the changes since {baseCommit[..Math.Min(12, baseCommit.Length)]}: {(diff.Ok ? untracked.Error : diff.Error)}";
            return null;
        }

        var files = ParseNameStatus(diff.Output).ToList();
        var known = files.Select(f => f.Path).ToHashSet(StringComparer.Ordinal);
        files.AddRange(Split(untracked.Output).Where(p => !known.Contains(p)).Select(p => new FileChange(ChangeStatus.Added, p)));
        error = null;
        return new GitChangeSet(root, reference, baseCommit, [.. files.OrderBy(f => f.Path, StringComparer.Ordinal)]);
    }

    /// <summary>Parses <c>git diff --name-status -z</c>: a status field, then one path (two for renames and copies).</summary>
    public static IEnumerable<FileChange> ParseNameStatus(byte[] output)
    {
        var fields = Split(output);
        for (var i = 0; i < fields.Count; i++)
        {
            var status = fields[i];
            var code = status.Length > 0 ? status[0] : ' ';
            if (code is 'R' or 'C' && i + 2 < fields.Count)
            {
                yield return code == 'R'
                    ? new FileChange(ChangeStatus.Renamed, fields[i + 2], fields[i + 1])
                    : new FileChange(ChangeStatus.Added, fields[i + 2]);
                i += 2;
            }
            else if (i + 1 < fields.Count)
            {
                var path = fields[++i];
                yield return code switch
                {
                    'A' => new FileChange(ChangeStatus.Added, path),
                    'D' => new FileChange(ChangeStatus.Deleted, path),
                    _ => new FileChange(ChangeStatus.Changed, path),
                };
            }
        }
    }

    private static List<string> Split(byte[] output) =>
        [.. Encoding.UTF8.GetString(output).Split('\0', StringSplitOptions.RemoveEmptyEntries)];

    private static string RootFrom(string folder, string prefix)
    {
        var root = folder;
        foreach (var _ in prefix.Split('/', StringSplitOptions.RemoveEmptyEntries))
        {
            root = Path.GetDirectoryName(root) ?? root;
        }

        return root;
    }
}
