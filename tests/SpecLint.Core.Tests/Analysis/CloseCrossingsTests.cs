using System.Numerics;
using SpecLint.Core.Analysis;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Analysis;

/// <summary>
/// The crossing scan finds every |T| = 1 crossing however close together (issue 13 item 9). The loop gain is
/// recomputed here from its definition, T = Yf·A/(Yf + Yin) with A = A0/((1 + s/ωa)(1 + s/ωp2)), in plain
/// complex arithmetic, and its crossings are found by dense sampling and bisection.
/// </summary>
public sealed class CloseCrossingsTests
{
    // Rf 1 MΩ ∥ 1 nF puts Yf's zero at 1e3 rad/s; a 10 kΩ shunt and 10 pF at the node put Yf + Yin's pole at
    // 1e5 rad/s, so |Yf/(Yf + Yin)| climbs from 0.0099 towards 0.99. A0 = 10 with ωt = 1e6 rad/s rolls A off from
    // 1e5 rad/s, so |T| rises, peaks once and falls. Scaling A0 and ωt together scales |T| at every frequency.
    private const double Rf = 1e6;
    private const double Cf = 1e-9;
    private const double Rsh = 1e4;
    private const double Cin = 10e-12;
    private const double A0 = 10;
    private const double WtRadPerSecond = 1e6;

    [Theory]
    [InlineData(0.0)]
    [InlineData(0.2)]
    [InlineData(0.4)]
    [InlineData(0.6)]
    [InlineData(0.8)]
    public void Two_crossings_one_two_hundredth_of_a_decade_apart_are_both_found(double shiftDecades)
    {
        // Shifting the frequencies of the loop, but not of Yf's zero, where the scan starts, moves the pair
        // against the scan's points.
        var shift = Math.Pow(10, shiftDecades / 10);
        var gapU = Math.Log(10) / 200;
        var (scale, uPeak) = ScaleForGap(shift, gapU);
        var c = new Circuit
        {
            Rf = new Resistance(Rf),
            Cf = new Capacitance(Cf),
            Rsh = new Resistance(Rsh),
            SensorCapacitance = new Capacitance(Cin / shift),
            A0 = new Gain(A0 * scale),
            Gbw = new Frequency(scale * WtRadPerSecond * shift / (2 * Math.PI)),
        };

        var rising = Root(u => LogT(u, shift, scale), uPeak - gapU, uPeak);
        var falling = Root(u => LogT(u, shift, scale), uPeak, uPeak + gapU);
        Assert.Equal(gapU, falling - rising, 1e-9);

        var r = TiaAnalyzer.Analyze(c, AnalysisOptions.WithoutNoise);
        Assert.Equal(2, r.Crossings.Length);
        Assert.Equal(CrossingDirection.Rising, r.Crossings[0].Direction);
        Assert.Equal(CrossingDirection.Falling, r.Crossings[1].Direction);
        Assert.Equal(1, r.Crossings[0].Frequency.Hertz / (Math.Exp(rising) / (2 * Math.PI)), 1e-9);
        Assert.Equal(1, r.Crossings[1].Frequency.Hertz / (Math.Exp(falling) / (2 * Math.PI)), 1e-9);
        Assert.Equal(r.Crossings[1].Frequency, r.Crossover);
    }

    /// <summary>ln|T(jω)| at u = ln ω for the circuit shifted by <paramref name="shift"/> and A scaled by <paramref name="scale"/>.</summary>
    private static double LogT(double u, double shift, double scale)
    {
        var s = new Complex(0, Math.Exp(u));
        var yf = (1 / Rf) + (s * Cf);
        var yin = (1 / Rsh) + (s * Cin / shift);
        var a = A0 * scale / (1 + (s * A0 / (WtRadPerSecond * shift)));
        return Math.Log((yf * a / (yf + yin)).Magnitude);
    }

    /// <summary>The |T| scale that makes the two crossings <paramref name="gapU"/> apart in ln ω, and the peak's ln ω.</summary>
    private static (double Scale, double PeakU) ScaleForGap(double shift, double gapU)
    {
        // Locate the peak of ln|T| on a dense grid, then by golden section.
        var lo = Math.Log(1e2 * shift);
        var hi = Math.Log(1e8 * shift);
        var best = lo;
        for (var u = lo; u <= hi; u += 1e-3)
        {
            if (LogT(u, shift, 1) > LogT(best, shift, 1))
            {
                best = u;
            }
        }

        var (a, b) = (best - 1e-3, best + 1e-3);
        for (var i = 0; i < 200; i++)
        {
            var m1 = a + ((b - a) / 3);
            var m2 = b - ((b - a) / 3);
            (a, b) = LogT(m1, shift, 1) < LogT(m2, shift, 1) ? (m1, b) : (a, m2);
        }

        var peakU = (a + b) / 2;
        var peak = LogT(peakU, shift, 1);

        // ln|T| − peak is negative on both sides; the gap between its two roots at level −δ grows with δ.
        double Gap(double delta) =>
            Root(u => LogT(u, shift, 1) - peak + delta, peakU + 1, peakU) - Root(u => LogT(u, shift, 1) - peak + delta, peakU - 1, peakU);
        var (dLo, dHi) = (0.0, 1e-2);
        for (var i = 0; i < 200; i++)
        {
            var d = (dLo + dHi) / 2;
            (dLo, dHi) = Gap(d) < gapU ? (d, dHi) : (dLo, d);
        }

        return (Math.Exp(-peak + ((dLo + dHi) / 2)), peakU);
    }

    /// <summary>Bisection for a sign change of <paramref name="g"/> between <paramref name="a"/> and <paramref name="b"/>.</summary>
    private static double Root(Func<double, double> g, double a, double b)
    {
        var ga = g(a);
        for (var i = 0; i < 200; i++)
        {
            var m = (a + b) / 2;
            var gm = g(m);
            if ((gm > 0) == (ga > 0))
            {
                (a, ga) = (m, gm);
            }
            else
            {
                b = m;
            }
        }

        return (a + b) / 2;
    }
}
