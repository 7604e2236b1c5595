using System.Diagnostics;
using System.Globalization;
using System.Runtime;
using SpecLint.Core.Config;
using SpecLint.Core.Spec;
using SpecLint.Core.Spec.Schema;
using SpecLint.Core.Spec.Yaml;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Benchmarks;

/// <summary>
/// Where a cold process spends its time on its first spec: each stage's first run in this fresh process, with
/// the methods the JIT compiled for it and the JIT's time. Run it as the first thing of a new process:
/// <c>dotnet run -c Release --project tests/SpecLint.Benchmarks -- profile-cold</c>. The figures are those of the
/// plain (JIT) build; the ReadyToRun tool skips most of the JIT share.
/// </summary>
internal static class ColdProfileBench
{
    public static void Run()
    {
        var sinceStart = DateTime.Now - Process.GetCurrentProcess().StartTime;
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"cold process, first spec (JIT build): process start to Main {sinceStart.TotalMilliseconds:0} ms"));
        var file = Path.Combine(RepoPaths.Root(), "examples", "scatter.tia.yaml");
        var text = File.ReadAllText(file);
        Stage("built-in rules (catalog)", () => _ = RuleCatalog.BuiltIn.Rules.Length);
        Stage("YAML read", () => YamlTreeReader.Read(text));
        var tree = YamlTreeReader.Read(text);
        Stage("schema: build validator + validate", () => SpecSchema.Validate(tree.Root));
        Stage("whole load (model)", () => SpecLoader.LoadText(text, file));
        var spec = SpecLoader.LoadText(text, file).Spec!;
        var config = RepoConfigLoader.LoadText("monte-carlo: { samples: 1000, seed: 1 }\n", ".speclint.yaml").Config;
        Stage("check, nominal only", () => CheckRunner.CheckSpec(spec, config, new CheckOptions { Tolerances = false }));
        Stage("check, corners + 1000 Monte Carlo", () => CheckRunner.CheckSpec(spec, config, new CheckOptions()));
        Stage("the same again (warm)", () => CheckRunner.CheckSpec(spec, config, new CheckOptions()));
    }

    private static void Stage(string name, Action body)
    {
        var methods = JitInfo.GetCompiledMethodCount();
        var jit = JitInfo.GetCompilationTime();
        var clock = Stopwatch.StartNew();
        body();
        clock.Stop();
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"  {name,-38} {clock.Elapsed.TotalMilliseconds,8:0.0} ms  JIT {(JitInfo.GetCompilationTime() - jit).TotalMilliseconds,7:0.0} ms for {JitInfo.GetCompiledMethodCount() - methods,5} methods"));
    }
}
