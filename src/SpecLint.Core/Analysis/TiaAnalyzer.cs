using System.Collections.Immutable;
using MathNet.Numerics.RootFinding;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis;

/// <summary>
/// Computes the figures of a TIA operating point (references.md §D4) from the exact model <see cref="TiaModel"/>.
/// </summary>
/// <remarks>
/// Method: a log-spaced scan over 10⁻³·(lowest) .. 10³·(highest) characteristic frequency brackets every
/// |T| = 1 crossing and the −3 dB fall, and MathNet's Brent solver refines each bracket to 1e-14 in ln f.
/// Between scan points, bounds on how fast |T| can change decide where a pair of crossings could hide, and
/// only there is the interval split further, so no crossing slips between points.
/// The phase comes from summed pole and zero angles, so it is unwrapped from DC by construction (docs/references.md
/// §4 item 3). The peak is refined by golden-section search around the largest scan sample.
/// </remarks>
public static class TiaAnalyzer
{
    // Near the rounding of ln ω itself (about 4e-15 at ln ω ≈ 20), so the polynomial fast path (PlainLoop), which
    // converges to the last bits, finds the same roots, and phase margins near 0° keep their relative accuracy.
    private const double RootAccuracy = 1e-14;
    private const int RootIterations = 200;
    internal const double ScanMargin = 1e3;
    internal const int MaxScanPoints = 100_000;

    // Width in ln ω below which the crossing search stops splitting: crossings closer than this are one tangency.
    private const double CrossingResolution = 1e-9;

    /// <summary>
    /// Nominal analysis of a spec (references.md §D5): small-signal and DC figures at the nominal temperature, noise
    /// at the hottest, integrated over <c>requirements.noise.band</c> when given, else the default band.
    /// </summary>
    /// <param name="spec">The spec.</param>
    public static AnalysisResult Analyze(TiaSpec spec)
    {
        ArgumentNullException.ThrowIfNull(spec);
        var band = spec.Requirements.Noise;
        return Analyze(CircuitFactory.Nominal(spec), AnalysisOptions.Default with
        {
            NoiseBandLow = band?.BandLow,
            NoiseBandHigh = band?.BandHigh,
            NoiseTemperature = spec.Conditions.Hottest,
        });
    }

    /// <summary>Analyses one operating point.</summary>
    /// <param name="circuit">The operating point.</param>
    /// <param name="options">What to compute; <see cref="AnalysisOptions.WithoutNoise"/> for the fast path.</param>
    public static AnalysisResult Analyze(Circuit circuit, AnalysisOptions options)
    {
        ArgumentNullException.ThrowIfNull(circuit);
        ArgumentNullException.ThrowIfNull(options);
        var noiseTemperature = options.NoiseTemperature ?? circuit.Temperature;
        var model = new TiaModel(circuit, noiseTemperature);

        var rf = circuit.Rf.Ohms;
        // DC figures see Rf plus any switch or wiper in series, and the sensor's shunt plus any access resistance.
        var rdc = circuit.DcFeedbackResistance.Ohms;
        var gsh = DcShuntConductance(circuit);
        var cfb = circuit.FeedbackCapacitance.Farads;
        var cin = circuit.Cin.Farads;
        var cfbHigh = cfb + HighFrequencyOffCapacitance(circuit);
        var zt0 = Math.Sqrt(model.TransimpedanceMagnitudeSquared(0));

        var scan = Scan(model, zt0, options.ScanPointsPerDecade);

        Angle? pm = null;
        Frequency? crossover = null;
        foreach (var c in scan.Crossings)
        {
            if (c.Direction == CrossingDirection.Falling)
            {
                pm = c.Margin;
                crossover = c.Frequency;
                break;
            }
        }

        var twoKtOverQ = 2 * PhysicalConstants.ThermalVoltage(noiseTemperature).Volts;
        NoiseResult? noise = options.IncludeNoise ? ComputeNoise(model, zt0, scan, options) : null;

        return new AnalysisResult(
            circuit,
            new Resistance(zt0),
            circuit.A0.Linear / (1 + (rdc * gsh)),
            scan.BandwidthHz is { } bw ? new Frequency(bw) : null,
            scan.PeakingDb,
            scan.PeakHz is { } pk ? new Frequency(pk) : null,
            pm,
            crossover,
            scan.Crossings,
            1 + (rdc * gsh),
            cfbHigh > 0 ? 1 + (cin / cfbHigh) : double.PositiveInfinity,
            cfb > 0 ? new Frequency(1 / (2 * Math.PI * rf * cfb)) : null,
            cin + cfb > 0 ? new Frequency(((1 / rf) + gsh) / (2 * Math.PI * (cin + cfb))) : null,
            DcOutput(circuit),
            Math.Abs(circuit.Imin.Amperes) * rf / twoKtOverQ,
            noise);
    }

