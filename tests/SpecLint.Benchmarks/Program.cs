using System.Globalization;
using BenchmarkDotNet.Running;

namespace SpecLint.Benchmarks;

/// <summary>
/// Entry point: <c>dotnet run -c Release --project tests/SpecLint.Benchmarks -- --filter '*'</c> for the
/// BenchmarkDotNet suites, <c>-- montecarlo [specs] [samples]</c> for the timed tolerance run, <c>-- check [specs] [repeats] [--jit]</c> for whole checks
/// in a child process, <c>-- memory [specs] [--jit]</c> for their peak memory, or <c>-- houserules [repeats]</c> for
/// the whole-process cost of compiling and of loading cached house rules, or <c>-- profile [rounds]</c> for the time and
/// memory of each stage of one spec, <c>-- profile-cold</c> for the first spec of a fresh process, <c>-- profile-specs [rounds]</c> for the check of each example and demo spec.
/// </summary>
public static class Program
{
    /// <summary>Runs the benchmarks chosen on the command line.</summary>
    public static void Main(string[] args)
    {
        ArgumentNullException.ThrowIfNull(args);
        if (args.Length > 0 && args[0] == "montecarlo")
        {
            MonteCarloBench.Run(
                args.Length > 1 ? int.Parse(args[1], CultureInfo.InvariantCulture) : 1000,
                args.Length > 2 ? int.Parse(args[2], CultureInfo.InvariantCulture) : 1000);
            return;
        }

        if (args.Length > 0 && args[0] == "check")
        {
            var numbers = args.Skip(1).Where(a => !a.StartsWith("--", StringComparison.Ordinal)).ToArray();
            CheckBench.Run(
                numbers.Length > 0 ? int.Parse(numbers[0], CultureInfo.InvariantCulture) : 1000,
                numbers.Length > 1 ? int.Parse(numbers[1], CultureInfo.InvariantCulture) : 3,
                jit: args.Contains("--jit"));
            return;
        }

        if (args.Length > 0 && args[0] == "memory")
        {
            var numbers = args.Skip(1).Where(a => !a.StartsWith("--", StringComparison.Ordinal)).ToArray();
            MemoryBench.Run(numbers.Length > 0 ? int.Parse(numbers[0], CultureInfo.InvariantCulture) : 10000, jit: args.Contains("--jit"));
            return;
        }

        if (args.Length > 0 && args[0] == "profile-cold")
        {
            ColdProfileBench.Run();
            return;
        }

        if (args.Length > 0 && args[0] == "profile-specs")
        {
            SpecProfileBench.Run(args.Length > 1 ? int.Parse(args[1], CultureInfo.InvariantCulture) : 3, args.Length > 2 ? args[2] : null);
            return;
        }

        if (args.Length > 0 && args[0] == "profile")
        {
            ProfileBench.Run(args.Length > 1 ? int.Parse(args[1], CultureInfo.InvariantCulture) : 20);
            return;
        }

        if (args.Length > 0 && args[0] == "houserules")
        {
            HouseRuleBench.Run(args.Length > 1 ? int.Parse(args[1], CultureInfo.InvariantCulture) : 5);
            return;
        }

        BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
    }
}
