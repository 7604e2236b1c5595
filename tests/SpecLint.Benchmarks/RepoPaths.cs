namespace SpecLint.Benchmarks;

/// <summary>The repository the benchmarks run from, found by walking up to the solution file.</summary>
internal static class RepoPaths
{
    public static string Root()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "SpecLint.sln")))
        {
            dir = dir.Parent;
        }

        return dir?.FullName ?? throw new InvalidOperationException("SpecLint.sln not found");
    }
}