    /// <summary>
    /// Phase margin (degrees), bandwidth (Hz) and peaking (dB) of one operating point, as
    /// <see cref="Analyze(Circuit, AnalysisOptions)"/> without noise finds them, for corners and Monte Carlo.
    /// </summary>
    /// <remarks>
    /// A plain circuit goes through <see cref="PlainLoop"/> (no scan, no allocation); when that declines, and for
    /// a circuit with a network, through <see cref="ScanLoopFigures"/>.
    /// </remarks>
    /// <param name="circuit">The operating point.</param>
    /// <param name="pointsPerDecade">Scan points per decade, as <see cref="AnalysisOptions.ScanPointsPerDecade"/>.</param>
    internal static (double? PhaseMarginDeg, double? BandwidthHz, double PeakingDb) LoopFigures(Circuit circuit, int pointsPerDecade = 20) =>
        LoopFigures(circuit, LoopHint.None, pointsPerDecade);

    /// <summary><see cref="LoopFigures(Circuit, int)"/> with the roots of a nearby point to start from.</summary>
    /// <param name="circuit">The operating point.</param>
    /// <param name="hint">Roots of a nearby point (<see cref="LoopHintOf"/>), or <see cref="LoopHint.None"/>.</param>
    /// <param name="pointsPerDecade">Scan points per decade, as <see cref="AnalysisOptions.ScanPointsPerDecade"/>.</param>
    internal static (double? PhaseMarginDeg, double? BandwidthHz, double PeakingDb) LoopFigures(Circuit circuit, in LoopHint hint, int pointsPerDecade = 20) =>
        PlainLoop.TryFigures(circuit, pointsPerDecade, hint, out var figures, out _)
            ? figures
            : ScanLoopFigures(circuit, pointsPerDecade);

    /// <summary>Roots of <paramref name="circuit"/> for <see cref="LoopFigures(Circuit, in LoopHint, int)"/> at points near it.</summary>
    /// <param name="circuit">The operating point, typically a tolerance box's typical one.</param>
    internal static LoopHint LoopHintOf(Circuit circuit) =>
        PlainLoop.TryFigures(circuit, 20, LoopHint.None, out _, out var roots) ? roots : LoopHint.None;

