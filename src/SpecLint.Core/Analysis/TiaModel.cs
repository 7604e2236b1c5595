using System.Numerics;
using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis;

/// <summary>
/// The small-signal and noise model of one <see cref="Circuit"/> (references.md §1 rows 1–9), evaluated at
/// any frequency. Built once per operating point; every evaluation is a few dozen flops and allocates
/// nothing, so reports can sweep it for Bode and noise-density plots.
/// </summary>
/// <remarks>
/// Everything is written with conductances, Yin = 1/Rsh + sCin and Yf = 1/Rf + s(Cf + Cpar), and with
/// 1/A(s) = (1/A0 + s/ωt)(1 + s/ωp2), so Rsh = ∞, Cf = 0 and Cin = 0 need no special cases.
/// Then Zt = 1/(Yf + (Yf + Yin)/A), T = Yf·A/(Yf + Yin) and the noise gain A/(1 + Aβ) = (Yf + Yin)·Zt.
/// </remarks>
public sealed class TiaModel
{
    private const double TwoPi = 2 * Math.PI;

    private readonly double _gfSiemens;
    private readonly double _cfbFarads;
    private readonly double _gshSiemens;
    private readonly double _cinFarads;
    private readonly double _invA0;
    private readonly double _invWtSeconds;
    private readonly double _invWp2Seconds;
    private readonly double _currentPsdWhite;
    private readonly double _inPsd;
    private readonly double _inCornerHz;
    private readonly double _enPsd;
    private readonly double _enCornerHz;
    private readonly double _rfThermalPsd;
    private readonly double _rshThermalPsd;
    private readonly double _shotPsd;

    // Set only for a circuit with a switch, wiper, unselected branches or an access resistance (see TiaNetwork).
    private readonly TiaNetwork? _network;

    /// <summary>Prepares the model of <paramref name="circuit"/>, with noise at the circuit's temperature.</summary>
    /// <param name="circuit">The operating point.</param>
    public TiaModel(Circuit circuit)
        : this(circuit, circuit?.Temperature ?? default)
    {
    }

    /// <summary>Prepares the model of <paramref name="circuit"/>, with thermal noise at <paramref name="noiseTemperature"/>.</summary>
    /// <param name="circuit">The operating point.</param>
    /// <param name="noiseTemperature">Temperature of the resistors' thermal noise.</param>
    public TiaModel(Circuit circuit, Temperature noiseTemperature)
    {
        ArgumentNullException.ThrowIfNull(circuit);
        var rf = circuit.Rf.Ohms;
        if (!(rf > 0) || double.IsInfinity(rf))
        {
            throw new ArgumentOutOfRangeException(nameof(circuit), circuit.Rf.Ohms, "Rf must be positive and finite");
        }

        if (!(circuit.Gbw.Hertz > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(circuit), circuit.Gbw.Hertz, "GBW must be positive");
        }

        if (!(circuit.A0.Linear > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(circuit), circuit.A0.Linear, "A0 must be positive");
        }

        Circuit = circuit;
        _gfSiemens = 1 / rf;
        _cfbFarads = circuit.FeedbackCapacitance.Farads;
        _gshSiemens = circuit.Rsh is { } rsh ? 1 / rsh.Ohms : 0;
        _cinFarads = circuit.Cin.Farads;
        _invA0 = 1 / circuit.A0.Linear;
        _invWtSeconds = 1 / (TwoPi * circuit.Gbw.Hertz);
        _invWp2Seconds = circuit.SecondPole is { } p2 ? 1 / (TwoPi * p2.Hertz) : 0;

        var kT4 = 4 * PhysicalConstants.BoltzmannJoulesPerKelvin * noiseTemperature.Kelvin;
        _rfThermalPsd = kT4 * _gfSiemens;
        _rshThermalPsd = kT4 * _gshSiemens;
        _shotPsd = 2 * PhysicalConstants.ElementaryChargeCoulombs * Math.Abs(circuit.Imin.Amperes + circuit.Idark.Amperes);
        _inPsd = circuit.In.AmperesPerRootHertz * circuit.In.AmperesPerRootHertz;
        _inCornerHz = circuit.InCorner.Hertz;
        _enPsd = circuit.En.VoltsPerRootHertz * circuit.En.VoltsPerRootHertz;
        _enCornerHz = circuit.EnCorner.Hertz;
        _currentPsdWhite = _rfThermalPsd + _rshThermalPsd + _shotPsd;
        NoiseTemperature = noiseTemperature;
        if (circuit.HasNetwork)
        {
            _network = new TiaNetwork(circuit, kT4);
        }
    }

