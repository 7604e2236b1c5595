using BenchmarkDotNet.Running;

namespace SpecLint.Benchmarks;

/// <summary>Entry point: <c>dotnet run -c Release --project tests/SpecLint.Benchmarks -- --filter '*'</c>.</summary>
public static class Program
{
    /// <summary>Runs the benchmarks chosen on the command line.</summary>
    public static void Main(string[] args) => BenchmarkSwitcher.FromAssembly(typeof(Program).Assembly).Run(args);
}