    /// <summary>
    /// <see cref="LoopFigures(Circuit, int)"/> by the full analysis's scan, for any circuit.
    /// </summary>
    /// <remarks>
    /// The same scan, crossing search and refinements as the full analysis, so its guarantees hold (no pair of
    /// crossings hides between scan points), with the work they do not need left out: the scan compares squared
    /// magnitudes instead of their logarithms (taken only where the slope bound needs them, next to |T| = 1), the
    /// crossing search stops at the first falling crossing, and there is no DC output, crossing list or noise.
    /// Logarithms are monotonic, so every decision is the full analysis's except where two values agree to the last
    /// bit; the figures agree to rounding (the tests compare both paths).
    /// </remarks>
    /// <param name="circuit">The operating point.</param>
    /// <param name="pointsPerDecade">Scan points per decade, as <see cref="AnalysisOptions.ScanPointsPerDecade"/>.</param>
    internal static (double? PhaseMarginDeg, double? BandwidthHz, double PeakingDb) ScanLoopFigures(Circuit circuit, int pointsPerDecade = 20)
    {
        var model = new TiaModel(circuit);
        var zt0Sq = model.TransimpedanceMagnitudeSquared(0);
        var zt0 = Math.Sqrt(zt0Sq);
        var (wLo, wHi) = model.CharacteristicRange();
        var uLo = Math.Log(wLo / ScanMargin);
        var uHi = Math.Log(wHi * ScanMargin);
        // The same points as the full scan, its cap included.
        var du = Math.Max(Math.Log(10) / pointsPerDecade, (uHi - uLo) / MaxScanPoints);
        var n = double.IsFinite(du) && du > 0 ? (int)Math.Min(Math.Ceiling((uHi - uLo) / du), MaxScanPoints) : 0;

        // |ln|T|| ≤ 3·du at both ends is what sends an interval without a sign change to the crossing search;
        // |T|² outside e^(±6·du), widened by a hair against rounding, rules that out without a logarithm.
        var nearLow = Math.Exp(-6.001 * du);
        var nearHigh = Math.Exp(6.001 * du);
        var targetSq = zt0 * zt0 / 2;
        var peakSq = zt0 * zt0;
        var logTarget = Math.Log(targetSq);

        double? marginDeg = null;
        double? bandwidthU = null;
        var peakIndex = -1;

        var w = Math.Exp(uLo);
        var prevT2 = model.LoopGainMagnitudeSquared(w);
        var prevZ2 = model.TransimpedanceMagnitudeSquared(w);
        for (var i = 1; i <= n; i++)
        {
            w = Math.Exp(uLo + (i * du));
            double z2;
            if (marginDeg is null)
            {
                (var t2, z2) = model.LoopAndTransimpedanceSquared(w);
                var changes = (prevT2 > 1) != (t2 > 1);
                if (changes || (prevT2 >= nearLow && prevT2 <= nearHigh && t2 >= nearLow && t2 <= nearHigh))
                {
                    var prevT = 0.5 * Math.Log(prevT2);
                    var t = 0.5 * Math.Log(t2);
                    if (changes || Math.Abs(prevT) + Math.Abs(t) <= 3 * du)
                    {
                        marginDeg = FirstFallingMargin(model, uLo + ((i - 1) * du), prevT, uLo + (i * du), t);
                    }
                }

                prevT2 = t2;
            }
            else
            {
                z2 = model.TransimpedanceMagnitudeSquared(w);
            }

            if (bandwidthU is null && prevZ2 > targetSq && z2 <= targetSq)
            {
                bandwidthU = Refine(
                    u => Math.Log(model.TransimpedanceMagnitudeSquared(Math.Exp(u))) - logTarget,
                    uLo + ((i - 1) * du),
                    uLo + (i * du));
            }

            if (z2 > peakSq)
            {
                peakSq = z2;
                peakIndex = i;
            }

            prevZ2 = z2;
        }

        double peakingDb = 0;
        if (peakIndex > 0)
        {
            var (_, logPeak) = GoldenMax(
                u => Math.Log(model.TransimpedanceMagnitudeSquared(Math.Exp(u))),
                uLo + ((peakIndex - 1) * du),
                uLo + ((peakIndex + 1) * du));
            peakingDb = Math.Max(0, (logPeak - Math.Log(zt0 * zt0)) * 10 / Math.Log(10));
        }

        return (marginDeg, bandwidthU is { } ub ? Math.Exp(ub) / (2 * Math.PI) : null, peakingDb);
    }

    /// <summary>
    /// <see cref="FindCrossings"/> reduced to the phase margin at the first falling crossing in [a, b]; null when
    /// there is none there. Same splitting and refinement, so the same crossing.
    /// </summary>
    private static double? FirstFallingMargin(TiaModel model, double a, double ga, double b, double gb)
    {
        var (min, max) = model.LogLoopGainSlopeBounds(Math.Exp(a), Math.Exp(b));
        var changes = (ga > 0) != (gb > 0);
        var monotonic = min > 0 || max < 0;
        if (monotonic || b - a < CrossingResolution)
        {
            if (changes && gb <= 0)
            {
                var wc = Math.Exp(Refine(u => model.LogLoopGainMagnitude(Math.Exp(u)), a, b));
                return (Angle.FromDegrees(180) + new Angle(model.LoopGainPhaseRadians(wc))).Degrees;
            }

            return null;
        }

        if (!changes && ((ga > 0 ? (ga / -min) + (gb / max) : (-ga / max) + (-gb / -min)) > b - a))
        {
            return null;
        }

        var m = (a + b) / 2;
        var gm = model.LogLoopGainMagnitude(Math.Exp(m));
        return FirstFallingMargin(model, a, ga, m, gm) ?? FirstFallingMargin(model, m, gm, b, gb);
    }

