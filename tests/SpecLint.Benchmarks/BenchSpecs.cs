using System.Globalization;

namespace SpecLint.Benchmarks;

/// <summary>
/// Folders of specs for the whole-check benchmarks: the example and demo channels repeated under numbered names,
/// each folder a repository root with Monte Carlo at 1000 samples.
/// </summary>
internal static class BenchSpecs
{
    /// <summary>The example and demo spec texts, in file-name order.</summary>
    public static string[] Sources(string repoRoot) =>
        Directory.GetFiles(Path.Combine(repoRoot, "examples"), "*.tia.yaml")
            .Concat(Directory.GetFiles(Path.Combine(repoRoot, "src", "SpecLint.Cli", "Demo"), "*.tia.yaml"))
            .Order(StringComparer.Ordinal)
            .Select(File.ReadAllText)
            .ToArray();

    /// <summary>True for a channel with one gain (no switched settings, no adjustable Rf).</summary>
    public static bool SingleGain(string text) =>
        !text.Contains("\n  settings:", StringComparison.Ordinal) && !text.Contains("adjustable", StringComparison.Ordinal);

    /// <summary>Creates <paramref name="folder"/> as a repository root holding <paramref name="count"/> specs cycled from <paramref name="sources"/>.</summary>
    public static string Write(string folder, IReadOnlyList<string> sources, int count)
    {
        Directory.CreateDirectory(Path.Combine(folder, ".git"));
        File.WriteAllText(Path.Combine(folder, ".speclint.yaml"), "monte-carlo: { samples: 1000, seed: 1 }\n");
        for (var i = 0; i < count; i++)
        {
            var text = sources[i % sources.Count].Replace("\nname: ", string.Create(CultureInfo.InvariantCulture, $"\nname: n{i:00000}-"), StringComparison.Ordinal);
            File.WriteAllText(Path.Combine(folder, string.Create(CultureInfo.InvariantCulture, $"s{i:00000}.tia.yaml")), text);
        }

        return folder;
    }
}
