using System.Numerics;

namespace SpecLint.Core.Analysis;

/// <summary>
/// The feedback and input networks of a circuit with more than Rf ∥ Cf and a sensor at the node (references.md
/// §D8): the selected branch (Rf ∥ Cf in series with a switch's on-resistance or a wiper), each unselected branch
/// (Rf_k ∥ Cf_k in series with its switch's off-capacitance), and an electrode (current source ∥ Cd ∥ Rsh, then
/// the access resistance Rs to the node, where the op-amp's and the board's capacitance sit).
/// </summary>
/// <remarks>
/// With Vo = −A·Vx and every branch b between the output and the node carrying a series noise voltage e_b,
/// KCL at the node gives Vo·(Yf + (Yf + Yin)/A) = −(I_node + Σ Y_b·e_b): every source reaches the output through
/// Zt = 1/D, D = Yf + Ysum/A, after its own transfer to an equivalent node current. The signal (and the sensor's
/// own noise) reaches the node through Hs = 1/(1 + Rs·(Gsh + sCd)).
/// </remarks>
internal sealed class TiaNetwork
{
    private const double TwoPi = 2 * Math.PI;

    private readonly RcBranch _selected;
    private readonly RcBranch[] _off;
    private readonly RcBranch _source;
    private readonly double _rs;
    private readonly double _gsh;
    private readonly double _cd;
    private readonly double _rfPsd;
    private readonly double _seriesPsd;
    private readonly double[] _offPsd;
    private readonly double _rshPsd;
    private readonly double _rsPsd;

    public TiaNetwork(Circuit c, double kT4)
    {
        var gf = 1 / c.Rf.Ohms;
        _selected = new RcBranch(gf, c.FeedbackCapacitance.Farads, c.FeedbackSeriesResistance.Ohms, 0);
        _off = c.OffBranches.IsDefaultOrEmpty
            ? []
            : [.. c.OffBranches.Select(b => new RcBranch(1 / b.Rf.Ohms, b.Capacitance.Farads, 0, b.OffCapacitance.Farads))];
        _rs = c.SeriesResistance.Ohms;
        _gsh = c.Rsh is { } rsh ? 1 / rsh.Ohms : 0;
        _cd = c.SensorCapacitance.Farads;
        _source = new RcBranch(_gsh, _cd, _rs, 0);
        var node = new RcBranch(0, c.NodeCapacitance.Farads, 0, 0);

        Feedback = new RcAdmittance([_selected, .. _off]);
        Input = new RcAdmittance([_source, node]);
        Sum = new RcAdmittance([_selected, .. _off, _source, node]);

        _rfPsd = kT4 * gf;
        _seriesPsd = kT4 * c.FeedbackSeriesResistance.Ohms;
        _offPsd = [.. _off.Select(b => kT4 * b.G)];
        _rshPsd = kT4 * _gsh;
        _rsPsd = kT4 * _rs;
    }

    /// <summary>Yf: every feedback branch, selected or not.</summary>
    public RcAdmittance Feedback { get; }

    /// <summary>Yin: the sensor branch and the node capacitance.</summary>
    public RcAdmittance Input { get; }

    /// <summary>Yf + Yin.</summary>
    public RcAdmittance Sum { get; }

    /// <summary>
    /// Yf(jω) and (Yf + Yin)(jω) in one pass: the sum of every branch continues from the feedback branches' sum, in
    /// the order <see cref="Sum"/> adds them, so both equal <see cref="Feedback"/> and <see cref="Sum"/> to the last
    /// bit for the cost of one.
    /// </summary>
    public (Complex Feedback, Complex Sum) AdmittancesAtOmega(double w)
    {
        var s = new Complex(0, w);
        Complex yf = 0;
        foreach (var b in Feedback.BranchSpan)
        {
            yf += b.At(s);
        }

        var ysum = yf;
        foreach (var b in Input.BranchSpan)
        {
            ysum += b.At(s);
        }

        return (yf, ysum);
    }

    /// <summary>D(jω) = Yf + (Yf + Yin)/A; Zt = 1/D.</summary>
    public Complex Denominator(double w, Complex inverseA) => Feedback.AtOmega(w) + (Sum.AtOmega(w) * inverseA);

    /// <summary>Hs(jω): the share of the source current that reaches the node.</summary>
    public Complex SignalTransfer(double w) => _rs > 0 ? 1 / (1 + (_rs * new Complex(_gsh, w * _cd))) : Complex.One;