    /// <summary>The operating point this model was built from.</summary>
    public Circuit Circuit { get; }

    /// <summary>The temperature of the thermal-noise terms.</summary>
    public Temperature NoiseTemperature { get; }

    /// <summary>Open-loop gain A(jω) = A0 / ((1 + s/ωa)(1 + s/ωp2)).</summary>
    /// <param name="frequency">The frequency.</param>
    public Complex OpenLoopGain(Frequency frequency) => 1 / InverseA(TwoPi * frequency.Hertz);

    /// <summary>Feedback factor β(jω) = Yf / (Yf + Yin).</summary>
    /// <param name="frequency">The frequency.</param>
    public Complex FeedbackFactor(Frequency frequency)
    {
        var w = TwoPi * frequency.Hertz;
        if (_network is { } n)
        {
            return n.Feedback.AtOmega(w) / n.Sum.AtOmega(w);
        }

        var yf = new Complex(_gfSiemens, w * _cfbFarads);
        return yf / (yf + new Complex(_gshSiemens, w * _cinFarads));
    }

    /// <summary>Loop gain T(jω) = A·β. Positive real (A0β0) at DC.</summary>
    /// <param name="frequency">The frequency.</param>
    public Complex LoopGain(Frequency frequency) => LoopGainAt(TwoPi * frequency.Hertz);

    /// <summary>∠T(jω), unwrapped continuously from 0 at DC (sums of pole and zero angles, so never wrapped).</summary>
    /// <param name="frequency">The frequency.</param>
    public Angle LoopGainPhase(Frequency frequency) => new(LoopGainPhaseRadians(TwoPi * frequency.Hertz));

    /// <summary>
    /// Closed-loop transimpedance Zt(jω) = Zf·T/(1 + T), in ohms; real and positive at DC.
    /// Vout = Vbias − Zt·I for a current I into the inverting node (references.md §1 row 6).
    /// </summary>
    /// <param name="frequency">The frequency.</param>
    public Complex Transimpedance(Frequency frequency) => TransimpedanceAt(TwoPi * frequency.Hertz);

    /// <summary>Voltage-noise gain A/(1 + Aβ): from an e_n source at the + input to the output.</summary>
    /// <param name="frequency">The frequency.</param>
    public Complex NoiseGain(Frequency frequency)
    {
        var w = TwoPi * frequency.Hertz;
        if (_network is { } n)
        {
            return n.Sum.AtOmega(w) / n.Denominator(w, InverseA(w));
        }

        return new Complex(_gfSiemens + _gshSiemens, w * (_cfbFarads + _cinFarads)) * TransimpedanceAt(w);
    }

    /// <summary>Output noise PSD of each source at <paramref name="frequency"/> (must be positive).</summary>
    /// <param name="frequency">The frequency.</param>
    public NoiseDensities OutputNoise(Frequency frequency)
    {
        var f = frequency.Hertz;
        var w = TwoPi * f;
        if (_network is { } n)
        {
            return n.OutputNoise(w, InverseA(w), _inPsd * (1 + (_inCornerHz / f)), _enPsd * (1 + (_enCornerHz / f)), _shotPsd);
        }

        var zt = TransimpedanceAt(w);
        var zt2 = (zt.Real * zt.Real) + (zt.Imaginary * zt.Imaginary);
        var gSum = _gfSiemens + _gshSiemens;
        var cSum = _cfbFarads + _cinFarads;
        var ng2 = zt2 * ((gSum * gSum) + (w * cSum * w * cSum));
        return new NoiseDensities(
            _rfThermalPsd * zt2,
            _rshThermalPsd * zt2,
            _shotPsd * zt2,
            _inPsd * (1 + (_inCornerHz / f)) * zt2,
            _enPsd * (1 + (_enCornerHz / f)) * ng2);
    }

