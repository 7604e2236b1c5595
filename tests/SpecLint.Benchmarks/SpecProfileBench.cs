using System.Diagnostics;
using System.Globalization;
using SpecLint.Core.Config;
using SpecLint.Core.Spec;
using SpecLint.Rules.Checking;

namespace SpecLint.Benchmarks;

/// <summary>
/// The check of each example and demo spec on its own, one thread after a warm-up: nominal only, and with corners,
/// Monte Carlo and the fix searches. Shows which kinds of channel dominate a whole check.
/// <c>dotnet run -c Release --project tests/SpecLint.Benchmarks -- profile-specs [rounds] [file-name part]</c>.
/// </summary>
internal static class SpecProfileBench
{
    public static void Run(int rounds, string? only = null)
    {
        var repoRoot = RepoPaths.Root();
        var files = Directory.GetFiles(Path.Combine(repoRoot, "examples"), "*.tia.yaml")
            .Concat(Directory.GetFiles(Path.Combine(repoRoot, "src", "SpecLint.Cli", "Demo"), "*.tia.yaml"))
            .Order(StringComparer.Ordinal)
            .Where(f => only is null || Path.GetFileName(f).Contains(only, StringComparison.Ordinal))
            .ToArray();
        var config = RepoConfigLoader.LoadText("monte-carlo: { samples: 1000, seed: 1 }\n", ".speclint.yaml").Config;
        var specs = files.Select(f => SpecLoader.LoadText(File.ReadAllText(f), f).Spec!).ToArray();
        var nominal = new CheckOptions { Tolerances = false, MaxDegreeOfParallelism = 1 };
        var full = new CheckOptions { MaxDegreeOfParallelism = 1 };

        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"one thread, mean of {rounds} rounds after a warm-up:"));
        Console.WriteLine("  spec                              nominal µs    full µs   full KiB   corner evaluations (per setting)");
        for (var i = 0; i < specs.Length; i++)
        {
            var n = Time(() => CheckRunner.CheckSpec(specs[i], config, nominal), rounds, out _);
            var f = Time(() => CheckRunner.CheckSpec(specs[i], config, full), rounds, out var bytes);
            var outcome = CheckRunner.CheckSpec(specs[i], config, full);
            var evaluations = outcome.Settings.IsDefaultOrEmpty
                ? $"{outcome.Tolerances?.CornerEvaluations}"
                : string.Join(" ", outcome.Settings.Select(x => x.Tolerances?.CornerEvaluations));
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  {Path.GetFileName(files[i]),-32} {n,11:0} {f,10:0} {bytes / 1024,10:0}   {evaluations}"));
        }
    }

    private static double Time(Action body, int rounds, out double bytesPerRound)
    {
        body();
        var b0 = GC.GetAllocatedBytesForCurrentThread();
        var clock = Stopwatch.StartNew();
        for (var r = 0; r < rounds; r++)
        {
            body();
        }

        clock.Stop();
        bytesPerRound = (GC.GetAllocatedBytesForCurrentThread() - b0) / (double)rounds;
        return clock.Elapsed.TotalMilliseconds * 1000 / rounds;
    }
}
