using System.Numerics;
using System.Text.Json;

namespace SpecLint.Cli.Tests;

/// <summary>
/// The JSON figures against closed forms computed here, independently of SpecLint's solver. The channel is the
/// worked example of references.md §3.2 (Cin = 100 pF, Rf = 1 MΩ, single-pole op-amp of 10 MHz with A0 = 1e9):
/// with A0 that large and Rsh = ∞, Zt = Rf / (1 + s·a1 + s²·a2) with a1 = 1/ωt + Rf·Cf and a2 = Rf·(Cin + Cf)/ωt
/// (references.md §1 row 13), and T = (ωt/s)·(1 + s·Rf·Cf)/(1 + s·Rf·(Cin + Cf)) (rows 1–5).
/// </summary>
public sealed class JsonFiguresTests
{
    private const double Cin = 100e-12;
    private const double Rf = 1e6;
    private const double Gbw = 10e6;
    private const double CfTyp = 1.5e-12;
    private const double CfSpread = 0.2;
    private const double Floor = 60;

    private static readonly string Spec = """
        spec: 1
        kind: transimpedance
        name: json-figures
        conditions: { temperature: 25 °C, supply: { positive: 12 V, negative: -12 V } }
        bias: 0.5 V
        input: { type: photodiode, capacitance: 100 pF, current: { min: 1 µA, max: 5 µA } }
        amplifier:
          gbw: 10 MHz
          open-loop-gain: 180 dB
          voltage-noise: 10 nV/√Hz
          current-noise: 1 fA/√Hz
          input-capacitance: { common-mode: 0 pF, differential: 0 pF }
          bias-current: 0 A
          offset-voltage: 0 V
          output-swing: { to-negative: 0 V, to-positive: 0 V }
        feedback:
          resistance: 1 MΩ
          capacitance: 1.5 pF ±20%
          dielectric: C0G
        requirements: { phase-margin: 60 deg, peaking: 3 dB }
        """;

    // Only Cf varies, uniformly over ±20 %; PM rises with Cf, so the yield is the share of that range above the Cf
    // whose PM is exactly the floor. 20 000 samples: the binomial standard error is below 0.0036.
    private const string Config = "monte-carlo: { samples: 20000, seed: 7, distribution: uniform }\n";

    [Fact]
    public void Json_metrics_corners_and_yield_match_the_closed_forms()
    {
        using var cli = new CliHarness();
        cli.Write(".speclint.yaml", Config);
        cli.Write("hw/ch.tia.yaml", Spec);

        var (_, output, error) = cli.Run("check", "hw", "--format", "json", "--quiet");

        using var doc = JsonDocument.Parse(output);
        var spec = doc.RootElement.GetProperty("specs")[0];
        var m = spec.GetProperty("metrics");
        Assert.True(m.ValueKind == JsonValueKind.Object, error);

        // DC gain Rf·T0/(1 + T0), T0 = A0 = 1e9 with Rsh = ∞.
        Assert.Equal(Rf * 1e9 / (1 + 1e9), m.GetProperty("transimpedanceOhm").GetDouble(), 1e-6);
        Assert.Equal(1 + (Cin / CfTyp), m.GetProperty("noiseGainHighFrequency").GetDouble(), 1e-9);
        var (pm, fc) = PhaseMargin(CfTyp);
        Assert.Equal(pm, m.GetProperty("phaseMarginDeg").GetDouble(), 2e-5);
        Assert.Equal(1, m.GetProperty("crossoverHz").GetDouble() / fc, 1e-6);
        Assert.Equal(1, m.GetProperty("bandwidthHz").GetDouble() / Bandwidth(CfTyp), 1e-6);
        Assert.Equal(PeakingDb(CfTyp), m.GetProperty("peakingDb").GetDouble(), 1e-5);
        Assert.Equal(0.5 + (5e-6 * Rf), m.GetProperty("outputMaxV").GetDouble(), 1e-6);

        var corners = spec.GetProperty("corners");
        Assert.Equal(PhaseMargin(CfTyp * (1 - CfSpread)).Deg, corners.GetProperty("phaseMarginDegMin").GetDouble(), 2e-5);
        Assert.Equal(1, corners.GetProperty("bandwidthHzMin").GetDouble() / Bandwidth(CfTyp * (1 + CfSpread)), 1e-6);

        var mc = spec.GetProperty("monteCarlo");
        Assert.Equal(20000, mc.GetProperty("samples").GetInt32());
        Assert.Equal(7, mc.GetProperty("seed").GetInt32());
        var cfAtFloor = Bisect(cf => PhaseMargin(cf).Deg - Floor, CfTyp * (1 - CfSpread), CfTyp * (1 + CfSpread));
        var expectedYield = ((CfTyp * (1 + CfSpread)) - cfAtFloor) / (2 * CfSpread * CfTyp);
        var standardError = Math.Sqrt(expectedYield * (1 - expectedYield) / 20000);
        Assert.InRange(mc.GetProperty("yield").GetDouble(), expectedYield - (4 * standardError), expectedYield + (4 * standardError));
    }

    private static (double Deg, double Hz) PhaseMargin(double cf)
    {
        var wt = 2 * Math.PI * Gbw;
        double Mag(double w) => wt / w * Math.Sqrt(1 + Math.Pow(w * Rf * cf, 2)) / Math.Sqrt(1 + Math.Pow(w * Rf * (Cin + cf), 2));
        var wc = Math.Exp(Bisect(u => Math.Log(Mag(Math.Exp(u))), Math.Log(1), Math.Log(1e12)));
        return (90 + ((Math.Atan(wc * Rf * cf) - Math.Atan(wc * Rf * (Cin + cf))) * 180 / Math.PI), wc / (2 * Math.PI));
    }

    private static (double A1, double A2) Coefficients(double cf)
    {
        var wt = 2 * Math.PI * Gbw;
        return ((1 / wt) + (Rf * cf), Rf * (Cin + cf) / wt);
    }

    // |1 + jω·a1 − ω²·a2|² = 2 is a quadratic in x = ω².
    private static double Bandwidth(double cf)
    {
        var (a1, a2) = Coefficients(cf);
        var b = (a1 * a1) - (2 * a2);
        var x = (-b + Math.Sqrt((b * b) + (4 * a2 * a2))) / (2 * a2 * a2);
        return Math.Sqrt(x) / (2 * Math.PI);
    }

    // The minimum of |den|² over x = ω² is at x = (2·a2 − a1²)/(2·a2²) when that is positive.
    private static double PeakingDb(double cf)
    {
        var (a1, a2) = Coefficients(cf);
        var x = ((2 * a2) - (a1 * a1)) / (2 * a2 * a2);
        if (x <= 0)
        {
            return 0;
        }

        var den = new Complex(1 - (x * a2), Math.Sqrt(x) * a1).Magnitude;
        return -20 * Math.Log10(den);
    }

    private static double Bisect(Func<double, double> f, double lo, double hi)
    {
        var flo = f(lo);
        for (var i = 0; i < 200; i++)
        {
            var mid = 0.5 * (lo + hi);
            if ((f(mid) > 0) == (flo > 0))
            {
                lo = mid;
            }
            else
            {
                hi = mid;
            }
        }

        return 0.5 * (lo + hi);
    }
}
