using SpecLint.Core.Analysis;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Tests.Ngspice;
using SpecLint.Core.Units;
using SpecLint.Tests.Shared;
using Xunit.Abstractions;
using static SpecLint.Core.Tests.Tolerance.TolerantSpecs;

namespace SpecLint.Core.Tests.Tolerance;

/// <summary>
/// The worst phase-margin corner, rebuilt with <see cref="ToleranceAnalyzer.CircuitAt"/>, simulated with ngspice
/// (references.md §2). Tolerances as the nominal cross-check (see <see cref="NgspiceCrossCheckTests"/>): PM 5e-6°,
/// bandwidth 2e-4 relative. Without ngspice the tests are skipped, except under CI, where they fail.
/// </summary>
public sealed class WorstCornerNgspiceTests(ITestOutputHelper output)
{
    public static TheoryData<string> Cases => ["photodiode, X7R Cf and a second pole", "0.68 pF C on a fast amplifier"];

    private static TiaSpec Spec(string name) => name switch
    {
        "photodiode, X7R Cf and a second pole" => Channel(
            rf: Rel<Resistance>(1e6, 1),
            cf: Rel<Capacitance>(2.2e-12, 10),
            dielectric: "X7R",
            sensor: Rel<Capacitance>(12e-12, 20),
            rsh: Rel<Resistance>(2e9, 50),
            gbw: Rel<Frequency>(8e6, 30),
            secondPole: Rel<Frequency>(40e6, 20),
            temperature: Range(-10, 60)),
        _ => Channel(
            rf: Rel<Resistance>(100e3, 1),
            cf: Spread<Capacitance>.From(QuantityParser.Parse("0.68 pF C", Dimension.Capacitance)),
            dielectric: "C0G",
            sensor: Rel<Capacitance>(20e-12, 10),
            gbw: Rel<Frequency>(50e6, 20),
            secondPole: Exact<Frequency>(200e6),
            temperature: Range(0, 85)),
    };

    [SkippableTheory]
    [MemberData(nameof(Cases))]
    public void The_worst_corner_agrees_with_ngspice(string name)
    {
        ExternalTool.Require(NgspiceRun.Executable, "ngspice", "apt-get install -y ngspice");

        var spec = Spec(name);
        var t = ToleranceAnalyzer.Analyze(spec, ToleranceOptions.CornersOnly)!;
        var c = ToleranceAnalyzer.CircuitAt(spec, t.PhaseMarginMinAt);
        var r = TiaAnalyzer.Analyze(c, AnalysisOptions.WithoutNoise);
        output.WriteLine($"worst corner: {t.PhaseMarginMinAt.Describe()}");
        Assert.Equal(t.PhaseMarginMin!.Value.Degrees, r.PhaseMargin!.Value.Degrees, 1e-12);

        var (wLo, wHi) = new TiaModel(c).CharacteristicRange();
        var run = NgspiceRun.Execute(NetlistWriter.Write(c, wLo / (2 * Math.PI) / 100, wHi / (2 * Math.PI) * 100, 1, 1e6));
        var f = run.FrequenciesHz;
        var zt0 = run.Transimpedance[0].Magnitude;
        var bw = NgspiceCrossCheckTests.FirstFall(f, [.. run.Transimpedance.Select(z => Math.Log(z.Magnitude / (zt0 / Math.Sqrt(2))))]);
        var crossings = NgspiceCrossCheckTests.Crossings(f, [.. run.LoopGain.Select(g => Math.Log(g.Magnitude))]);
        var phase = NgspiceCrossCheckTests.Unwrap(run.LoopGain);
        var (i, fc, _) = crossings.First(x => x.Falling);
        var pm = 180 + (NgspiceCrossCheckTests.Interpolate(f[i - 1], f[i], phase[i - 1], phase[i], fc) * 180 / Math.PI);

        output.WriteLine($"PM ours {t.PhaseMarginMin.Value.Degrees:F7}° ngspice {pm:F7}°; f-3dB ours {r.Bandwidth?.Hertz:G12} ngspice {bw:G12}");
        Assert.Equal(pm, t.PhaseMarginMin.Value.Degrees, 5e-6);
        Assert.Equal(1, r.Bandwidth!.Value.Hertz / bw!.Value, 2e-4);
    }
}
