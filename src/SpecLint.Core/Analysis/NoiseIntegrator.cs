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

    // Nodes and weights on [-1, 1], from MathNet once; per panel they are only shifted and scaled.
    private static readonly double[] Nodes;
    private static readonly double[] Weights;

    static NoiseIntegrator()
    {
        var rule = new GaussLegendreRule(-1, 1, Order);
        Nodes = rule.Abscissas;
        Weights = rule.Weights;
    }

    /// <summary>Integrates each source's output PSD over [fLo, fHi]; returns V² per source.</summary>
    public static NoiseDensities Integrate(TiaModel model, double fLoHz, double fHiHz, int panelsPerDecade)
    {
        var uLo = Math.Log(fLoHz);
        var uHi = Math.Log(fHiHz);
        var panels = Math.Max(1, (int)Math.Ceiling((uHi - uLo) / Math.Log(10) * panelsPerDecade));
        var h = (uHi - uLo) / panels;
        var half = h / 2;

        // Four sums cover all five sources: each is white·|H|² plus corner·|H|²/f, and ∫(·)df = ∫(·)f du.
        double zt = 0, ztOverF = 0, ng = 0, ngOverF = 0;
        for (var p = 0; p < panels; p++)
        {
            var mid = uLo + ((p + 0.5) * h);
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

        zt *= half;
        ztOverF *= half;
        ng *= half;
        ngOverF *= half;
        return new NoiseDensities(
            model.RfThermalPsd * zt,
            model.RshThermalPsd * zt,
            model.ShotPsd * zt,
            model.CurrentNoisePsd * (zt + (model.CurrentNoiseCornerHz * ztOverF)),
            model.VoltageNoisePsd * (ng + (model.VoltageNoiseCornerHz * ngOverF)));
    }
}
