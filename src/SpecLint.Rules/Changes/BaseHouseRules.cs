using System.Collections.Immutable;
using System.Text;
using SpecLint.Core.Config;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Changes;

/// <summary>
/// The house rules of one configuration as they were at the merge base. Their sources are read from git's object
/// store into a temporary folder (nothing is checked out), built by the same <see cref="IHouseRuleSource"/> as the
/// head's, and the folder is deleted again. A base whose rules do not build gives notes instead of rules: the change
/// under review did not break them, so they must not fail its run.
/// </summary>
internal static class BaseHouseRules
{
    /// <summary>More house-rule files than this at the base is not a folder of rules; the loader's own limit is lower.</summary>
    public const int MaxFiles = 4096;

    /// <summary>
    /// The base's house rules of the configuration at <paramref name="configRepoPath"/> (its base text is
    /// <paramref name="configText"/>), or null with <paramref name="notes"/> saying why they could not be built.
    /// </summary>
    public static HouseRuleSet? Load(GitChangeSet changes, IHouseRuleSource source, string configRepoPath, string configText, out ImmutableArray<Finding> notes) =>
        Load(changes, source, configRepoPath, configText, out notes, out _);

    /// <summary>
    /// As <see cref="Load(GitChangeSet, IHouseRuleSource, string, string, out ImmutableArray{Finding})"/>, with
    /// <paramref name="shownAs"/> mapping a file of the temporary folder (where a base rule that throws is reported)
    /// to the rule's place in the repository, as a reviewer finds it.
    /// </summary>
    public static HouseRuleSet? Load(GitChangeSet changes, IHouseRuleSource source, string configRepoPath, string configText, out ImmutableArray<Finding> notes, out Func<string, string> shownAs)
    {
        ArgumentNullException.ThrowIfNull(changes);
        ArgumentNullException.ThrowIfNull(source);
        ArgumentNullException.ThrowIfNull(configRepoPath);
        var slash = configRepoPath.LastIndexOf('/');
        var folder = slash < 0 ? "" : configRepoPath[..slash];
        var prefix = RecheckScope.FolderPrefix(folder);
        string? temp = null;
        shownAs = file => file;
        try
        {
            temp = Directory.CreateTempSubdirectory("speclint-base-rules-").FullName;
            var folderOfTemp = temp;
            shownAs = file => Shown(file, folderOfTemp, prefix) is var repoPath && repoPath != file ? GitChangeSet.Display(changes.Root, repoPath) : file;
            var configFile = Path.Combine(temp, configRepoPath[(slash + 1)..]);
            File.WriteAllText(configFile, configText, new UTF8Encoding(false));
            var config = RepoConfigLoader.LoadText(configText, configFile).Config;
            if (Materialize(changes, folder, prefix, config, temp) is { } why)
            {
                notes = [Note(changes, configRepoPath, 1, 1, RuleIds.HouseRuleInvalid, why)];
                return null;
            }

            var set = source.Load(config);
            var errors = set.Problems.Where(p => p.Severity == Severity.Error).ToList();
            if (errors.Count == 0)
            {
                notes = [];
                return set;
            }

            // One note at the first error: a broken base is context for the review, and one syntax error cascades
            // into many compiler messages that say nothing more.
            var first = errors.OrderBy(p => Shown(p.File, temp, prefix), StringComparer.Ordinal).ThenBy(p => p.Line).ThenBy(p => p.Column).First();
            var more = errors.Count > 1 ? $" (and {errors.Count - 1} more problem{(errors.Count == 2 ? "" : "s")})" : "";
            notes = [Note(changes, Shown(first.File, temp, prefix), first.Line, first.Column, first.RuleId, first.Message.TrimEnd('.') + more)];
            return null;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            notes = [Note(changes, configRepoPath, 1, 1, RuleIds.HouseRuleInvalid, $"they could not be written to a temporary folder ({e.Message})")];
            return null;
        }
        finally
        {
            Delete(temp);
        }
    }

    /// <summary>Writes the base's house-rule files (C# sources and pages) under <paramref name="temp"/>; returns why not, or null.</summary>
    private static string? Materialize(GitChangeSet changes, string folder, string prefix, RepoConfig config, string temp)
    {
        var listing = folder.Length == 0
            ? GitCommand.Run(changes.Root, "ls-tree", "-r", "-z", "--full-tree", changes.MergeBase)
            : GitCommand.Run(changes.Root, "ls-tree", "-r", "-z", "--full-tree", changes.MergeBase, "--", folder);
        if (!listing.Ok)
        {
            return $"git could not list them: {listing.Error}";
        }

        var matchers = RecheckScope.HouseRuleMatchers(folder, config);
        var wanted = new List<(string Object, string Path)>();
        foreach (var record in listing.Text.Split('\0', StringSplitOptions.RemoveEmptyEntries))
        {
            // "<mode> <type> <object>\t<path>"; only regular files: a link at the base must not become a source here.
            var tab = record.IndexOf('\t', StringComparison.Ordinal);
            var fields = tab < 0 ? [] : record[..tab].Split(' ');
            var path = tab < 0 ? "" : record[(tab + 1)..];
            if (fields.Length == 3 && fields[0] is "100644" or "100755" && fields[1] == "blob"
                && (path.EndsWith(".cs", StringComparison.Ordinal) || path.EndsWith(".md", StringComparison.Ordinal))
                && path.StartsWith(prefix, StringComparison.Ordinal) && matchers.Any(m => m(path)))
            {
                wanted.Add((fields[2], path));
            }
        }

        if (wanted.Count > MaxFiles)
        {
            return $"{wanted.Count} files match its house-rules entries, more than {MaxFiles}";
        }

        foreach (var (id, path) in wanted)
        {
            var target = Path.GetFullPath(Path.Combine(temp, path[prefix.Length..]));
            if (!target.StartsWith(temp + Path.DirectorySeparatorChar, StringComparison.Ordinal))
            {
                continue;
            }

            var blob = GitCommand.Run(changes.Root, "cat-file", "blob", id);
            if (!blob.Ok)
            {
                return $"git could not read {path}: {blob.Error}";
            }

            Directory.CreateDirectory(Path.GetDirectoryName(target)!);
            File.WriteAllBytes(target, blob.Output);
        }

        return null;
    }

    /// <summary>A problem's file (shown relative to the working directory, inside the temporary folder) as its repository path.</summary>
    private static string Shown(string file, string temp, string prefix)
    {
        var relative = Path.GetRelativePath(temp, Path.GetFullPath(file)).Replace('\\', '/');
        return relative.StartsWith("..", StringComparison.Ordinal) || Path.IsPathRooted(relative) ? file : prefix + relative;
    }

    private static Finding Note(GitChangeSet changes, string repoPath, int line, int column, string ruleId, string message) =>
        new(ruleId, Severity.Note, GitChangeSet.Display(changes.Root, repoPath), "", line, column,
            $"the house rules at the merge base {changes.MergeBase[..Math.Min(12, changes.MergeBase.Length)]} could not be built: {message.TrimEnd('.')}. "
            + "Base versions are judged by this change's house rules instead, so house-rule findings show as unchanged rather than new or resolved");

    // Best effort: a file a virus scanner holds open must not turn a finished check into a crash.
    private static void Delete(string? temp)
    {
        if (temp is null)
        {
            return;
        }

        try
        {
            Directory.Delete(temp, recursive: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
        }
    }
}