    /// <summary>
    /// The exact DC output with finite A0 (references.md §2 notes), for a signal current leaving the node
    /// (<paramref name="outOfNodeAmperes"/>, dark current included) and given offset and bias current.
    /// </summary>
    /// <remarks>
    /// KCL at the inverting node with vo = A0·(Vbias + Vos − vn), the sensor's far end at Vbias and Ib leaving
    /// the node: vo = (vp/Rf + Vos/Rsh + Ib + Iout) / ((1 + 1/A0)/Rf + 1/(A0·Rsh)), vp = Vbias + Vos.
    /// </remarks>
    /// <param name="circuit">The operating point (its Vbias, Rf, Rsh, A0).</param>
    /// <param name="outOfNodeAmperes">Total DC current drawn out of the summing node by the sensor.</param>
    /// <param name="vosVolts">Offset voltage in series with the + input.</param>
    /// <param name="ibAmperes">Bias current flowing from the node into the op-amp pin.</param>
    public static Voltage ExactDcOutput(Circuit circuit, double outOfNodeAmperes, double vosVolts, double ibAmperes)
    {
        ArgumentNullException.ThrowIfNull(circuit);
        var gf = 1 / circuit.DcFeedbackResistance.Ohms;
        var gsh = DcShuntConductance(circuit);
        var invA0 = 1 / circuit.A0.Linear;
        var vp = circuit.Vbias.Volts + vosVolts;
        var num = (vp * gf) + (vosVolts * gsh) + ibAmperes + (outOfNodeAmperes * DcSignalShare(circuit));
        return new Voltage(num / ((gf * (1 + invA0)) + (gsh * invA0)));
    }

    /// <summary>
    /// The sensor branch's DC conductance at the node: 1/(Rsh + Rs), zero when Rsh is infinite (references.md §D8).
    /// </summary>
    internal static double DcShuntConductance(Circuit c) =>
        c.Rsh is { } rsh ? 1 / (rsh.Ohms + c.SeriesResistance.Ohms) : 0;

    /// <summary>The share of the source's DC current that reaches the node past Rsh: Rsh/(Rsh + Rs).</summary>
    internal static double DcSignalShare(Circuit c) =>
        c.Rsh is { } rsh && c.SeriesResistance.Ohms > 0 ? rsh.Ohms / (rsh.Ohms + c.SeriesResistance.Ohms) : 1;

    /// <summary>What the unselected branches add across the feedback at high frequency.</summary>
    private static double HighFrequencyOffCapacitance(Circuit c) =>
        c.OffBranches.IsDefaultOrEmpty ? 0 : c.OffBranches.Sum(b => b.HighFrequencyCapacitance.Farads);

    private static OutputRange DcOutput(Circuit c)
    {
        var rf = c.DcFeedbackResistance.Ohms;
        var pol = c.Polarity;
        var share = DcSignalShare(c);
        var idleCurrent = pol * c.Idark.Amperes;
        var fullCurrent = pol * (c.Imax.Amperes + c.Idark.Amperes);
        var idle = c.Vbias.Volts + (idleCurrent * share * rf);
        var full = c.Vbias.Volts + (fullCurrent * share * rf);
        var rfOverRsh = rf * DcShuntConductance(c);
        var vos = Math.Abs(c.Vos.Volts);
        var ib = Math.Abs(c.Ib.Amperes);
        var err = (vos * (1 + rfOverRsh)) + (ib * rf);

        var minExact = double.PositiveInfinity;
        var maxExact = double.NegativeInfinity;
        foreach (var i in (ReadOnlySpan<double>)[idleCurrent, fullCurrent])
        {
            for (var sv = -1; sv <= 1; sv += 2)
            {
                for (var sb = -1; sb <= 1; sb += 2)
                {
                    var v = ExactDcOutput(c, i, sv * vos, sb * ib).Volts;
                    minExact = Math.Min(minExact, v);
                    maxExact = Math.Max(maxExact, v);
                }
            }
        }

        return new OutputRange(
            new Voltage(idle),
            new Voltage(full),
            new Voltage(err),
            new Voltage(minExact),
            new Voltage(maxExact),
            c.SupplyNegative + c.SwingToNegative,
            c.SupplyPositive - c.SwingToPositive);
    }

    private readonly record struct ScanResult(
        ImmutableArray<LoopCrossing> Crossings,
        double? BandwidthHz,
        double PeakingDb,
        double? PeakHz);

