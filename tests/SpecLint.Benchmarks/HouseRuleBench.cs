using System.Diagnostics;
using System.Globalization;

namespace SpecLint.Benchmarks;

/// <summary>
/// Whole-process timings of house rules: a check of one spec without house rules, with five house rules compiled
/// cold (empty cache), and with the same rules loaded from the cache. Each figure is the median of several runs
/// of the built tool in a child process, so start-up and JIT are included as a user sees them.
/// </summary>
internal static class HouseRuleBench
{
    public static void Run(int repeats)
    {
        var repoRoot = RepoRoot();
        var work = Directory.CreateTempSubdirectory("speclint-hr-bench-").FullName;
        try
        {
            var repo = Path.Combine(work, "repo");
            Directory.CreateDirectory(Path.Combine(repo, ".git"));
            File.WriteAllText(Path.Combine(repo, ".speclint.yaml"), "house-rules: [house-rules/]\n");
            File.Copy(Path.Combine(repoRoot, "examples", "scatter.tia.yaml"), Path.Combine(repo, "scatter.tia.yaml"));
            CopyFolder(Path.Combine(repoRoot, "examples", "house-rules"), Path.Combine(repo, "house-rules"));
            foreach (var (id, limit) in new[] { ("rf-ceiling", "1 GΩ"), ("cf-ceiling", "100 pF") })
            {
                var folder = Path.Combine(repo, "house-rules", id);
                Directory.CreateDirectory(folder);
                File.WriteAllText(Path.Combine(folder, Pascal(id) + "Rule.cs"), LimitRule(id, limit));
            }

            var tool = Path.Combine(AppContext.BaseDirectory, "speclint.dll");
            var without = Median(repeats, () => Time(tool, repo, Path.Combine(work, "unused"), "--no-house-rules"));
            var cold = Median(repeats, () =>
            {
                var fresh = Path.Combine(work, "cache-" + Guid.NewGuid().ToString("N"));
                return Time(tool, repo, fresh);
            });
            var cache = Path.Combine(work, "cache-warm");
            Time(tool, repo, cache);
            var cached = Median(repeats, () => Time(tool, repo, cache));

            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"check of 1 spec, --nominal-only, median of {repeats} runs each:"));
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  without house rules        {without,8:0} ms"));
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  5 house rules, cold cache  {cold,8:0} ms  (compile cost {cold - without:0} ms; target <= 3000)"));
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  5 house rules, cached      {cached,8:0} ms  (overhead {cached - without:0} ms; target <= 50)"));
        }
        finally
        {
            Directory.Delete(work, recursive: true);
        }
    }

    private static double Time(string tool, string repo, string cache, string extra = "")
    {
        var start = new ProcessStartInfo("dotnet", $"\"{tool}\" check scatter.tia.yaml --nominal-only --quiet {extra}")
        {
            WorkingDirectory = repo,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
        };
        start.Environment["SPECLINT_CACHE"] = cache;
        var clock = Stopwatch.StartNew();
        using var process = Process.Start(start)!;
        var output = process.StandardOutput.ReadToEnd();
        var error = process.StandardError.ReadToEnd();
        process.WaitForExit();
        clock.Stop();
        if (process.ExitCode > 1)
        {
            throw new InvalidOperationException($"speclint exited {process.ExitCode}: {output}{error}");
        }

        return clock.Elapsed.TotalMilliseconds;
    }

    private static double Median(int n, Func<double> measure)
    {
        var values = Enumerable.Range(0, n).Select(_ => measure()).Order().ToArray();
        return values[values.Length / 2];
    }

    private static string Pascal(string id) => string.Concat(id.Split('-').Select(p => char.ToUpperInvariant(p[0]) + p[1..]));

    private static string LimitRule(string id, string limit) => $$"""
        namespace Bench;

        public sealed class {{Pascal(id)}}Rule : IRule
        {
            public static readonly RuleOption Max = new("max", Dimension.{{(id.StartsWith("rf", StringComparison.Ordinal) ? "Resistance" : "Capacitance")}}, "{{limit}}", "limit");

            public RuleDescriptor Descriptor { get; } = new("{{id}}", "A limit", Severity.Warning, [Max]);

            public IEnumerable<Finding> Check(RuleContext context)
            {
                var value = {{(id.StartsWith("rf", StringComparison.Ordinal) ? "context.Circuit.Rf.Ohms" : "context.Circuit.Cf.Farads")}};
                if (value > context.OptionSi("max"))
                {
                    yield return context.Report("/feedback", "over the limit");
                }
            }
        }
        """;

    private static void CopyFolder(string from, string to)
    {
        foreach (var file in Directory.GetFiles(from, "*", SearchOption.AllDirectories))
        {
            var target = Path.Combine(to, Path.GetRelativePath(from, file));
            Directory.CreateDirectory(Path.GetDirectoryName(target)!);
            File.Copy(file, target);
        }
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
