using System.Diagnostics;
using System.Globalization;

namespace SpecLint.Benchmarks;

/// <summary>
/// Whole checks as a user runs them, the built tool in a child process (start-up, JIT, file reading and output
/// included): one spec cold; 1000 specs with <c>--nominal-only</c>; 1000 specs with corners and 1000 Monte Carlo
/// samples each; the example and demo channels under numbered names, and again the single-gain ones only. The tool is
/// the packed ReadyToRun package installed into a temporary folder, or with <c>--jit</c> the built assembly. Prints the median of
/// <c>repeats</c> runs and the figure per spec; <c>dotnet run -c Release --project tests/SpecLint.Benchmarks -- check [specs] [repeats] [--jit]</c>.
/// </summary>
internal static class CheckBench
{
    public static void Run(int specs, int repeats, bool jit)
    {
        var repoRoot = RepoPaths.Root();
        var work = Directory.CreateTempSubdirectory("speclint-check-bench-").FullName;
        try
        {
            var sources = BenchSpecs.Sources(repoRoot);
            var one = BenchSpecs.Write(Path.Combine(work, "one"), [File.ReadAllText(Path.Combine(repoRoot, "examples", "scatter.tia.yaml"))], 1);
            var many = BenchSpecs.Write(Path.Combine(work, "many"), sources, specs);
            var plain = BenchSpecs.Write(Path.Combine(work, "plain"), [.. sources.Where(BenchSpecs.SingleGain)], specs);
            var tool = jit ? BenchTool.Jit() : BenchTool.Packed(repoRoot, work);
            Time(tool, one, "--nominal-only");
            var coldNominal = Median(repeats, () => Time(tool, one, "--nominal-only"));
            var cold = Median(repeats, () => Time(tool, one, ""));
            var nominal = Median(repeats, () => Time(tool, many, "--nominal-only"));
            var full = Median(repeats, () => Time(tool, many, ""));
            var plainNominal = Median(repeats, () => Time(tool, plain, "--nominal-only"));
            var plainFull = Median(repeats, () => Time(tool, plain, ""));

            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"whole checks in a child process, {Environment.ProcessorCount} cores, median of {repeats} runs each; {tool.Description}:"));
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  1 spec cold, --nominal-only                     {coldNominal,9:0} ms"));
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  1 spec cold, corners + 1000 Monte Carlo         {cold,9:0} ms  (target <= 250)"));
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  {specs} specs, --nominal-only                   {nominal,9:0} ms  {(nominal - coldNominal) / specs,7:0.000} ms/spec after start-up  (target <= 0.3)"));
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  {specs} specs, corners + 1000 Monte Carlo       {full,9:0} ms  {(full - cold) / specs,7:0.000} ms/spec after start-up  (target <= 1.5)"));
            Console.WriteLine("  the same with single-gain channels only (no switched settings, no adjustable Rf):");
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  {specs} specs, --nominal-only                   {plainNominal,9:0} ms  {(plainNominal - coldNominal) / specs,7:0.000} ms/spec after start-up"));
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  {specs} specs, corners + 1000 Monte Carlo       {plainFull,9:0} ms  {(plainFull - cold) / specs,7:0.000} ms/spec after start-up"));
        }
        finally
        {
            Directory.Delete(work, recursive: true);
        }
    }

    private static double Time(BenchTool tool, string folder, string extra)
    {
        var start = tool.Check(folder, $". --quiet --no-house-rules {extra}");
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
}
