using System.Numerics;

namespace SpecLint.Core.Analysis;

/// <summary>
/// One two-terminal RC branch, in SI: a conductance G in parallel with a capacitance C, optionally in series with
/// a resistance R or a capacitance C0 (never both). Every element of a TIA's feedback and input networks is one of
/// these shapes, and a sum of them is an RC driving-point admittance (references.md §D8): its poles and zeros lie on
/// the negative real axis and alternate, which is what <see cref="RcAdmittance"/> relies on.
/// </summary>
internal readonly record struct RcBranch(double G, double C, double SeriesR, double SeriesC)
{
    /// <summary>Y(s) at a complex frequency.</summary>
    public Complex At(Complex s)
    {
        var y = G + (s * C);
        if (SeriesR > 0)
        {
            return y / (1 + (SeriesR * y));
        }

        if (SeriesC > 0)
        {
            var s0 = s * SeriesC;
            return s0 * y / (y + s0);
        }

        return y;
    }

    /// <summary>Y(−σ) on the negative real axis (real there).</summary>
    public double OnNegativeAxis(double sigma)
    {
        var y = G - (sigma * C);
        if (SeriesR > 0)
        {
            return y / (1 + (SeriesR * y));
        }

        if (SeriesC > 0)
        {
            var s0 = -sigma * SeriesC;
            return s0 * y / (y + s0);
        }

        return y;
    }

    /// <summary>Y(0).</summary>
    public double Dc => SeriesC > 0 ? 0 : SeriesR > 0 ? G / (1 + (SeriesR * G)) : G;

    /// <summary>True when Y grows like s at high frequency (a capacitance reaches the terminals directly).</summary>
    public bool GrowsAtInfinity => C > 0 && SeriesR <= 0;

    /// <summary>The branch's pole as σ &gt; 0 (Y has a pole at s = −σ), or null when it has none.</summary>
    public double? Pole
    {
        get
        {
            if (SeriesR > 0 && C > 0)
            {
                return (G + (1 / SeriesR)) / C;
            }

            if (SeriesC > 0 && G > 0)
            {
                return G / (C + SeriesC);
            }

            return null;
        }
    }

    /// <summary>Numerator and denominator of Y(s) as polynomials in s, ascending powers.</summary>
    public (double[] Num, double[] Den) Polynomials()
    {
        if (SeriesR > 0)
        {
            return ([G, C], [1 + (SeriesR * G), SeriesR * C]);
        }

        if (SeriesC > 0)
        {
            return ([0, SeriesC * G, SeriesC * C], [G, C + SeriesC]);
        }

        return ([G, C], [1]);
    }
}
