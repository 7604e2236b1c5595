namespace SpecLint.Core.Analysis;

/// <summary>
/// Phase margin, −3 dB bandwidth and peaking of a plain circuit (no switch, wiper, unselected branch or access
/// resistance) from polynomials in x = ω², without a scan: the fast path of corners and Monte Carlo.
/// </summary>
/// <remarks>
/// <para>For the plain model (<see cref="TiaModel"/>) |T|² = (gf² + x·cf²) / ((gs² + x·cs²)(a0² + x·τt²)(1 + x·τ2²))
/// and |Zt|² = 1/|D(jω)|², D(s) = c0 + c1·s + c2·s² + c3·s³ (<see cref="TiaModel.DenominatorCoefficients"/>), so
/// |D(jω)|² = c0² + x(c1² − 2c0c2) + x²(c2² − 2c1c3) + x³c3². The crossings |T| = 1 are the positive roots of a cubic
/// in x, and so are the −3 dB points; by Descartes' rule of signs (common practice) one sign change in the
/// coefficients means exactly one positive root, so the full scan finds that root and no other, and a bracketed
/// Newton iteration in x finds it too, from a bracket around a nearby point's root.</para>
/// <para>d|D|²/dx is a quadratic, so |Zt|² has at most one interior maximum and the peak has a closed form. The
/// full scan keeps the largest of its samples and refines around it, which is that maximum whenever samples fall
/// where |Zt| exceeds its DC value; the fast path checks that they do.</para>
/// <para>Whenever a sign is uncertain (two parts of a coefficient cancel), there may be more than one root, a root
/// or the peak lies within two scan steps of the scan's ends, or the peak is too narrow for the scan to see,
/// <c>TryFigures</c> declines and the caller runs the scan, so the figures stay those of the full analysis.</para>
/// </remarks>
internal readonly struct PlainLoop
{
    private const double TwoPi = 2 * Math.PI;

    // A coefficient whose parts cancel to within this fraction of their size has no trusted sign.
    private const double SignGuard = 1e-9;

    // Newton stops once a step moves x by less than this fraction: the next error is about its square.
    private const double StepTolerance = 1e-13;
    private const int MaxIterations = 100;
    private const int MaxWidenings = 80;
    private const double MinMarginDeg = 0.01;

    // A peak within this of 0 dB may or may not show in the scan's samples: the scan decides those.
    private const double PeakBoundaryDb = 1e-9;

    // Relative distance from the DC value of |Zt|² beyond which rounding (a few 1e-16 near DC) cannot lift a
    // sample above it.
    private const double NearDcBand = 1e-14;

    private readonly double _gf;
    private readonly double _cf;
    private readonly double _gsh;
    private readonly double _cin;
    private readonly double _a0;
    private readonly double _tt;
    private readonly double _t2;
    private readonly double _c0;
    private readonly double _c1;
    private readonly double _c2;
    private readonly double _c3;

    /// <summary>The loop of a plain circuit from its values in SI (as <see cref="Circuit"/> holds them).</summary>
    /// <param name="rf">Rf.</param>
    /// <param name="feedbackCapacitance">Cf + Cpar.</param>
    /// <param name="rsh">Rsh, or null for none.</param>
    /// <param name="cin">Everything from the node to AC ground.</param>
    /// <param name="a0">The op-amp's DC gain, linear.</param>
    /// <param name="gbw">Gain-bandwidth product, Hz.</param>
    /// <param name="secondPole">Second pole, Hz, or null.</param>
    public PlainLoop(double rf, double feedbackCapacitance, double? rsh, double cin, double a0, double gbw, double? secondPole)
    {
        _gf = 1 / rf;
        _cf = feedbackCapacitance;
        _gsh = rsh is { } r ? 1 / r : 0;
        _cin = cin;
        _a0 = 1 / a0;
        _tt = 1 / (TwoPi * gbw);
        _t2 = secondPole is { } p2 ? 1 / (TwoPi * p2) : 0;
        var gs = _gf + _gsh;
        var cs = _cf + _cin;
        _c0 = _gf + (gs * _a0);
        _c1 = _cf + (gs * (_tt + (_a0 * _t2))) + (cs * _a0);
        _c2 = (gs * _tt * _t2) + (cs * (_tt + (_a0 * _t2)));
        _c3 = cs * _tt * _t2;
        Valid = rf > 0 && !double.IsInfinity(rf) && gbw > 0 && a0 > 0;
    }

    /// <summary>False when the model would refuse the values (the scan then reports why).</summary>
    public bool Valid { get; }

    /// <summary>
    /// The figures of <paramref name="circuit"/> as the full analysis finds them, or false when this path cannot
    /// vouch for that (the caller then scans). Allocates nothing.
    /// </summary>
    /// <param name="circuit">A plain circuit (<see cref="Circuit.HasNetwork"/> false).</param>
    /// <param name="pointsPerDecade">The full scan's density, which sets how close to its ends a root may lie.</param>
    /// <param name="hint">Roots of a nearby point, or <see cref="LoopHint.None"/>.</param>
    /// <param name="figures">Phase margin (degrees), bandwidth (Hz), peaking (dB).</param>
    /// <param name="roots">ω² of this circuit's crossover and −3 dB point (0 where there is none), a hint for others.</param>
    public static bool TryFigures(
        Circuit circuit,
        int pointsPerDecade,
        in LoopHint hint,
        out (double? PhaseMarginDeg, double? BandwidthHz, double PeakingDb) figures,
        out LoopHint roots)
    {
        figures = default;
        roots = default;
        return !circuit.HasNetwork
            && new PlainLoop(
                circuit.Rf.Ohms,
                circuit.FeedbackCapacitance.Farads,
                circuit.Rsh?.Ohms,
                circuit.Cin.Farads,
                circuit.A0.Linear,
                circuit.Gbw.Hertz,
                circuit.SecondPole?.Hertz).TryFigures(pointsPerDecade, hint, out figures, out roots);
    }

    /// <summary>As <see cref="TryFigures(Circuit, int, in LoopHint, out ValueTuple{double?, double?, double}, out LoopHint)"/>, for these values.</summary>
    /// <param name="pointsPerDecade">The full scan's density.</param>
    /// <param name="hint">Roots of a nearby point, or <see cref="LoopHint.None"/>.</param>
    /// <param name="figures">Phase margin (degrees), bandwidth (Hz), peaking (dB).</param>
    /// <param name="roots">ω² of the crossover and −3 dB point (0 where there is none).</param>
    public bool TryFigures(
        int pointsPerDecade,
        in LoopHint hint,
        out (double? PhaseMarginDeg, double? BandwidthHz, double PeakingDb) figures,
        out LoopHint roots)
    {
        figures = default;
        roots = default;
        if (!Valid)
        {
            return false;
        }

        // The full scan's span and step, computed as it computes them.
        var (wLo, wHi) = CharacteristicRange();
        var uLo = Math.Log(wLo / TiaAnalyzer.ScanMargin);
        var uHi = Math.Log(wHi * TiaAnalyzer.ScanMargin);
        var du = Math.Max(Math.Log(10) / pointsPerDecade, (uHi - uLo) / TiaAnalyzer.MaxScanPoints);
        if (!double.IsFinite(du) || !(du > 0) || !double.IsFinite(uLo))
        {
            return false;
        }

        var n = (int)Math.Min(Math.Ceiling((uHi - uLo) / du), TiaAnalyzer.MaxScanPoints);
        if (n < 6)
        {
            return false;
        }

        // Roots this far inside the scan's span are bracketed by it, away from its first and last points.
        var xMin = Math.Exp(2 * (uLo + (2 * du)));
        var xMax = Math.Exp(2 * (uLo + ((n - 2) * du)));
        var guess = wLo * wHi;

        if (!TryCrossover(hint.CrossoverOmegaSquared > 0 ? hint.CrossoverOmegaSquared : guess, xMin, xMax, out var pm, out var xc)
            || !TryBandwidth(hint.BandwidthOmegaSquared > 0 ? hint.BandwidthOmegaSquared : guess, xMin, xMax, out var xb)
            || !TryPeaking(uLo, du, n, xMin, xMax, Math.Exp(2 * du), out var peakingDb))
        {
            return false;
        }

        figures = (pm, xb > 0 ? Math.Sqrt(xb) / TwoPi : null, peakingDb);
        roots = new LoopHint(xc, xb);
        return true;
    }

    /// <summary>The same span as <see cref="TiaModel.CharacteristicRange"/> for a plain circuit.</summary>
    private (double Low, double High) CharacteristicRange()
    {
        var lo = double.PositiveInfinity;
        var hi = 0.0;
        var wt = 1 / _tt;
        Take(wt, ref lo, ref hi);
        Take(wt * _a0, ref lo, ref hi);
        if (_t2 > 0)
        {
            Take(1 / _t2, ref lo, ref hi);
        }

        if (_cf > 0)
        {
            Take(_gf / _cf, ref lo, ref hi);
        }

        if (_cf + _cin > 0)
        {
            Take((_gf + _gsh) / (_cf + _cin), ref lo, ref hi);
        }

        return (lo, hi);
    }

    private static void Take(double w, ref double lo, ref double hi)
    {
        if (w > 0 && !double.IsInfinity(w))
        {
            lo = Math.Min(lo, w);
            hi = Math.Max(hi, w);
        }
    }

    /// <summary>The phase margin at the only falling crossing, or null when the loop has none.</summary>
    private bool TryCrossover(double guess, double xMin, double xMax, out double? pm, out double xc)
    {
        pm = null;
        xc = 0;
        double gs = _gf + _gsh, cs = _cf + _cin;
        double a = gs * gs, b = cs * cs, c = _a0 * _a0, d = _tt * _tt, e = _t2 * _t2;
        // Den − Num of |T|², ascending powers of x; the two highest have no negative part.
        var d1 = (a * d) + (b * c) + (a * c * e);
        var s0 = Sign((a * c) - (_gf * _gf), (a * c) + (_gf * _gf));
        var s1 = Sign(d1 - (_cf * _cf), d1 + (_cf * _cf));
        var s2 = Sign((b * d) + (((a * d) + (b * c)) * e), 0);
        var s3 = Sign(b * d * e, 0);
        if (s0 == 0 || s0 == Uncertain || s1 == Uncertain)
        {
            return false;
        }

        var changes = SignChanges(s0, s1, s2, s3);
        if (changes == 0 || (changes == 1 && s0 > 0))
        {
            // |T| stays on one side of 1, or rises through it once and never falls back.
            return true;
        }

        if (changes != 1 || !Solve(Excess.Loop, guess, out xc) || xc < xMin || xc > xMax)
        {
            return false;
        }

        // As TiaModel.LoopGainPhaseRadians and Angle arithmetic evaluate it.
        var w = Math.Sqrt(xc);
        var phase = Math.Atan(w * _cf / _gf)
            - Math.Atan(w * (_cf + _cin) / (_gf + _gsh))
            - Math.Atan2(w * _tt, _a0)
            - Math.Atan(w * _t2);
        pm = ((180 * Math.PI / 180) + phase) * 180 / Math.PI;

        // The scan's refinement stops within about 1e-14 in ln ω, some 1e-14 degrees of margin: relative to a
        // margin within a hundredth of a degree of 0° that is no longer small, so those go to the scan.
        return Math.Abs(pm.Value) >= MinMarginDeg;
    }

    /// <summary>ω² of the only −3 dB point, or 0 when |Zt| never falls that far.</summary>
    private bool TryBandwidth(double guess, double xMin, double xMax, out double xb)
    {
        xb = 0;
        var s1 = Sign((_c1 * _c1) - (2 * _c0 * _c2), (_c1 * _c1) + (2 * _c0 * _c2));
        var s2 = Sign((_c2 * _c2) - (2 * _c1 * _c3), (_c2 * _c2) + (2 * _c1 * _c3));
        var s3 = Sign(_c3 * _c3, 0);
        if (s1 == Uncertain || s2 == Uncertain)
        {
            return false;
        }

        var changes = SignChanges(-1, s1, s2, s3);
        if (changes == 0)
        {
            return true;
        }

        return changes == 1 && Solve(Excess.Band, guess, out xb) && xb >= xMin && xb <= xMax;
    }

    /// <summary>
    /// Peaking at the minimum of |D|² when there is a real peak and the scan's samples see it: the region where |Zt|
    /// exceeds its DC value reaches at least one scan step either side of the peak (<paramref name="step"/> is that
    /// step as a factor in x). Without a peak, what the scan makes of rounding next to DC (<see cref="NearDcPeaking"/>).
    /// </summary>
    private bool TryPeaking(double uLo, double du, int n, double xMin, double xMax, double step, out double peakingDb)
    {
        peakingDb = 0;
        var e1 = (_c1 * _c1) - (2 * _c0 * _c2);
        var e2 = (_c2 * _c2) - (2 * _c1 * _c3);
        var e3 = _c3 * _c3;

        // The minimum of |D|² is where its slope e1 + 2e2·x + 3e3·x² turns from falling to rising.
        var xs = 0.0;
        if (e3 > 0)
        {
            var disc = (e2 * e2) - (3 * e1 * e3);
            if (disc >= 0)
            {
                var sq = Math.Sqrt(disc);
                xs = e2 > 0 ? -e1 / (e2 + sq) : (sq - e2) / (3 * e3);
            }
        }
        else if (e2 > 0 && e1 < 0)
        {
            xs = -e1 / (2 * e2);
        }

        if (!(xs > 0) || double.IsInfinity(xs))
        {
            peakingDb = NearDcPeaking(uLo, du, n);
            return true;
        }

        var dMin = Band(xs);
        var db = (Math.Log(1 / dMin) - Math.Log(1 / (_c0 * _c0))) * 10 / Math.Log(10);
        if (db <= -PeakBoundaryDb)
        {
            peakingDb = NearDcPeaking(uLo, du, n);
            return true;
        }

        if (db < PeakBoundaryDb)
        {
            return false;
        }

        // Where |D|² < c0²: x·(e1 + e2·x + e3·x²) < 0.
        double xa, xz;
        if (e3 > 0)
        {
            var disc = (e2 * e2) - (4 * e1 * e3);
            var sq = Math.Sqrt(Math.Max(disc, 0));
            var q = -0.5 * (e2 + (e2 >= 0 ? sq : -sq));
            var r1 = q / e3;
            var r2 = q != 0 ? e1 / q : 0;
            (xa, xz) = e1 < 0 ? (0, Math.Max(r1, r2)) : (Math.Min(r1, r2), Math.Max(r1, r2));
        }
        else
        {
            (xa, xz) = (0, -e1 / e2);
        }

        if (xs < xMin || xs > xMax || !(xa < xs / step) || !(xz > xs * step))
        {
            return false;
        }

        peakingDb = db;
        return true;
    }

    /// <summary>
    /// The scan's peaking for a response with no peak: next to DC, |Zt|² differs from its DC value by less than
    /// rounding, and the scan keeps any sample that rounds above it and refines around it (a few 1e-14 dB). Replayed
    /// here with the scan's own arithmetic over those samples only, so corners pick the same point on such ties.
    /// </summary>
    private double NearDcPeaking(double uLo, double du, int n)
    {
        var zt0 = Math.Sqrt(ScanMagnitudeSquared(0));
        var dcSq = zt0 * zt0;
        var peakSq = dcSq;
        var floor = dcSq * (1 - NearDcBand);
        var peakIndex = -1;
        for (var i = 1; i <= n; i++)
        {
            var z2 = ScanMagnitudeSquared(Math.Exp(uLo + (i * du)));
            if (z2 > peakSq)
            {
                peakSq = z2;
                peakIndex = i;
            }
            else if (z2 < floor)
            {
                // Past rounding: without a peak |Zt| does not come back this close to its DC value.
                break;
            }
        }

        if (peakIndex <= 0)
        {
            return 0;
        }

        var logPeak = GoldenMaxLog(uLo + ((peakIndex - 1) * du), uLo + ((peakIndex + 1) * du));
        return Math.Max(0, (logPeak - Math.Log(dcSq)) * 10 / Math.Log(10));
    }

    /// <summary>TiaModel.TransimpedanceMagnitudeSquared for a plain circuit, operation for operation.</summary>
    private double ScanMagnitudeSquared(double w)
    {
        var b = w * _tt;
        var c = w * _t2;
        var iaRe = _a0 - (b * c);
        var iaIm = b + (_a0 * c);
        var sr = _gf + _gsh;
        var si = w * (_cf + _cin);
        var dr = _gf + (sr * iaRe) - (si * iaIm);
        var di = (w * _cf) + (sr * iaIm) + (si * iaRe);
        return 1 / ((dr * dr) + (di * di));
    }

    /// <summary>The scan's golden-section search for the largest ln|Zt|² on [a, b], step for step.</summary>
    private double GoldenMaxLog(double a, double b)
    {
        var invPhi = (Math.Sqrt(5) - 1) / 2;
        var c = b - (invPhi * (b - a));
        var d = a + (invPhi * (b - a));
        var fc = Math.Log(ScanMagnitudeSquared(Math.Exp(c)));
        var fd = Math.Log(ScanMagnitudeSquared(Math.Exp(d)));
        for (var i = 0; i < 40; i++)
        {
            if (fc > fd)
            {
                b = d;
                d = c;
                fd = fc;
                c = b - (invPhi * (b - a));
                fc = Math.Log(ScanMagnitudeSquared(Math.Exp(c)));
            }
            else
            {
                a = c;
                c = d;
                fc = fd;
                d = a + (invPhi * (b - a));
                fd = Math.Log(ScanMagnitudeSquared(Math.Exp(d)));
            }
        }

        return fc > fd ? fc : fd;
    }

    private const int Uncertain = 2;

    /// <summary>Sign of a difference whose parts sum to <paramref name="scale"/>; uncertain when they nearly cancel.</summary>
    private static int Sign(double value, double scale) =>
        Math.Abs(value) <= SignGuard * scale && scale > 0 ? Uncertain : Math.Sign(value);

    private static int SignChanges(int s0, int s1, int s2, int s3)
    {
        var changes = 0;
        var last = s0;
        foreach (var s in (ReadOnlySpan<int>)[s1, s2, s3])
        {
            if (s != 0)
            {
                changes += s != last ? 1 : 0;
                last = s;
            }
        }

        return changes;
    }

    private enum Excess
    {
        Loop,
        Band,
    }

    /// <summary>|D(jω)|² written out, as accurate as the complex evaluation.</summary>
    private double Band(double x)
    {
        var re = _c0 - (_c2 * x);
        var im = _c1 - (_c3 * x);
        return (re * re) + (x * im * im);
    }

    /// <summary>Negative below the root and positive above (the sign analysis proved one root), with its slope in x.</summary>
    private double Evaluate(Excess which, double x, out double slope)
    {
        if (which == Excess.Band)
        {
            var re = _c0 - (_c2 * x);
            var im = _c1 - (_c3 * x);
            slope = (-2 * _c2 * re) + (im * im) - (2 * _c3 * x * im);
            return (re * re) + (x * im * im) - (2 * _c0 * _c0);
        }

        double gs = _gf + _gsh, cs = _cf + _cin;
        var f1 = (gs * gs) + (x * cs * cs);
        var f2 = (_a0 * _a0) + (x * _tt * _tt);
        var f3 = 1 + (x * _t2 * _t2);
        slope = (cs * cs * f2 * f3) + (f1 * _tt * _tt * f3) + (f1 * f2 * _t2 * _t2) - (_cf * _cf);
        return (f1 * f2 * f3) - ((_gf * _gf) + (x * _cf * _cf));
    }

    /// <summary>
    /// The one positive root: a bracket grown geometrically from <paramref name="guess"/> until the signs differ,
    /// then Newton steps, bisecting in ln x whenever a step would leave the bracket.
    /// </summary>
    private bool Solve(Excess which, double guess, out double root)
    {
        root = guess;
        var f = Evaluate(which, guess, out _);
        if (f == 0)
        {
            return true;
        }

        double lo, hi;
        if (f < 0)
        {
            lo = guess;
            hi = guess * 1.1;
            for (var i = 0; Evaluate(which, hi, out _) < 0; i++)
            {
                if (i == MaxWidenings)
                {
                    return false;
                }

                lo = hi;
                hi *= 4;
            }
        }
        else
        {
            hi = guess;
            lo = guess / 1.1;
            for (var i = 0; Evaluate(which, lo, out _) > 0; i++)
            {
                if (i == MaxWidenings)
                {
                    return false;
                }

                hi = lo;
                lo /= 4;
            }
        }

        var x = guess;
        for (var i = 0; i < MaxIterations; i++)
        {
            f = Evaluate(which, x, out var slope);
            if (f == 0)
            {
                root = x;
                return true;
            }

            if (f < 0)
            {
                lo = Math.Max(lo, x);
            }
            else
            {
                hi = Math.Min(hi, x);
            }

            var next = x - (f / slope);
            if (!(next > lo && next < hi))
            {
                next = Math.Sqrt(lo * hi);
            }

            if (Math.Abs(next - x) <= StepTolerance * x || hi - lo <= 4e-16 * hi)
            {
                root = next;
                return true;
            }

            x = next;
        }

        root = x;
        return true;
    }
}
