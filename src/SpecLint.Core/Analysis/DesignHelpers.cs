using MathNet.Numerics.RootFinding;
using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis;

/// <summary>Values a fix can propose: Cf for a phase margin, Rf limits from headroom and from shot noise.</summary>
public static class DesignHelpers
{
    private const int CfScanPointsPerDecade = 8;

    /// <summary>
    /// The smallest feedback capacitor Cf (added to the circuit's Cpar) whose exact-model phase margin reaches
    /// <paramref name="target"/>, i.e. the widest-band design that meets it. Solved with Brent's method in ln Cf
    /// after a log scan over 10⁻⁴ … 10⁴ × √(Cin/(2π·Rf·GBW)) brackets the first Cf that is good enough; not
    /// the asymptotic "45°" formula, which misses by about 7° (references.md §3.2).
    /// </summary>
    /// <param name="circuit">The operating point; its Cf is replaced.</param>
    /// <param name="target">The phase margin wanted.</param>
    /// <returns>Zero when Cpar alone is enough; null when no Cf in the range reaches the target (e.g. a low second pole).</returns>
    public static Capacitance? FeedbackCapacitanceForPhaseMargin(Circuit circuit, Angle target)
    {
        ArgumentNullException.ThrowIfNull(circuit);
        var targetDeg = target.Degrees;
        double Excess(double cfFarads) => MarginDegrees(circuit with { Cf = new Capacitance(cfFarads) }) - targetDeg;

        if (Excess(0) >= 0)
        {
            return Capacitance.Zero;
        }

        var cin = Math.Max(circuit.Cin.Farads, 1e-15);
        var reference = Math.Sqrt(cin / (2 * Math.PI * circuit.Rf.Ohms * circuit.Gbw.Hertz));
        var uLo = Math.Log(reference * 1e-4);
        var du = Math.Log(10) / CfScanPointsPerDecade;
        var n = 8 * CfScanPointsPerDecade;
        var prev = Excess(Math.Exp(uLo));
        if (prev >= 0)
        {
            return new Capacitance(Math.Exp(uLo));
        }

        for (var i = 1; i <= n; i++)
        {
            var u = uLo + (i * du);
            var g = Excess(Math.Exp(u));
            if (g >= 0)
            {
                var root = Brent.FindRoot(x => Excess(Math.Exp(x)), u - du, u, 1e-10, 200);
                return new Capacitance(Math.Exp(root));
            }
        }

        return null;
    }

    /// <summary>
    /// The largest Rf for which the DC output, from zero signal to full scale with the offset and bias-current
    /// errors at their worst signs (references.md §1 row 12, ideal form), stays <paramref name="margin"/> inside the
    /// op-amp's swing limits. Closed form: each limit is linear in Rf.
    /// </summary>
    /// <param name="circuit">The operating point (its rails, swing, currents, Vos, Ib, Rsh; Rf is ignored).</param>
    /// <param name="margin">Extra room to keep from each swing limit.</param>
    /// <returns>Null when even Rf → 0 does not fit; +∞ when nothing limits Rf.</returns>
    public static Resistance? LargestRfForHeadroom(Circuit circuit, Voltage margin)
    {
        ArgumentNullException.ThrowIfNull(circuit);
        var high = circuit.SupplyPositive.Volts - circuit.SwingToPositive.Volts - margin.Volts;
        var low = circuit.SupplyNegative.Volts + circuit.SwingToNegative.Volts + margin.Volts;
        var pol = circuit.Polarity;
        var idle = pol * circuit.Idark.Amperes;
        var full = pol * (circuit.Imax.Amperes + circuit.Idark.Amperes);
        var vos = Math.Abs(circuit.Vos.Volts);
        var gsh = circuit.Rsh is { } rsh ? 1 / rsh.Ohms : 0;
        // Error per ohm of Rf: Vos·(Rf/Rsh) + Ib·Rf; the |Vos| itself does not scale.
        var errSlope = (vos * gsh) + Math.Abs(circuit.Ib.Amperes);
        var vb = circuit.Vbias.Volts;

        var limit = double.PositiveInfinity;
        // Upper side: vb + vos + (max current + errSlope)·Rf ≤ high; lower side: vb − vos + (min current − errSlope)·Rf ≥ low.
        if (!Bound(vb + vos, Math.Max(idle, full) + errSlope, high, ref limit) ||
            !Bound(-(vb - vos), -(Math.Min(idle, full) - errSlope), -low, ref limit))
        {
            return null;
        }

        return new Resistance(limit);
    }

    /// <summary>
    /// The smallest Rf for which the shot noise of <paramref name="imin"/> is at least Rf's thermal noise:
    /// 2q·Imin ≥ 4kT/Rf ⇔ Rf ≥ 2kT/(q·Imin) (references.md §1 row 11; evaluate at the hottest temperature).
    /// </summary>
    /// <param name="imin">The smallest signal current.</param>
    /// <param name="hottest">The highest operating temperature.</param>
    public static Resistance SmallestShotLimitedRf(Current imin, Temperature hottest)
    {
        var i = Math.Abs(imin.Amperes);
        if (!(i > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(imin), imin.Amperes, "a zero current is never shot-noise limited");
        }

        return new Resistance(2 * PhysicalConstants.ThermalVoltage(hottest).Volts / i);
    }

    private static double MarginDegrees(Circuit c)
    {
        var pm = TiaAnalyzer.Analyze(c, AnalysisOptions.WithoutNoise).PhaseMargin;
        // |T| < 1 everywhere: no crossing can ring, so rank it as fully stable for the search.
        return pm?.Degrees ?? 180;
    }

    /// <summary>Tightens <paramref name="limit"/> with a + b·Rf ≤ c; false when no Rf ≥ 0 satisfies it.</summary>
    private static bool Bound(double a, double b, double c, ref double limit)
    {
        if (a > c)
        {
            return false;
        }

        if (b > 0)
        {
            limit = Math.Min(limit, (c - a) / b);
        }

        return true;
    }
}
