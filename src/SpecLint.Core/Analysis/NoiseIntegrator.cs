using MathNet.Numerics.Integration;

namespace SpecLint.Core.Analysis;

/// <summary>
/// Integrates the output noise PSD over a band, in u = ln f (∫S df = ∫S·f du), with Gauss–Legendre
/// panels of equal width in u. A log variable makes every decade cost the same and keeps a resonance,
/// whose width in u is about 1/Q, covered by the same number of nodes wherever it sits.
/// </summary>
internal static class NoiseIntegrator
{
    private const int Order = 8;
    private const int MaxPanels = 100_000;

    // Nodes and weights on [-1, 1], from MathNet once; per panel they are only shifted and scaled.
    private static readonly double[] Nodes;
    private static readonly double[] Weights;

    static NoiseIntegrator()
    {
        var rule = new GaussLegendreRule(-1, 1, Order);
        Nodes = rule.Abscissas;
        Weights = rule.Weights;
    }

    /// <summary>
    /// Integrates each source's output PSD over [fLo, fHi]; returns V² per source. With a resonance at
    /// <paramref name="peakHz"/> of quality <paramref name="q"/> (width ≈ 1/Q in ln f), the panels within ±10/Q
    /// of it are narrowed to 0.25/Q so the peak gets the same relative resolution whatever its Q.
    /// </summary>
    public static NoiseDensities Integrate(TiaModel model, double fLoHz, double fHiHz, int panelsPerDecade, double? peakHz, double q)
    {
        var uLo = Math.Log(fLoHz);
        var uHi = Math.Log(fHiHz);
        var coarse = Math.Log(10) / panelsPerDecade;
        var sums = new Sums();
        if (peakHz is { } fp && q > 1 && 0.25 / q < coarse)
        {
            var up = Math.Log(fp);
            var a = Math.Clamp(up - (10 / q), uLo, uHi);
            var b = Math.Clamp(up + (10 / q), uLo, uHi);
            Panels(model, uLo, a, coarse, ref sums);
            Panels(model, a, b, 0.25 / q, ref sums);
            Panels(model, b, uHi, coarse, ref sums);
        }
        else
        {
            Panels(model, uLo, uHi, coarse, ref sums);
        }

        return new NoiseDensities(
            model.RfThermalPsd * sums.Zt,
            model.RshThermalPsd * sums.Zt,
            model.ShotPsd * sums.Zt,
            model.CurrentNoisePsd * (sums.Zt + (model.CurrentNoiseCornerHz * sums.ZtOverF)),
            model.VoltageNoisePsd * (sums.Ng + (model.VoltageNoiseCornerHz * sums.NgOverF)));
    }

    /// <summary>Equal Gauss–Legendre panels no wider than <paramref name="maxWidth"/> over [a, b] in ln f.</summary>
    private static void Panels(TiaModel model, double a, double b, double maxWidth, ref Sums sums)
    {
        if (!(b > a))
        {
            return;
        }

        // Capped so that no band can ask for an unbounded number of panels (the spec limits keep it far below).
        var panels = (int)Math.Clamp(Math.Ceiling((b - a) / maxWidth), 1, MaxPanels);
        var h = (b - a) / panels;
        var half = h / 2;

        // Four sums cover all five sources: each is white·|H|² plus corner·|H|²/f, and ∫(·)df = ∫(·)f du.
        double zt = 0, ztOverF = 0, ng = 0, ngOverF = 0;
        for (var p = 0; p < panels; p++)
        {
            var mid = a + ((p + 0.5) * h);
            for (var k = 0; k < Order; k++)
            {
                var f = Math.Exp(mid + (half * Nodes[k]));
                model.NoiseTerms(f, out var zt2, out var ng2);
                var w = Weights[k];
                zt += w * zt2 * f;
                ztOverF += w * zt2;
                ng += w * ng2 * f;
                ngOverF += w * ng2;
            }
        }

        sums.Zt += zt * half;
        sums.ZtOverF += ztOverF * half;
        sums.Ng += ng * half;
        sums.NgOverF += ngOverF * half;
    }

    private struct Sums
    {
        public double Zt;
        public double ZtOverF;
        public double Ng;
        public double NgOverF;
    }
}
