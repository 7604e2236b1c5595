namespace SpecLint.Reporting;

/// <summary>Turns a finding's file (as given on the command line) into the repository-relative, forward-slash path CI tools match on.</summary>
internal static class RepositoryPath
{
    /// <summary>
    /// Relative to <paramref name="repositoryRoot"/> when the file is absolute and inside it; backslashes become
    /// slashes and a leading "./" goes. Absolute paths outside the root stay absolute.
    /// </summary>
    public static string Relative(string file, string? repositoryRoot)
    {
        ArgumentNullException.ThrowIfNull(file);
        var path = file;
        if (repositoryRoot is not null && Path.IsPathRooted(path))
        {
            var relative = Path.GetRelativePath(repositoryRoot, path);
            if (!relative.StartsWith("..", StringComparison.Ordinal) && !Path.IsPathRooted(relative))
            {
                path = relative;
            }
        }

        if (Path.IsPathRooted(path))
        {
            return path;
        }

        path = path.Replace('\\', '/');
        while (path.StartsWith("./", StringComparison.Ordinal))
        {
            path = path[2..];
        }

        return path;
    }
}
