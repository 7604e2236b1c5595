using System.Numerics;
using MathNet.Numerics;

namespace SpecLint.Core.Analysis;

/// <summary>
/// The poles every noise transfer shares: the roots of D(s) = Yf + (Yf + Yin)/A(s), since Zt = 1/D and the
/// voltage-noise gain is (Yf + Yin)/D. A lightly damped pair is a resonance of both, whether or not it shows
/// as a peak of |Zt| (a zero of Yf + Yin or Cf can mask it in Zt while the noise gain still rings).
/// </summary>
internal static class ClosedLoopPoles
{
    /// <summary>
    /// The resonances of the noise transfers as (centre, half-width) in u = ln f: a pole −σ ± jωd makes |H|² a
    /// Lorentzian in ω of half-width |σ| about ωd, i.e. half-width |σ|/ωd in ln f. Real poles are corners, not
    /// resonances, and are left out.
    /// </summary>
    public static IReadOnlyList<(double CentreU, double HalfWidthU)> Resonances(TiaModel model)
    {
        var result = new List<(double, double)>();
        var roots = model.Network is null ? Roots(model.DenominatorCoefficients()) : NetworkRoots(model);
        foreach (var p in roots)
        {
            // One of each conjugate pair; a pair's imaginary part is never rounding-small next to its real part here.
            if (p.Imaginary > 1e-9 * Complex.Abs(p))
            {
                result.Add((Math.Log(p.Imaginary / (2 * Math.PI)), Math.Abs(p.Real) / p.Imaginary));
            }
        }

        return result;
    }

    /// <summary>
    /// A network's denominator polynomial multiplies D by every branch's own denominator, and its companion roots can
    /// lose a lightly damped pair among branch poles spread over many decades. So its roots, and those of the plain
    /// circuit that behaves the same (<see cref="TiaModel.PlainEquivalent"/>), only seed Newton's method on D(s)
    /// itself, evaluated from the branches; a seed that converges is a pole.
    /// </summary>
    private static List<Complex> NetworkRoots(TiaModel model)
    {
        var seeds = Roots(model.DenominatorCoefficients()).Concat(Roots(new TiaModel(model.PlainEquivalent()).DenominatorCoefficients()));
        var poles = new List<Complex>();
        foreach (var seed in seeds)
        {
            if (!(seed.Imaginary > 0) || Polish(model, seed) is not { } p || !(p.Imaginary > 0))
            {
                continue;
            }

            if (!poles.Any(q => Complex.Abs(q - p) <= 1e-6 * Complex.Abs(p)))
            {
                poles.Add(p);
            }
        }

        return poles;
    }

    private static Complex? Polish(TiaModel model, Complex s)
    {
        for (var k = 0; k < 60; k++)
        {
            var d = model.DenominatorAt(s);
            var h = 1e-7 * Complex.Abs(s);
            var slope = (model.DenominatorAt(s + h) - model.DenominatorAt(s - h)) / (2 * h);
            if (slope == Complex.Zero || !double.IsFinite(slope.Real) || !double.IsFinite(slope.Imaginary))
            {
                return null;
            }

            var step = d / slope;
            s -= step;
            if (Complex.Abs(step) <= 1e-12 * Complex.Abs(s))
            {
                return s;
            }
        }

        return null;
    }

    private static IEnumerable<Complex> Roots(double[] coefficients)
    {
        var degree = coefficients.Length - 1;
        while (degree > 0 && coefficients[degree] == 0)
        {
            degree--;
        }

        if (degree < 2)
        {
            return [];
        }

        // Scale s = ω0·x so the companion matrix is balanced: ω0 from the outer coefficients' ratio.
        var w0 = Math.Pow(Math.Abs(coefficients[0] / coefficients[degree]), 1.0 / degree);
        var scaled = new double[degree + 1];
        for (var k = 0; k <= degree; k++)
        {
            scaled[k] = coefficients[k] * Math.Pow(w0, k);
        }

        var peak = scaled.Max(Math.Abs);
        for (var k = 0; k <= degree; k++)
        {
            scaled[k] /= peak;
        }

        return FindRoots.Polynomial(scaled).Select(x => x * w0);
    }
}
