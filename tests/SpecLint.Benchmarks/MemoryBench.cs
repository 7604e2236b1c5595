using System.Diagnostics;
using System.Globalization;

namespace SpecLint.Benchmarks;

/// <summary>
/// Peak resident memory of a whole check of many specs in a child process (the example and demo channels under
/// numbered names), nominal only and with corners and 1000 Monte Carlo samples: the high-water mark the kernel
/// keeps for the process (VmHWM), read until it exits.
/// <c>dotnet run -c Release --project tests/SpecLint.Benchmarks -- memory [specs] [--jit]</c>.
/// </summary>
internal static class MemoryBench
{
    public static void Run(int specs, bool jit)
    {
        var repoRoot = RepoPaths.Root();
        var work = Directory.CreateTempSubdirectory("speclint-memory-bench-").FullName;
        try
        {
            var folder = BenchSpecs.Write(Path.Combine(work, "many"), BenchSpecs.Sources(repoRoot), specs);
            var tool = jit ? BenchTool.Jit() : BenchTool.Packed(repoRoot, work);
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"peak resident memory of one check, {specs} specs; {tool.Description}:"));
            foreach (var (name, extra) in new[] { ("--nominal-only", "--nominal-only"), ("--nominal-only --format json", "--nominal-only --format json"), ("corners + 1000 Monte Carlo", "") })
            {
                var (peak, ms) = Measure(tool, folder, extra);
                Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  {name,-30} {peak / 1024.0,8:0.0} MiB  in {ms / 1000,7:0.0} s  (target < 100 MB)"));
            }
        }
        finally
        {
            Directory.Delete(work, recursive: true);
        }
    }

    private static (long PeakKib, double Ms) Measure(BenchTool tool, string folder, string extra)
    {
        var clock = Stopwatch.StartNew();
        using var process = Process.Start(tool.Check(folder, $". --quiet --no-house-rules {extra}"))!;
        var output = process.StandardOutput.ReadToEndAsync();
        var error = process.StandardError.ReadToEndAsync();
        long peak = 0;
        while (!process.WaitForExit(20))
        {
            peak = Math.Max(peak, HighWaterKib(process.Id));
        }

        clock.Stop();
        _ = output.Result;
        if (process.ExitCode > 1)
        {
            throw new InvalidOperationException($"speclint exited {process.ExitCode}: {error.Result}");
        }

        return (peak, clock.Elapsed.TotalMilliseconds);
    }

    /// <summary>VmHWM from /proc (kB); 0 once the process is gone.</summary>
    private static long HighWaterKib(int pid)
    {
        try
        {
            foreach (var line in File.ReadLines($"/proc/{pid}/status"))
            {
                if (line.StartsWith("VmHWM:", StringComparison.Ordinal))
                {
                    return long.Parse(line["VmHWM:".Length..].Trim().Split(' ')[0], CultureInfo.InvariantCulture);
                }
            }
        }
        catch (IOException)
        {
        }

        return 0;
    }
}