    /// <summary>The characteristic angular frequencies (rad/s) of the loop: op-amp poles, β zero and pole, ωt.</summary>
    internal (double Low, double High) CharacteristicRange()
    {
        var lo = double.PositiveInfinity;
        var hi = 0.0;
        void Take(double w)
        {
            if (w > 0 && !double.IsInfinity(w))
            {
                lo = Math.Min(lo, w);
                hi = Math.Max(hi, w);
            }
        }

        var wt = 1 / _invWtSeconds;
        Take(wt);
        if (_network is { } n)
        {
            // Only the extremes matter here; Take ignores the (+∞, 0) of a network without corners.
            var (low, high) = n.CharacteristicBounds();
            Take(low);
            Take(high);
        }

        Take(wt * _invA0);
        if (_invWp2Seconds > 0)
        {
            Take(1 / _invWp2Seconds);
        }

        if (_cfbFarads > 0)
        {
            Take(_gfSiemens / _cfbFarads);
        }

        if (_cfbFarads + _cinFarads > 0)
        {
            Take((_gfSiemens + _gshSiemens) / (_cfbFarads + _cinFarads));
        }

        return (lo, hi);
    }

    /// <summary>
    /// Coefficients (ascending powers of s, SI) of D(s) = Yf + (Yf + Yin)/A(s), the denominator of Zt and of the
    /// voltage-noise gain: with 1/A = (a0 + sτt)(1 + sτ2) and Yf + Yin = gs + s·cs,
    /// D = gf + gs·a0 + s(cf + gs(τt + a0τ2) + cs·a0) + s²(gs·τtτ2 + cs(τt + a0τ2)) + s³·cs·τtτ2.
    /// </summary>
    internal double[] DenominatorCoefficients()
    {
        if (_network is { } n)
        {
            return n.DenominatorCoefficients(_invA0, _invWtSeconds, _invWp2Seconds);
        }

        var a0 = _invA0;
        var tt = _invWtSeconds;
        var t2 = _invWp2Seconds;
        var gs = _gfSiemens + _gshSiemens;
        var cs = _cfbFarads + _cinFarads;
        return
        [
            _gfSiemens + (gs * a0),
            _cfbFarads + (gs * (tt + (a0 * t2))) + (cs * a0),
            (gs * tt * t2) + (cs * (tt + (a0 * t2))),
            cs * tt * t2,
        ];
    }

    /// <summary>1/A(jω) = (1/A0 + jω/ωt)(1 + jω/ωp2).</summary>
    internal Complex InverseA(double w)
    {
        var a = _invA0;
        var b = w * _invWtSeconds;
        var c = w * _invWp2Seconds;
        return new Complex(a - (b * c), b + (a * c));
    }

    internal Complex LoopGainAt(double w)
    {
        if (_network is { } n)
        {
            return n.Feedback.AtOmega(w) / (n.Sum.AtOmega(w) * InverseA(w));
        }

        var yf = new Complex(_gfSiemens, w * _cfbFarads);
        var ysum = new Complex(_gfSiemens + _gshSiemens, w * (_cfbFarads + _cinFarads));
        return yf / (ysum * InverseA(w));
    }

    /// <summary>ln|T(jω)|, with real arithmetic only (the crossing scan's hot path).</summary>
    internal double LogLoopGainMagnitude(double w) => 0.5 * Math.Log(LoopGainMagnitudeSquared(w));