    /// <summary>∠Yf − ∠(Yf + Yin); each angle of an RC admittance lies in [0, π/2], so neither ever wraps.</summary>
    public double FeedbackPhase(double w)
    {
        var yf = Feedback.AtOmega(w);
        var ys = Sum.AtOmega(w);
        return Math.Atan2(yf.Imaginary, yf.Real) - Math.Atan2(ys.Imaginary, ys.Real);
    }

    /// <summary>Slope terms of ln|T| that rise with ω: Yf's zeros and Yin's poles.</summary>
    public double RisingSlope(double w) => SlopeSum(Feedback.Zeros, w) + SlopeSum(Input.Poles, w);

    /// <summary>Slope terms of ln|T| that fall with ω: the zeros of Yf + Yin.</summary>
    public double FallingSlope(double w) => SlopeSum(Sum.Zeros, w);

    /// <summary>
    /// The lowest and highest corner of the networks and of Hs in rad/s (Yf's zeros and poles, the zeros of Yf + Yin,
    /// Yin's poles, Hs's pole; zeros at the origin left out), or (+∞, 0) when there is none. Only the extremes set the
    /// scan's span, so no list is built: every Monte Carlo sample of a network asks.
    /// </summary>
    public (double Low, double High) CharacteristicBounds()
    {
        var lo = double.PositiveInfinity;
        var hi = 0.0;
        void Take(double x)
        {
            if (x > 0 && !double.IsInfinity(x))
            {
                lo = Math.Min(lo, x);
                hi = Math.Max(hi, x);
            }
        }

        foreach (var corners in (ReadOnlySpan<double[]>)[Feedback.Zeros, Feedback.Poles, Sum.Zeros, Input.Poles])
        {
            foreach (var x in corners)
            {
                Take(x);
            }
        }

        if (_rs > 0 && _cd > 0)
        {
            Take((1 + (_rs * _gsh)) / (_rs * _cd));
        }

        return (lo, hi);
    }

    /// <summary>
    /// D(s)·Df(s)·Di(s) = Nf·Di + Ns·(1/A) as a polynomial (ascending powers): its roots are the poles every
    /// noise transfer shares.
    /// </summary>
    public double[] DenominatorCoefficients(double a0, double tt, double t2)
    {
        var (nf, _) = Feedback.Polynomials();
        var (_, di) = Input.Polynomials();
        var (ns, _) = Sum.Polynomials();
        double[] inverseA = [a0, tt + (a0 * t2), tt * t2];
        return Polynomial.Add(Polynomial.Multiply(nf, di), Polynomial.Multiply(ns, inverseA));
    }

    /// <summary>Output PSD of every source at ω, V²/Hz; the op-amp's PSDs come with their 1/f parts already applied.</summary>
    public NoiseDensities OutputNoise(double w, Complex inverseA, double inPsd, double enPsd, double shotPsd)
    {
        var s = new Complex(0, w);
        var zt2 = 1 / Denominator(w, inverseA).MagnitudeSquared();
        var hs2 = SignalTransfer(w).MagnitudeSquared();

        // Selected branch: Rf's noise (a current across Rf ∥ Cf) reaches the node as i/(1 + Rser·(G + sC)),
        // the series resistance's own as e·Ysel.
        var y = _selected.G + (s * _selected.C);
        var rfShare = _selected.SeriesR > 0 ? (1 / (1 + (_selected.SeriesR * y))).MagnitudeSquared() : 1;
        var series = _seriesPsd * _selected.At(s).MagnitudeSquared();

        // Unselected branch: its resistor's noise reaches the node as i·sC0/(G + s(C + C0)).
        for (var k = 0; k < _off.Length; k++)
        {
            var b = _off[k];
            var share = (s * b.SeriesC) / (b.G + (s * (b.C + b.SeriesC)));
            series += _offPsd[k] * share.MagnitudeSquared();
        }

        // The access resistance's noise voltage drives the node through the source branch's admittance.
        series += _rsPsd * _source.At(s).MagnitudeSquared();

        return new NoiseDensities(
            _rfPsd * rfShare * zt2,
            _rshPsd * hs2 * zt2,
            shotPsd * hs2 * zt2,
            inPsd * zt2,
            enPsd * Sum.At(s).MagnitudeSquared() * zt2)
        {
            SeriesThermal = series * zt2,
        };
    }

    private static double SlopeSum(double[] corners, double w)
    {
        var sum = 0.0;
        foreach (var c in corners)
        {
            sum += c > 0 ? w * w / ((c * c) + (w * w)) : 1;
        }

        return sum;
    }
}

/// <summary>Complex helpers for the network model.</summary>
internal static class ComplexExtensions
{
    /// <summary>|z|² without the square root.</summary>
    public static double MagnitudeSquared(this Complex z) => (z.Real * z.Real) + (z.Imaginary * z.Imaginary);
}
