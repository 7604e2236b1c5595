using System.Numerics;
using SpecLint.Reporting.Plots;

namespace SpecLint.Reporting.Tests.Plots;

/// <summary>
/// Sweeps of the references.md §D3 example channel (8 MHz op-amp, 1 MΩ ∥ 2.35 pF, 17.8 pF at the summing node), computed
/// here with the references.md §D4 model so the charts get realistic shapes. Test data only: reporters never compute physics.
/// </summary>
internal static class SampleChannel
{
    private const double Boltzmann = 1.380649e-23;
    private const double Electron = 1.602176634e-19;

    public static double[] Frequencies { get; } = Enumerable.Range(0, 241).Select(i => Math.Pow(10, i / 30.0)).ToArray();

    public static Chart LoopGain()
    {
        var (t, _) = Sweep();
        var mag = t.Select(v => 20 * Math.Log10(v.Magnitude)).ToArray();
        var phase = Unwrap(t.Select(v => v.Phase * 180 / Math.PI).ToArray());
        var i = Array.FindIndex(mag, m => m < 0);
        var fc = Interpolate(Frequencies[i - 1], Frequencies[i], mag[i - 1], mag[i]);
        var pm = 180 + phase[i - 1] + ((phase[i] - phase[i - 1]) * (Math.Log(fc / Frequencies[i - 1]) / Math.Log(Frequencies[i] / Frequencies[i - 1])));
        return LoopGainChart.Build(Frequencies, mag, phase, fc, pm);
    }

    public static Chart Transimpedance()
    {
        var (_, zt) = Sweep();
        var mag = zt.Select(z => z.Magnitude).ToArray();
        var dc = mag[0];
        var i = Array.FindIndex(mag, m => m < dc / Math.Sqrt(2));
        var bw = Interpolate(Frequencies[i - 1], Frequencies[i], 20 * Math.Log10(mag[i - 1] / dc) + 3.0103, 20 * Math.Log10(mag[i] / dc) + 3.0103);
        return TransimpedanceChart.Build(Frequencies, mag, bw, dc);
    }

    public static Chart NoiseDensity()
    {
        var (t, zt) = Sweep();
        const double kelvin = 333.15;
        const double rf = 1e6;
        var ztMag = zt.Select(z => z.Magnitude).ToArray();
        var thermal = ztMag.Select(z => Math.Sqrt(4 * Boltzmann * kelvin / rf) * z).ToArray();
        var shot = ztMag.Select(z => Math.Sqrt(2 * Electron * (2e-9 + 50e-12)) * z).ToArray();
        var current = ztMag.Select(z => 0.6e-15 * z).ToArray();
        var voltage = Frequencies.Select((f, k) =>
        {
            var a = OpenLoop(f);
            var beta = t[k] / a;
            return 7e-9 * Math.Sqrt(1 + (200 / f)) * (a / (1 + (a * beta))).Magnitude;
        }).ToArray();
        var total = Frequencies.Select((_, k) => Math.Sqrt((thermal[k] * thermal[k]) + (shot[k] * shot[k]) + (current[k] * current[k]) + (voltage[k] * voltage[k]))).ToArray();
        return NoiseDensityChart.Build(
            Frequencies,
            [new("Rf thermal", thermal), new("signal shot", shot), new("op-amp in", current), new("op-amp en", voltage)],
            total,
            1,
            100e3);
    }

    private static (Complex[] LoopGain, Complex[] Transimpedance) Sweep()
    {
        const double rf = 1e6, cf = 2.35e-12, cin = 17.8e-12, rsh = 2e9;
        var t = new Complex[Frequencies.Length];
        var zt = new Complex[Frequencies.Length];
        for (var k = 0; k < Frequencies.Length; k++)
        {
            var s = new Complex(0, 2 * Math.PI * Frequencies[k]);
            var zf = rf / (1 + (s * rf * cf));
            var zin = rsh / (1 + (s * rsh * cin));
            var beta = zin / (zin + zf);
            t[k] = OpenLoop(Frequencies[k]) * beta;
            zt[k] = zf * t[k] / (1 + t[k]);
        }

        return (t, zt);
    }

    private static Complex OpenLoop(double f)
    {
        var a0 = Math.Pow(10, 115 / 20.0);
        var fa = 8e6 / a0;
        var s = new Complex(0, f);
        return a0 / ((1 + (s / fa)) * (1 + (s / 40e6)));
    }

    private static double[] Unwrap(double[] deg)
    {
        var result = (double[])deg.Clone();
        for (var k = 1; k < result.Length; k++)
        {
            while (result[k] - result[k - 1] > 180)
            {
                result[k] -= 360;
            }

            while (result[k] - result[k - 1] < -180)
            {
                result[k] += 360;
            }
        }

        return result;
    }

    /// <summary>Log-frequency interpolation of the zero of y between two sweep points.</summary>
    private static double Interpolate(double f0, double f1, double y0, double y1) =>
        Math.Exp(Math.Log(f0) + ((Math.Log(f1) - Math.Log(f0)) * (y0 / (y0 - y1))));
}
