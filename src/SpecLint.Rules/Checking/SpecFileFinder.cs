using SpecLint.Core.Files;

namespace SpecLint.Rules.Checking;

/// <summary>
/// Turns the paths given on the command line into spec files: files are taken as they are, folders are
/// searched for files matching the include globs. Output order is ordinal by path so reports are stable.
/// </summary>
internal static class SpecFileFinder
{
    private static readonly string[] SkippedFolders = [".git", "bin", "obj", "node_modules"];

    /// <summary>Expands <paramref name="paths"/>; paths that do not exist are returned in <paramref name="missing"/>.</summary>
    public static IReadOnlyList<string> Find(IEnumerable<string> paths, IReadOnlyList<string> includeGlobs, out IReadOnlyList<string> missing) =>
        Find(paths, includeGlobs, [], null, out missing);

    /// <summary>
    /// The spec files under <paramref name="paths"/>: a file named is taken as it is; in a folder, a file is taken when
    /// its path matches an include glob and no exclude glob. Paths are matched relative to <paramref name="baseFolder"/>
    /// (the folder of the configuration file) when the file lies inside it, so <c>hw/**/*.tia.yaml</c> means the same
    /// files whichever folder is given; otherwise relative to the folder given.
    /// </summary>
    public static IReadOnlyList<string> Find(
        IEnumerable<string> paths, IReadOnlyList<string> includeGlobs, IReadOnlyList<string> excludeGlobs, string? baseFolder, out IReadOnlyList<string> missing)
    {
        var globs = includeGlobs.Select(g => new GlobPattern(g)).ToList();
        var excluded = excludeGlobs.Select(g => new GlobPattern(g)).ToList();
        var root = baseFolder is null ? null : Path.GetFullPath(baseFolder);
        var files = new SortedSet<string>(StringComparer.Ordinal);
        var gone = new List<string>();
        foreach (var path in paths)
        {
            if (File.Exists(path))
            {
                files.Add(Normalize(path));
            }
            else if (Directory.Exists(path))
            {
                foreach (var f in Walk(path))
                {
                    var relative = RelativeTo(root, path, f);
                    if (globs.Any(g => g.IsMatch(relative)) && !excluded.Any(g => g.IsMatch(relative)))
                    {
                        files.Add(Normalize(f));
                    }
                }
            }
            else
            {
                gone.Add(path);
            }
        }

        missing = gone;
        return files.ToList();
    }

    private static string RelativeTo(string? root, string walked, string file)
    {
        if (root is not null)
        {
            var fromRoot = Path.GetRelativePath(root, Path.GetFullPath(file));
            if (!Path.IsPathRooted(fromRoot) && fromRoot != ".." && !fromRoot.StartsWith("../", StringComparison.Ordinal) && !fromRoot.StartsWith("..\\", StringComparison.Ordinal))
            {
                return fromRoot.Replace('\\', '/');
            }
        }

        return Path.GetRelativePath(walked, file).Replace('\\', '/');
    }

    private static IEnumerable<string> Walk(string root)
    {
        var pending = new Stack<string>();
        pending.Push(root);
        while (pending.Count > 0)
        {
            var dir = pending.Pop();
            IEnumerable<string> entries;
            try
            {
                entries = Directory.EnumerateFileSystemEntries(dir).ToList();
            }
            catch (Exception e) when (e is UnauthorizedAccessException or IOException)
            {
                continue;
            }

            foreach (var e in entries)
            {
                // Linked folders are not followed: a link to ".." would check the same specs again and again,
                // and a link to "/" would walk the whole filesystem. Linked files are taken only when they stay
                // inside the folder being walked, so the walk never reads outside it.
                if (FileKinds.IsSymbolicLink(e) && (Directory.Exists(e) || !Inside(root, e)))
                {
                    continue;
                }

                if (Directory.Exists(e))
                {
                    if (!SkippedFolders.Contains(Path.GetFileName(e), StringComparer.Ordinal))
                    {
                        pending.Push(e);
                    }
                }
                else
                {
                    yield return e;
                }
            }
        }
    }

    private static bool Inside(string root, string link)
    {
        try
        {
            var target = File.ResolveLinkTarget(link, returnFinalTarget: true)?.FullName;
            var top = Path.TrimEndingDirectorySeparator(Path.GetFullPath(root)) + Path.DirectorySeparatorChar;
            return target is not null && target.StartsWith(top, StringComparison.Ordinal);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return false;
        }
    }

    private static string Normalize(string path)
    {
        var relative = Path.GetRelativePath(Directory.GetCurrentDirectory(), Path.GetFullPath(path));
        return (relative.StartsWith("..", StringComparison.Ordinal) ? Path.GetFullPath(path) : relative).Replace('\\', '/');
    }
}
