using System.Collections.Immutable;
using System.Diagnostics;
using System.Globalization;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Config;
using SpecLint.Core.Spec;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;

namespace SpecLint.Benchmarks;

/// <summary>
/// The whole tolerance analysis (vertices, inner search and Monte Carlo) over many specs, timed end to end:
/// <c>dotnet run -c Release --project tests/SpecLint.Benchmarks -- montecarlo [specs] [samples]</c>.
/// Target on the 2-core CI machine: 1000 specs × 1000 samples in ≤ 10 s.
/// </summary>
public static class MonteCarloBench
{
    /// <summary>Runs the bench and prints the timings.</summary>
    public static void Run(int specs, int samples)
    {
        var all = Enumerable.Range(0, specs).Select(Spec).ToArray();
        var options = new ToleranceOptions { MonteCarlo = new MonteCarloSettings(samples, 1, MonteCarloDistribution.Uniform) };

        // Warm-up so the JIT's tiering is not in the figure.
        ToleranceAnalyzer.Analyze(all[0], options);

        var corners = Stopwatch.StartNew();
        var evaluations = 0L;
        foreach (var s in all)
        {
            evaluations += ToleranceAnalyzer.Analyze(s, ToleranceOptions.CornersOnly)!.CornerEvaluations;
        }

        corners.Stop();
        var total = Stopwatch.StartNew();
        var yieldSum = 0.0;
        foreach (var s in all)
        {
            yieldSum += ToleranceAnalyzer.Analyze(s, options)!.MonteCarlo!.Yield;
        }

        total.Stop();
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"{specs} specs, {Environment.ProcessorCount} cores: corners only {corners.Elapsed.TotalSeconds:0.00} s ({evaluations / (double)specs:0} points/spec); corners + {samples} Monte Carlo samples {total.Elapsed.TotalSeconds:0.00} s ({total.Elapsed.TotalMilliseconds * 1000 / ((double)specs * samples):0.00} µs/sample incl. corners); mean yield {yieldSum / specs:0.000}"));
    }

    /// <summary>A photodiode channel with seven spreads (six enter the loop), varied from spec to spec.</summary>
    private static TiaSpec Spec(int i)
    {
        var k = 1 + (0.5 * ((i * 37) % 100) / 100.0);
        return new TiaSpec(
            $"bench{i}.tia.yaml", 1, "transimpedance", $"bench{i}", null, [],
            new Conditions(
                new Spread<Temperature>(Temperature.Room, Temperature.FromCelsius(-10), Temperature.FromCelsius(60), ToleranceForm.Range),
                Spread<Voltage>.Exact(new Voltage(5)),
                Spread<Voltage>.Exact(Voltage.Zero)),
            Spread<Voltage>.Exact(new Voltage(0.2)),
            new SensorInput(SensorType.Photodiode, Rel<Capacitance>(12e-12 * k, 20), Rel<Resistance>(2e9, 50),
                Spread<Current>.Exact(new Current(50e-12)), new Current(2e-9), new Current(1.5e-6), CurrentDirection.OutOfNode, null),
            new Amplifier(Rel<Frequency>(8e6, 30), Gain.FromDecibels(115), Rel<Frequency>(40e6, 20),
                new VoltageNoiseDensity(7e-9), null, new CurrentNoiseDensity(0.6e-15), null,
                new Capacitance(3e-12), new Capacitance(2e-12), Spread<Current>.Exact(new Current(1e-12)),
                Spread<Voltage>.Exact(new Voltage(0.3e-3)), new Voltage(0.02), new Voltage(0.04), null, null),
            new Feedback(Rel<Resistance>(1e6, 1), Rel<Capacitance>(1.5e-12, 10), "X7R", Spread<Capacitance>.Exact(new Capacitance(0.15e-12))),
            new Board(Spread<Capacitance>.Exact(new Capacitance(0.8e-12))),
            new Requirements(new Frequency(50e3), null, null, null),
            ImmutableArray<Waiver>.Empty,
            SourceMap.Empty);
    }

    private static Spread<T> Rel<T>(double typ, double percent)
        where T : struct, IQuantity<T> =>
        new(T.FromSi(typ), T.FromSi(typ * (1 - (percent / 100))), T.FromSi(typ * (1 + (percent / 100))), ToleranceForm.Relative);
}
