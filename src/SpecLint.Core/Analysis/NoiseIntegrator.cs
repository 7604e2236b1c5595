using MathNet.Numerics.Integration;

namespace SpecLint.Core.Analysis;

/// <summary>
/// Integrates the output noise PSD over a band, in u = ln f (∫S df = ∫S·f du), with Gauss–Legendre
/// panels in u. A log variable makes every decade cost the same and keeps a resonance, whose width in u is
/// about 1/Q, covered by the same number of nodes wherever it sits.
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

    // Panel width near a resonance: at least a quarter of its half-width, and a quarter of the distance to it,
    // so a Lorentzian tail looks smooth on every panel however high the Q (its nearest singularity is then
    // four panel widths away, where 8-node Gauss–Legendre is exact to rounding).
    private const double NearFraction = 0.25;

    /// <summary>
    /// Integrates each source's output PSD over [fLo, fHi]; returns V² per source. Panels are at most
    /// 1/<paramref name="panelsPerDecade"/> decade wide and are graded down towards every resonance of the
    /// noise transfers (the complex closed-loop poles, <see cref="ClosedLoopPoles"/>), whether it shows in |Zt|
    /// or only in the voltage-noise gain.
    /// </summary>
    public static NoiseDensities Integrate(TiaModel model, double fLoHz, double fHiHz, int panelsPerDecade)
    {
        var uLo = Math.Log(fLoHz);
        var uHi = Math.Log(fHiHz);
        var coarse = Math.Log(10) / panelsPerDecade;
        var resonances = ClosedLoopPoles.Resonances(model);
        var sums = new Sums();
        var network = new NetworkSums();
        var u = uLo;
        while (u < uHi)
        {
            var next = Math.Min(uHi, u + PanelWidth(u, coarse, resonances));
            // A panel ends on a resonance centre rather than straddling it.
            foreach (var (centre, _) in resonances)
            {
                if (centre > u && centre < next)
                {
                    next = centre;
                }
            }

            if (model.Network is null)
            {
                Panels(model, u, next, next - u, ref sums);
            }
            else
            {
                NetworkPanels(model, u, next, next - u, ref network);
            }

            u = next;
        }

        if (model.Network is not null)
        {
            return new NoiseDensities(network.Rf, network.Rsh, network.Shot, network.In, network.En) { SeriesThermal = network.Series };
        }

        return new NoiseDensities(
            model.RfThermalPsd * sums.Zt,
            model.RshThermalPsd * sums.Zt,
            model.ShotPsd * sums.Zt,
            model.CurrentNoisePsd * (sums.Zt + (model.CurrentNoiseCornerHz * sums.ZtOverF)),
            model.VoltageNoisePsd * (sums.Ng + (model.VoltageNoiseCornerHz * sums.NgOverF)));
    }

    private static double PanelWidth(double u, double coarse, IReadOnlyList<(double CentreU, double HalfWidthU)> resonances)
    {
        var width = coarse;
        foreach (var (centre, halfWidth) in resonances)
        {
            width = Math.Min(width, Math.Max(NearFraction * halfWidth, NearFraction * Math.Abs(u - centre)));
        }

        return width;
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

    /// <summary>
    /// As <see cref="Panels"/> for a network circuit, where each source has its own transfer: every source's
    /// output PSD (1/f parts included) is integrated on its own.
    /// </summary>
    private static void NetworkPanels(TiaModel model, double a, double b, double maxWidth, ref NetworkSums sums)
    {
        if (!(b > a))
        {
            return;
        }

        var panels = (int)Math.Clamp(Math.Ceiling((b - a) / maxWidth), 1, MaxPanels);
        var h = (b - a) / panels;
        var half = h / 2;
        for (var p = 0; p < panels; p++)
        {
            var mid = a + ((p + 0.5) * h);
            for (var k = 0; k < Order; k++)
            {
                var f = Math.Exp(mid + (half * Nodes[k]));
                var d = model.OutputNoise(new Units.Frequency(f));
                var w = Weights[k] * f * half;
                sums.Rf += w * d.RfThermal;
                sums.Rsh += w * d.RshThermal;
                sums.Shot += w * d.Shot;
                sums.In += w * d.CurrentNoise;
                sums.En += w * d.VoltageNoise;
                sums.Series += w * d.SeriesThermal;
            }
        }
    }

    private struct NetworkSums
    {
        public double Rf;
        public double Rsh;
        public double Shot;
        public double In;
        public double En;
        public double Series;
    }

    private struct Sums
    {
        public double Zt;
        public double ZtOverF;
        public double Ng;
        public double NgOverF;
    }
}
