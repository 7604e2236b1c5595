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
        var coefficients = model.DenominatorCoefficients();
        var degree = coefficients.Length - 1;
        while (degree > 0 && coefficients[degree] == 0)
        {
            degree--;
        }

        var result = new List<(double, double)>();
        if (degree < 2)
        {
            return result;
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

        foreach (var x in FindRoots.Polynomial(scaled))
        {
            var p = x * w0;
            // One of each conjugate pair; a pair's imaginary part is never rounding-small next to its real part here.
            if (p.Imaginary > 1e-9 * Complex.Abs(p))
            {
                result.Add((Math.Log(p.Imaginary / (2 * Math.PI)), Math.Abs(p.Real) / p.Imaginary));
            }
        }

        return result;
    }
}
