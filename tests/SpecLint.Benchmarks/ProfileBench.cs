using System.Diagnostics;
using System.Globalization;
using SpecLint.Core.Analysis;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Config;
using SpecLint.Core.Spec;
using SpecLint.Core.Spec.Schema;
using SpecLint.Core.Spec.Yaml;
using SpecLint.Rules.Checking;

namespace SpecLint.Benchmarks;

/// <summary>
/// Where the time of one spec goes, stage by stage, on one thread after a warm-up (the example and demo specs):
/// YAML, schema, the whole load, the nominal analysis, corners, Monte Carlo, and the whole check with and
/// without tolerances. Also the memory allocated per stage and per Monte Carlo sample.
/// <c>dotnet run -c Release --project tests/SpecLint.Benchmarks -- profile [rounds]</c>.
/// </summary>
internal static class ProfileBench
{
    public static void Run(int rounds)
    {
        var repoRoot = RepoPaths.Root();
        var files = Directory.GetFiles(Path.Combine(repoRoot, "examples"), "*.tia.yaml")
            .Concat(Directory.GetFiles(Path.Combine(repoRoot, "src", "SpecLint.Cli", "Demo"), "*.tia.yaml"))
            .Order(StringComparer.Ordinal)
            .ToArray();
        var texts = files.Select(File.ReadAllText).ToArray();
        var config = RepoConfigLoader.LoadText("monte-carlo: { samples: 1000, seed: 1 }\n", ".speclint.yaml").Config;
        var specs = texts.Select((t, i) => SpecLoader.LoadText(t, files[i]).Spec!).ToArray();
        var withMc = StandardTolerances.OptionsFor(config, monteCarlo: true) with { MaxDegreeOfParallelism = 1 };
        var cornersOnly = StandardTolerances.OptionsFor(config, monteCarlo: false) with { MaxDegreeOfParallelism = 1 };
        var nominalOptions = new CheckOptions { Tolerances = false, MaxDegreeOfParallelism = 1 };
        var fullOptions = new CheckOptions { MaxDegreeOfParallelism = 1 };

        var stages = new (string Name, Action<int> Body)[]
        {
            ("YAML read", i => YamlTreeReader.Read(texts[i])),
            ("schema validate", i => SpecSchema.Validate(YamlTreeReader.Read(texts[i]).Root)),
            ("whole load (YAML+schema+model)", i => SpecLoader.LoadText(texts[i], files[i])),
            ("nominal analysis with noise", i => TiaAnalyzer.Analyze(specs[i])),
            ("corners only", i => ToleranceAnalyzer.Analyze(specs[i], cornersOnly)),
            ("corners + 1000 Monte Carlo", i => ToleranceAnalyzer.Analyze(specs[i], withMc)),
            ("check spec, nominal only (rules)", i => CheckRunner.CheckSpec(specs[i], config, nominalOptions)),
            ("check spec, corners + MC (rules, fixes)", i => CheckRunner.CheckSpec(specs[i], config, fullOptions)),
        };

        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{files.Length} specs, one thread, mean of {rounds} rounds after a warm-up:"));
        foreach (var (name, body) in stages)
        {
            for (var i = 0; i < files.Length; i++)
            {
                body(i);
            }

            var bytes = GC.GetAllocatedBytesForCurrentThread();
            var clock = Stopwatch.StartNew();
            for (var r = 0; r < rounds; r++)
            {
                for (var i = 0; i < files.Length; i++)
                {
                    body(i);
                }
            }

            clock.Stop();
            var per = rounds * files.Length;
            var allocated = (GC.GetAllocatedBytesForCurrentThread() - bytes) / (double)per;
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  {name,-42} {clock.Elapsed.TotalMilliseconds * 1000 / per,10:0.0} µs/spec {allocated / 1024,10:0.0} KiB/spec"));
        }

        PerSample(specs, withMc);
    }

    /// <summary>
    /// One Monte Carlo sample: the circuit at a point and its loop figures (started from the typical point's roots,
    /// as Monte Carlo does), separately for plain channels and for channels with a switch, wiper or electrode.
    /// </summary>
    private static void PerSample(Core.Spec.Model.TiaSpec[] specs, ToleranceOptions options)
    {
        var boxes = specs.Select(s => new ToleranceBox(s, options)).Where(b => !b.Axes.IsEmpty).ToArray();
        foreach (var network in (bool[])[false, true])
        {
            var group = boxes.Where(b => b.Build(b.TypicalPoint()).HasNetwork == network).ToArray();
            if (group.Length > 0)
            {
                PerSample(group, network ? "switched/electrode" : "plain");
            }
        }
    }

    private static void PerSample(ToleranceBox[] boxes, string what)
    {
        const int Samples = 2000;
        double buildBytes = 0, loopBytes = 0, buildTicks = 0, loopTicks = 0;
        foreach (var box in boxes)
        {
            var x = new double[box.Axes.Length];
            var hint = TiaAnalyzer.LoopHintOf(box.Build(box.TypicalPoint()));
            for (var pass = 0; pass < 2; pass++)
            {
                long b0 = GC.GetAllocatedBytesForCurrentThread(), b1 = 0, t1 = 0, t0 = Stopwatch.GetTimestamp();
                var circuits = new Circuit[Samples];
                for (var i = 0; i < Samples; i++)
                {
                    MonteCarloRunner.Draw(box.Axes, 1, i, normal: false, x);
                    circuits[i] = box.Build(x);
                }

                t1 = Stopwatch.GetTimestamp();
                b1 = GC.GetAllocatedBytesForCurrentThread();
                foreach (var c in circuits)
                {
                    LoopMetrics.Of(c, hint);
                }

                if (pass == 1)
                {
                    buildBytes += b1 - b0;
                    buildTicks += t1 - t0;
                    loopBytes += GC.GetAllocatedBytesForCurrentThread() - b1;
                    loopTicks += Stopwatch.GetTimestamp() - t1;
                }
            }
        }

        // Monte Carlo's own path: the loop read from the point, no circuit built for a plain channel.
        double pointBytes = 0, pointTicks = 0;
        foreach (var box in boxes)
        {
            var x = new double[box.Axes.Length];
            var hint = TiaAnalyzer.LoopHintOf(box.Build(box.TypicalPoint()));
            for (var pass = 0; pass < 2; pass++)
            {
                long b0 = GC.GetAllocatedBytesForCurrentThread(), t0 = Stopwatch.GetTimestamp();
                for (var i = 0; i < Samples; i++)
                {
                    MonteCarloRunner.Draw(box.Axes, 1, i, normal: false, x);
                    LoopMetrics.At(box, x, hint);
                }

                if (pass == 1)
                {
                    pointBytes += GC.GetAllocatedBytesForCurrentThread() - b0;
                    pointTicks += Stopwatch.GetTimestamp() - t0;
                }
            }
        }

        var n = (double)Samples * boxes.Length;
        var us = 1e6 / Stopwatch.Frequency;
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  per Monte Carlo sample, {what}, as Monte Carlo runs it (draw, loop from the point): {pointTicks * us / n:0.000} µs, {pointBytes / n:0} B"));
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  per Monte Carlo sample, {what} ({boxes.Length} specs): draw + build {buildTicks * us / n:0.000} µs, {(buildBytes / n) - 8:0} B (less the test's own array slot); loop figures {loopTicks * us / n:0.000} µs, {loopBytes / n:0} B"));
    }
}
