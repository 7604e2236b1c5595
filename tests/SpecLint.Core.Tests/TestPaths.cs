namespace SpecLint.Core.Tests;

/// <summary>Paths of test inputs: files copied next to the test assembly, and the repository's own files.</summary>
internal static class TestPaths
{
    public static string Output(params string[] parts) => Path.Combine([AppContext.BaseDirectory, .. parts]);

    public static string RepoRoot
    {
        get
        {
            var dir = new DirectoryInfo(AppContext.BaseDirectory);
            while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "SpecLint.sln")))
            {
                dir = dir.Parent;
            }

            return dir?.FullName ?? throw new InvalidOperationException("SpecLint.sln not found above the test output folder");
        }
    }

    public static string Repo(params string[] parts) => Path.Combine([RepoRoot, .. parts]);
}