    /// <summary>|T(jω)|², with real arithmetic only; half its logarithm is <see cref="LogLoopGainMagnitude"/> to the last bit.</summary>
    internal double LoopGainMagnitudeSquared(double w)
    {
        if (_network is { } n)
        {
            var ia = InverseA(w);
            return n.Feedback.AtOmega(w).MagnitudeSquared() / (n.Sum.AtOmega(w).MagnitudeSquared() * ia.MagnitudeSquared());
        }

        var b = w * _invWtSeconds;
        var c = w * _invWp2Seconds;
        var invA2 = ((_invA0 * _invA0) + (b * b)) * (1 + (c * c));
        var wcf = w * _cfbFarads;
        var yf2 = (_gfSiemens * _gfSiemens) + (wcf * wcf);
        var gs = _gfSiemens + _gshSiemens;
        var wcs = w * (_cfbFarads + _cinFarads);
        var ys2 = (gs * gs) + (wcs * wcs);
        return yf2 / (ys2 * invA2);
    }

    /// <summary>
    /// Bounds on d ln|T| / d ln ω over [wLo, wHi]. ln|T| is ½ln(gf² + ω²cf²) minus three terms of the same form
    /// (Yf + Yin, and the two factors of 1/A); each has slope (ωb)²/(a² + (ωb)²), which rises with ω from 0 to 1.
    /// So over the interval the slope is at least Yf's term at wLo minus the others at wHi, and at most the reverse.
    /// </summary>
    internal (double Min, double Max) LogLoopGainSlopeBounds(double wLo, double wHi)
    {
        static double Slope(double w, double a, double b)
        {
            var wb = w * b;
            return wb * wb / ((a * a) + (wb * wb));
        }

        double OpAmp(double w) => Slope(w, _invA0, _invWtSeconds) + Slope(w, 1, _invWp2Seconds);

        if (_network is { } n)
        {
            // T = A·Nf·Di/Ns: rising terms are Yf's zeros and Yin's poles, falling ones Ysum's zeros (references.md §D8).
            return (
                n.RisingSlope(wLo) - n.FallingSlope(wHi) - OpAmp(wHi),
                n.RisingSlope(wHi) - n.FallingSlope(wLo) - OpAmp(wLo));
        }

        double Falling(double w) =>
            Slope(w, _gfSiemens + _gshSiemens, _cfbFarads + _cinFarads) + OpAmp(w);

        return (
            Slope(wLo, _gfSiemens, _cfbFarads) - Falling(wHi),
            Slope(wHi, _gfSiemens, _cfbFarads) - Falling(wLo));
    }

    internal double LoopGainPhaseRadians(double w) =>
        _network is { } n
            ? n.FeedbackPhase(w) - Math.Atan2(w * _invWtSeconds, _invA0) - Math.Atan(w * _invWp2Seconds)
            : Math.Atan(w * _cfbFarads / _gfSiemens)
        - Math.Atan(w * (_cfbFarads + _cinFarads) / (_gfSiemens + _gshSiemens))
        - Math.Atan2(w * _invWtSeconds, _invA0)
        - Math.Atan(w * _invWp2Seconds);

    internal Complex TransimpedanceAt(double w)
    {
        if (_network is { } n)
        {
            return n.SignalTransfer(w) / n.Denominator(w, InverseA(w));
        }

        var yf = new Complex(_gfSiemens, w * _cfbFarads);
        var ysum = new Complex(_gfSiemens + _gshSiemens, w * (_cfbFarads + _cinFarads));
        return 1 / (yf + (ysum * InverseA(w)));
    }