    private static ScanResult Scan(TiaModel model, double zt0, int pointsPerDecade)
    {
        var (wLo, wHi) = model.CharacteristicRange();
        var uLo = Math.Log(wLo / ScanMargin);
        var uHi = Math.Log(wHi * ScanMargin);
        // The span is bounded by the spec limits, but the point count is capped all the same so no input can
        // make the scan run for ever: past the cap the points spread out rather than multiply.
        var du = Math.Max(Math.Log(10) / pointsPerDecade, (uHi - uLo) / MaxScanPoints);
        var n = double.IsFinite(du) && du > 0 ? (int)Math.Min(Math.Ceiling((uHi - uLo) / du), MaxScanPoints) : 0;

        var logTarget = Math.Log(zt0 * zt0 / 2);
        var logZt0Sq = Math.Log(zt0 * zt0);

        var crossings = ImmutableArray.CreateBuilder<LoopCrossing>(2);
        double? bandwidthU = null;
        var peakLog = logZt0Sq;
        var peakIndex = -1;

        var w = Math.Exp(uLo);
        var prevT = model.LogLoopGainMagnitude(w);
        var prevZ = Math.Log(model.TransimpedanceMagnitudeSquared(w));
        for (var i = 1; i <= n; i++)
        {
            // Recomputed, not multiplied up, so a bracket's ends are exactly the points the scan judged.
            w = Math.Exp(uLo + (i * du));
            var t = model.LogLoopGainMagnitude(w);
            // ln|T| moves at most 3 per unit of ln ω, so values this far from 0 at both ends rule out a crossing.
            if ((prevT > 0) != (t > 0) || Math.Abs(prevT) + Math.Abs(t) <= 3 * du)
            {
                FindCrossings(model, uLo + ((i - 1) * du), prevT, uLo + (i * du), t, crossings);
            }

            var z = Math.Log(model.TransimpedanceMagnitudeSquared(w));
            if (bandwidthU is null && prevZ > logTarget && z <= logTarget)
            {
                bandwidthU = Refine(
                    u => Math.Log(model.TransimpedanceMagnitudeSquared(Math.Exp(u))) - logTarget,
                    uLo + ((i - 1) * du),
                    uLo + (i * du));
            }

            if (z > peakLog)
            {
                peakLog = z;
                peakIndex = i;
            }

            prevT = t;
            prevZ = z;
        }

        double peakingDb = 0;
        double? peakHz = null;
        if (peakIndex > 0)
        {
            var (uPeak, logPeak) = GoldenMax(
                u => Math.Log(model.TransimpedanceMagnitudeSquared(Math.Exp(u))),
                uLo + ((peakIndex - 1) * du),
                uLo + ((peakIndex + 1) * du));
            // 10·log10 of a power ratio held as a natural log.
            peakingDb = Math.Max(0, (logPeak - logZt0Sq) * 10 / Math.Log(10));
            peakHz = peakingDb > 0 ? Math.Exp(uPeak) / (2 * Math.PI) : null;
        }

        return new ScanResult(
            crossings.DrainToImmutable(),
            bandwidthU is { } ub ? Math.Exp(ub) / (2 * Math.PI) : null,
            peakingDb,
            peakHz);
    }

    /// <summary>
    /// Every |T| = 1 crossing in [a, b] (u = ln ω), in order. Bisects until the slope bounds of ln|T|
    /// (<see cref="TiaModel.LogLoopGainSlopeBounds"/>) prove a part monotonic (then a sign change there is exactly
    /// one crossing) or prove it cannot reach 0 from its end values; so no pair of crossings can hide between
    /// scan points, however close. Below <see cref="CrossingResolution"/> in ln ω a part counts as one point.
    /// </summary>
    private static void FindCrossings(TiaModel model, double a, double ga, double b, double gb, ImmutableArray<LoopCrossing>.Builder crossings)
    {
        var (min, max) = model.LogLoopGainSlopeBounds(Math.Exp(a), Math.Exp(b));
        var changes = (ga > 0) != (gb > 0);
        var monotonic = min > 0 || max < 0;
        if (monotonic || b - a < CrossingResolution)
        {
            if (changes)
            {
                var u = Refine(u => model.LogLoopGainMagnitude(Math.Exp(u)), a, b);
                var wc = Math.Exp(u);
                crossings.Add(new LoopCrossing(
                    new Frequency(wc / (2 * Math.PI)),
                    gb > 0 ? CrossingDirection.Rising : CrossingDirection.Falling,
                    new Angle(model.LoopGainPhaseRadians(wc))));
            }

            return;
        }

        // Same sign at both ends: reaching 0 and coming back needs |ga|/rate + |gb|/rate of room.
        if (!changes && ((ga > 0 ? (ga / -min) + (gb / max) : (-ga / max) + (-gb / -min)) > b - a))
        {
            return;
        }

        var m = (a + b) / 2;
        var gm = model.LogLoopGainMagnitude(Math.Exp(m));
        FindCrossings(model, a, ga, m, gm, crossings);
        FindCrossings(model, m, gm, b, gb, crossings);
    }

