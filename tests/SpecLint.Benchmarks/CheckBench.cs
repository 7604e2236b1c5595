using System.Diagnostics;
using System.Globalization;

namespace SpecLint.Benchmarks;

/// <summary>
/// Whole checks as a user runs them, the built tool in a child process (start-up, JIT, file reading and output
/// included): one spec cold; 1000 specs with <c>--nominal-only</c>; 1000 specs with corners and 1000 Monte Carlo
/// samples each. The specs are the example and demo channels under numbered names. Prints the median of
/// <c>repeats</c> runs and the figure per spec; <c>dotnet run -c Release --project tests/SpecLint.Benchmarks -- check [specs] [repeats]</c>.
/// </summary>
internal static class CheckBench
{
    public static void Run(int specs, int repeats)
    {
        var repoRoot = RepoRoot();
        var work = Directory.CreateTempSubdirectory("speclint-check-bench-").FullName;
        try
        {
            var sources = Directory.GetFiles(Path.Combine(repoRoot, "examples"), "*.tia.yaml")
                .Concat(Directory.GetFiles(Path.Combine(repoRoot, "src", "SpecLint.Cli", "Demo"), "*.tia.yaml"))
                .Order(StringComparer.Ordinal)
                .Select(File.ReadAllText)
                .ToArray();
            var one = Path.Combine(work, "one");
            var many = Path.Combine(work, "many");
            foreach (var folder in new[] { one, many })
            {
                Directory.CreateDirectory(Path.Combine(folder, ".git"));
                File.WriteAllText(Path.Combine(folder, ".speclint.yaml"), "monte-carlo: { samples: 1000, seed: 1 }\n");
            }

            File.WriteAllText(Path.Combine(one, "scatter.tia.yaml"), File.ReadAllText(Path.Combine(repoRoot, "examples", "scatter.tia.yaml")));
            for (var i = 0; i < specs; i++)
            {
                var text = sources[i % sources.Length].Replace("\nname: ", string.Create(CultureInfo.InvariantCulture, $"\nname: n{i:0000}-"), StringComparison.Ordinal);
                File.WriteAllText(Path.Combine(many, string.Create(CultureInfo.InvariantCulture, $"s{i:0000}.tia.yaml")), text);
            }

            var tool = Path.Combine(AppContext.BaseDirectory, "speclint.dll");
            Time(tool, one, "--nominal-only");
            var coldNominal = Median(repeats, () => Time(tool, one, "--nominal-only"));
            var cold = Median(repeats, () => Time(tool, one, ""));
            var nominal = Median(repeats, () => Time(tool, many, "--nominal-only"));
            var full = Median(repeats, () => Time(tool, many, ""));

            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"whole checks in a child process, {Environment.ProcessorCount} cores, median of {repeats} runs each:"));
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  1 spec cold, --nominal-only                     {coldNominal,9:0} ms"));
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  1 spec cold, corners + 1000 Monte Carlo         {cold,9:0} ms  (target <= 250)"));
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  {specs} specs, --nominal-only                   {nominal,9:0} ms  {(nominal - coldNominal) / specs,7:0.000} ms/spec after start-up  (target <= 0.3)"));
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  {specs} specs, corners + 1000 Monte Carlo       {full,9:0} ms  {(full - cold) / specs,7:0.000} ms/spec after start-up  (target <= 1.5)"));
        }
        finally
        {
            Directory.Delete(work, recursive: true);
        }
    }

    private static double Time(string tool, string folder, string extra)
    {
        var start = new ProcessStartInfo("dotnet", $"\"{tool}\" check . --quiet --no-house-rules {extra}")
        {
            WorkingDirectory = folder,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
        };
        var clock = Stopwatch.StartNew();
        using var process = Process.Start(start)!;
        process.StandardOutput.ReadToEnd();
        var error = process.StandardError.ReadToEnd();
        process.WaitForExit();
        clock.Stop();
        if (process.ExitCode > 1)
        {
            throw new InvalidOperationException($"speclint exited {process.ExitCode}: {error}");
        }

        return clock.Elapsed.TotalMilliseconds;
    }

    private static double Median(int n, Func<double> measure)
    {
        var values = Enumerable.Range(0, n).Select(_ => measure()).Order().ToArray();
        return values[values.Length / 2];
    }

    private static string RepoRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "SpecLint.sln")))
        {
            dir = dir.Parent;
        }

        return dir?.FullName ?? throw new InvalidOperationException("SpecLint.sln not found");
    }
}
