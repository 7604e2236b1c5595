namespace SpecLint.Reporting.Tests;

/// <summary>Finds files of this repository (rule pages) from the test's output folder.</summary>
internal static class RepositoryFiles
{
    public static string Root { get; } = FindRoot();

    public static string RulePage(string id) => File.ReadAllText(Path.Combine(Root, "rules", id, id + ".md"));

    private static string FindRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "SpecLint.sln")))
            {
                return dir.FullName;
            }
        }

        throw new InvalidOperationException("SpecLint.sln not found above " + AppContext.BaseDirectory);
    }
}