    /// <summary>
    /// Brent's method on a bracket from the scan. A scan point can land on the root itself, where rounding
    /// may give both ends the same sign; the end nearer zero is then the root to working precision.
    /// </summary>
    private static double Refine(Func<double, double> f, double lo, double hi)
    {
        var fl = f(lo);
        var fh = f(hi);
        if ((fl > 0) == (fh > 0) || fl == 0 || fh == 0)
        {
            return Math.Abs(fl) <= Math.Abs(fh) ? lo : hi;
        }

        if (Brent.TryFindRoot(f, lo, hi, RootAccuracy, RootIterations, out var root))
        {
            return root;
        }

        try
        {
            return Bisection.FindRoot(f, lo, hi, RootAccuracy, RootIterations);
        }
        catch (MathNet.Numerics.NonConvergenceException e)
        {
            throw new AnalysisFailedException(
                $"the root solver did not converge near {QuantityFormat.FormatRounded(Math.Exp(lo) / (2 * Math.PI), Dimension.Frequency)}", e);
        }
    }

    /// <summary>Golden-section search for the maximum of a unimodal function on [a, b].</summary>
    private static (double X, double Value) GoldenMax(Func<double, double> f, double a, double b)
    {
        var invPhi = (Math.Sqrt(5) - 1) / 2;
        var c = b - (invPhi * (b - a));
        var d = a + (invPhi * (b - a));
        var fc = f(c);
        var fd = f(d);
        // 40 steps shrink the bracket by 0.618^40 ≈ 4e-9; the peak value is quadratic in the error, so exact.
        for (var i = 0; i < 40; i++)
        {
            if (fc > fd)
            {
                b = d;
                d = c;
                fd = fc;
                c = b - (invPhi * (b - a));
                fc = f(c);
            }
            else
            {
                a = c;
                c = d;
                fc = fd;
                d = a + (invPhi * (b - a));
                fd = f(d);
            }
        }

        return fc > fd ? (c, fc) : (d, fd);
    }

    private static NoiseResult ComputeNoise(TiaModel model, double zt0, ScanResult scan, AnalysisOptions options)
    {
        var c = model.Circuit;
        var isDefault = options.NoiseBandLow is null || options.NoiseBandHigh is null;
        var fLo = options.NoiseBandLow?.Hertz ?? 1.0;
        // Default upper end 10·f−3dB (references.md §4 item 8); without a bandwidth fall back on 10·GBW.
        var fHi = options.NoiseBandHigh?.Hertz ?? (10 * (scan.BandwidthHz ?? c.Gbw.Hertz));
        if (!(fLo > 0) || !(fHi > fLo))
        {
            var band = $"{QuantityFormat.FormatRounded(fLo, Dimension.Frequency)} .. {QuantityFormat.FormatRounded(fHi, Dimension.Frequency)}";
            throw new AnalysisFailedException(isDefault
                ? $"the default noise band {band} (1 Hz to ten times the bandwidth) is empty; give requirements.noise.band"
                : $"the noise band {band} is empty");
        }

        var v2 = NoiseIntegrator.Integrate(model, fLo, fHi, options.NoisePanelsPerDecade);
        var rms = new NoiseRms(
            new Voltage(Math.Sqrt(v2.RfThermal)),
            new Voltage(Math.Sqrt(v2.RshThermal)),
            new Voltage(Math.Sqrt(v2.Shot)),
            new Voltage(Math.Sqrt(v2.CurrentNoise)),
            new Voltage(Math.Sqrt(v2.VoltageNoise)))
        {
            SeriesThermal = new Voltage(Math.Sqrt(v2.SeriesThermal)),
        };
        var total = Math.Sqrt(v2.Total);
        var input = total / zt0;
        var imin = Math.Abs(c.Imin.Amperes);
        var spot = Math.Sqrt(fLo * fHi);
        return new NoiseResult(
            new Frequency(fLo),
            new Frequency(fHi),
            isDefault,
            model.NoiseTemperature,
            rms,
            new Voltage(total),
            new Current(input),
            imin > 0 ? 20 * Math.Log10(imin * zt0 / total) : null,
            c.Responsivity is { AmperesPerWatt: > 0 } r ? new Power(input / r.AmperesPerWatt) : null,
            new Frequency(spot),
            model.OutputNoise(new Frequency(spot)));
    }
}