    /// <summary>
    /// <see cref="LoopGainMagnitudeSquared"/> and <see cref="TransimpedanceMagnitudeSquared"/> together, equal to
    /// each to the last bit: a network's admittances are evaluated once for both (the loop-only scan's hot path).
    /// </summary>
    internal (double LoopSq, double TransimpedanceSq) LoopAndTransimpedanceSquared(double w)
    {
        if (_network is not { } n)
        {
            return (LoopGainMagnitudeSquared(w), TransimpedanceMagnitudeSquared(w));
        }

        var (yf, ysum) = n.AdmittancesAtOmega(w);
        var ia = InverseA(w);
        return (
            yf.MagnitudeSquared() / (ysum.MagnitudeSquared() * ia.MagnitudeSquared()),
            n.SignalTransfer(w).MagnitudeSquared() / (yf + (ysum * ia)).MagnitudeSquared());
    }

    /// <summary>|Zt(jω)|², with the complex division written out (hot path of the bandwidth scan).</summary>
    internal double TransimpedanceMagnitudeSquared(double w)
    {
        var ia = InverseA(w);
        if (_network is { } n)
        {
            return n.SignalTransfer(w).MagnitudeSquared() / n.Denominator(w, ia).MagnitudeSquared();
        }

        var sr = _gfSiemens + _gshSiemens;
        var si = w * (_cfbFarads + _cinFarads);
        var dr = _gfSiemens + (sr * ia.Real) - (si * ia.Imaginary);
        var di = (w * _cfbFarads) + (sr * ia.Imaginary) + (si * ia.Real);
        return 1 / ((dr * dr) + (di * di));
    }

    /// <summary>
    /// Total output PSD split the cheap way for integration: |Zt|²-weighted current PSD (white and 1/f parts
    /// of each source summed in the caller) and |NG|²-weighted voltage PSD, all in V²/Hz.
    /// </summary>
    internal void NoiseTerms(double f, out double zt2, out double ng2)
    {
        var w = TwoPi * f;
        zt2 = TransimpedanceMagnitudeSquared(w);
        var gSum = _gfSiemens + _gshSiemens;
        var wc = w * (_cfbFarads + _cinFarads);
        ng2 = zt2 * ((gSum * gSum) + (wc * wc));
    }

    /// <summary>D(s) = Yf + (Yf + Yin)/A(s) at a complex frequency (the denominator of every noise transfer).</summary>
    internal Complex DenominatorAt(Complex s)
    {
        var inverseA = (_invA0 + (s * _invWtSeconds)) * (1 + (s * _invWp2Seconds));
        if (_network is { } n)
        {
            return n.Feedback.At(s) + (n.Sum.At(s) * inverseA);
        }

        var yf = _gfSiemens + (s * _cfbFarads);
        return yf + ((yf + _gshSiemens + (s * _cinFarads)) * inverseA);
    }

    /// <summary>
    /// A plain circuit that behaves like this one away from the network's own corners: Rf plus the switch, the
    /// unselected branches' capacitance across the feedback, the sensor straight at the node.
    /// </summary>
    internal Circuit PlainEquivalent()
    {
        var extra = Capacitance.Zero;
        foreach (var b in Circuit.OffBranches.IsDefault ? [] : Circuit.OffBranches)
        {
            extra += b.HighFrequencyCapacitance;
        }

        return Circuit with
        {
            Rf = Circuit.DcFeedbackResistance,
            Cpar = Circuit.Cpar + extra,
            FeedbackSeriesResistance = Resistance.Zero,
            OffBranches = [],
            SeriesResistance = Resistance.Zero,
        };
    }

    /// <summary>The network model of a switched, adjustable or electrode circuit; null for a plain one.</summary>
    internal TiaNetwork? Network => _network;

    internal double RfThermalPsd => _rfThermalPsd;

    internal double RshThermalPsd => _rshThermalPsd;

    internal double ShotPsd => _shotPsd;

    internal double CurrentNoisePsd => _inPsd;

    internal double CurrentNoiseCornerHz => _inCornerHz;

    internal double VoltageNoisePsd => _enPsd;

    internal double VoltageNoiseCornerHz => _enCornerHz;

    internal double WhiteCurrentPsd => _currentPsdWhite;
}
