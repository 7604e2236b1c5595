namespace SpecLint.HouseRules.Tests;

/// <summary>The repository checkout the tests run from (the folder that holds SpecLint.sln).</summary>
internal static class RepoPaths
{
    public static string Root { get; } = Find();

    private static string Find()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "SpecLint.sln")))
        {
            dir = dir.Parent;
        }

        return dir?.FullName ?? throw new InvalidOperationException("SpecLint.sln not found above the test output folder");
    }
}
