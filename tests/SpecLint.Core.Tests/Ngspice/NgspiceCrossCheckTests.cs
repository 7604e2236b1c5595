using System.Numerics;
using SpecLint.Core.Analysis;
using SpecLint.Core.Units;
using Xunit.Abstractions;

namespace SpecLint.Core.Tests.Ngspice;

/// <summary>
/// The analysis against ngspice on invented circuits (REFERENCE §2). Tolerances: PM 0.5°, bandwidth and crossover
/// 1 %, integrated noise 2 %, DC output 1 mV. Without ngspice the tests pass with a note, except under CI=true,
/// where they fail.
/// </summary>
public sealed class NgspiceCrossCheckTests(ITestOutputHelper output)
{
    public static TheoryData<string> Cases => [.. NgspiceCases.All.Keys];

    [Theory]
    [MemberData(nameof(Cases))]
    public void Analysis_agrees_with_ngspice(string name)
    {
        if (NgspiceRun.Executable is null)
        {
            Assert.False(
                string.Equals(Environment.GetEnvironmentVariable("CI"), "true", StringComparison.OrdinalIgnoreCase),
                "ngspice is not on PATH; CI must install it (Debian package ngspice)");
            output.WriteLine("ngspice is not on PATH: cross-check not run (install the Debian package ngspice).");
            return;
        }

        var c = NgspiceCases.All[name];
        var r = TiaAnalyzer.Analyze(c, AnalysisOptions.Default);
        var (wLo, wHi) = new TiaModel(c).CharacteristicRange();
        var noise = r.Noise!;
        var run = NgspiceRun.Execute(NetlistWriter.Write(
            c, wLo / (2 * Math.PI) / 100, wHi / (2 * Math.PI) * 100, noise.BandLow.Hertz, noise.BandHigh.Hertz));

        var f = run.FrequenciesHz;
        var zt0 = run.Transimpedance[0].Magnitude;
        output.WriteLine($"|Zt(0)| ours {r.Transimpedance.Ohms:G8} ngspice {zt0:G8}");
        Assert.Equal(1, r.Transimpedance.Ohms / zt0, 1e-4);

        var bw = FirstFall(f, run.Transimpedance.Select(z => Math.Log(z.Magnitude / (zt0 / Math.Sqrt(2)))).ToArray());
        output.WriteLine($"f-3dB ours {r.Bandwidth?.Hertz:G8} ngspice {bw:G8}");
        Assert.NotNull(bw);
        Assert.Equal(1, r.Bandwidth!.Value.Hertz / bw.Value, 0.01);

        var logT = run.LoopGain.Select(t => Math.Log(t.Magnitude)).ToArray();
        var phase = Unwrap(run.LoopGain);
        var crossings = Crossings(f, logT);
        output.WriteLine($"crossings ours {r.Crossings.Length} ngspice {crossings.Count}");
        Assert.Equal(crossings.Count, r.Crossings.Length);
        var falling = crossings.FindIndex(x => x.Falling);
        if (falling < 0)
        {
            Assert.Null(r.PhaseMargin);
        }
        else
        {
            var (i, fc) = (crossings[falling].Index, crossings[falling].Hz);
            var ph = Interpolate(f[i - 1], f[i], phase[i - 1], phase[i], fc);
            var pm = 180 + (ph * 180 / Math.PI);
            output.WriteLine($"PM ours {r.PhaseMargin?.Degrees:F4}° ngspice {pm:F4}°, fc ours {r.Crossover?.Hertz:G8} ngspice {fc:G8}");
            Assert.Equal(pm, r.PhaseMargin!.Value.Degrees, 0.5);
            Assert.Equal(1, r.Crossover!.Value.Hertz / fc, 0.01);
        }

        output.WriteLine($"noise rms ours {noise.OutputRms.Volts:G8} ngspice {run.NoiseRmsVolts:G8} (its own total {run.NgspiceTotalVolts:G8}) over {noise.BandLow.Hertz} Hz .. {noise.BandHigh.Hertz} Hz");
        Assert.Equal(1, noise.OutputRms.Volts / run.NoiseRmsVolts, 0.02);

        var dcMin = run.DcOutputs.Min();
        var dcMax = run.DcOutputs.Max();
        output.WriteLine($"DC ours {r.Output.Min.Volts:G8} .. {r.Output.Max.Volts:G8} ngspice {dcMin:G8} .. {dcMax:G8}");
        Assert.Equal(dcMin, r.Output.Min.Volts, 1e-3);
        Assert.Equal(dcMax, r.Output.Max.Volts, 1e-3);
    }

    internal static double? FirstFall(double[] f, double[] g)
    {
        for (var i = 1; i < f.Length; i++)
        {
            if (g[i - 1] > 0 && g[i] <= 0)
            {
                return RootLogF(f[i - 1], f[i], g[i - 1], g[i]);
            }
        }

        return null;
    }

    internal static List<(int Index, double Hz, bool Falling)> Crossings(double[] f, double[] logT)
    {
        var list = new List<(int, double, bool)>();
        for (var i = 1; i < f.Length; i++)
        {
            if ((logT[i - 1] > 0) != (logT[i] > 0))
            {
                list.Add((i, RootLogF(f[i - 1], f[i], logT[i - 1], logT[i]), logT[i] <= 0));
            }
        }

        return list;
    }

    /// <summary>Linear interpolation in ln f for the zero of g between two samples.</summary>
    private static double RootLogF(double f0, double f1, double g0, double g1)
    {
        var u = Math.Log(f0) + ((Math.Log(f1) - Math.Log(f0)) * g0 / (g0 - g1));
        return Math.Exp(u);
    }

    internal static double Interpolate(double f0, double f1, double y0, double y1, double f) =>
        y0 + ((y1 - y0) * (Math.Log(f / f0) / Math.Log(f1 / f0)));

    /// <summary>Phase unwrapped from the first (near-DC) point: steps of more than π are taken as wraps.</summary>
    internal static double[] Unwrap(Complex[] values)
    {
        var result = new double[values.Length];
        result[0] = values[0].Phase;
        for (var i = 1; i < values.Length; i++)
        {
            var d = values[i].Phase - values[i - 1].Phase;
            d -= 2 * Math.PI * Math.Round(d / (2 * Math.PI));
            result[i] = result[i - 1] + d;
        }

        return result;
    }
}
