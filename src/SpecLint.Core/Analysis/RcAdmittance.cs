using System.Numerics;

namespace SpecLint.Core.Analysis;

/// <summary>
/// A sum of <see cref="RcBranch"/>es in parallel: an RC driving-point admittance. Its poles are the branches' poles;
/// its zeros are found from the RC property (references.md §D8): on the negative real axis Y(−σ) falls strictly
/// between consecutive poles, from +∞ after one to −∞ before the next, so each gap holds exactly one zero, as does
/// [0, first pole) (at 0 when Y(0) = 0) and, when Y grows like s, the part above the last pole.
/// </summary>
internal sealed class RcAdmittance
{
    private readonly RcBranch[] _branches;
    private double[]? _zeros;

    public RcAdmittance(IEnumerable<RcBranch> branches)
    {
        _branches = [.. branches.Where(b => b.G > 0 || b.C > 0)];

        // Built once per Monte Carlo sample of a network: a plain loop, not a query pipeline.
        var poles = new double[_branches.Length];
        var count = 0;
        foreach (var b in _branches)
        {
            if (b.Pole is { } p)
            {
                poles[count++] = p;
            }
        }

        Array.Resize(ref poles, count);
        Array.Sort(poles);
        Poles = poles;
    }

    /// <summary>The branches.</summary>
    public IReadOnlyList<RcBranch> Branches => _branches;

    /// <summary>The branches, in the order <see cref="At"/> adds them, without an enumerator to allocate.</summary>
    internal ReadOnlySpan<RcBranch> BranchSpan => _branches;

    /// <summary>Poles as σ &gt; 0 (Y → ∞ at s = −σ), ascending.</summary>
    public double[] Poles { get; }

    /// <summary>Zeros as σ ≥ 0 (Y = 0 at s = −σ), ascending; a pole that two branches share also holds a zero.</summary>
    /// <remarks>Found on first use: a Monte Carlo sample of a network builds three admittances and needs the zeros of two.</remarks>
    public double[] Zeros => _zeros ??= FindZeros();

    /// <summary>Y(jω).</summary>
    public Complex AtOmega(double w) => At(new Complex(0, w));

    /// <summary>Y(s) at any complex frequency.</summary>
    public Complex At(Complex s)
    {
        Complex sum = 0;
        foreach (var b in _branches)
        {
            sum += b.At(s);
        }

        return sum;
    }

    /// <summary>Y(0).</summary>
    public double Dc
    {
        get
        {
            var sum = 0.0;
            foreach (var b in _branches)
            {
                sum += b.Dc;
            }

            return sum;
        }
    }

    /// <summary>Numerator and common denominator of Y(s), ascending powers of s.</summary>
    public (double[] Num, double[] Den) Polynomials()
    {
        double[] num = [0];
        double[] den = [1];
        foreach (var b in _branches)
        {
            var (n, d) = b.Polynomials();
            num = Polynomial.Add(Polynomial.Multiply(num, d), Polynomial.Multiply(n, den));
            den = Polynomial.Multiply(den, d);
        }

        return (num, den);
    }

    private double OnAxis(double sigma)
    {
        var sum = 0.0;
        foreach (var b in _branches)
        {
            sum += b.OnNegativeAxis(sigma);
        }

        return sum;
    }

    private double[] FindZeros()
    {
        // One zero per gap between poles and at most one above the last: sized once, trimmed only when the last is absent.
        var zeros = new double[Poles.Length + 1];
        var count = 0;
        var lower = 0.0;
        var dc = Dc;
        var grows = false;
        foreach (var b in _branches)
        {
            grows |= b.GrowsAtInfinity;
        }

        for (var i = 0; i <= Poles.Length; i++)
        {
            var upper = i < Poles.Length ? Poles[i] : double.PositiveInfinity;
            if (i == 0 && dc <= 0)
            {
                zeros[count++] = 0;
            }
            else if (i < Poles.Length)
            {
                zeros[count++] = ZeroBetween(i == 0 ? 0 : lower, upper);
            }
            else if (grows)
            {
                zeros[count++] = ZeroAbove(lower);
            }

            lower = upper;
        }

        if (count < zeros.Length)
        {
            Array.Resize(ref zeros, count);
        }

        return zeros;
    }

    /// <summary>The single zero in (a, b) where Y(−σ) falls from above 0 to below it, bracketed in ln σ.</summary>
    private double ZeroBetween(double a, double b)
    {
        // Two branches sharing a pole: the zero between them sits on it.
        if (a > 0 && b <= a * (1 + 1e-12))
        {
            return a;
        }

        var lo = a > 0 ? a * (1 + 1e-15) : 0;
        var hi = b * (1 - 1e-15);
        if (OnAxis(hi) >= 0)
        {
            return hi;
        }

        if (lo > 0 && OnAxis(lo) <= 0)
        {
            return lo;
        }

        if (lo == 0)
        {
            // Y(0) > 0: step down from the pole by decades until Y is positive, then bisect.
            lo = hi;
            while (OnAxis(lo) < 0 && lo > 1e-30)
            {
                lo /= 10;
            }
        }

        return ZeroInBracket(lo, hi);
    }

    private double ZeroAbove(double a)
    {
        var lo = a > 0 ? a * (1 + 1e-15) : 1;
        if (a <= 0)
        {
            // No pole at all: Y = G + sC, one zero at G/C (bracketed by decades from 1 rad/s).
            while (OnAxis(lo) < 0 && lo > 1e-30)
            {
                lo /= 10;
            }
        }

        var hi = lo * 10;
        while (OnAxis(hi) > 0 && hi < 1e30)
        {
            lo = hi;
            hi *= 10;
        }

        return ZeroInBracket(lo, hi);
    }

    /// <summary>
    /// The zero of Y(−σ) in (lo, hi), where it falls from above 0 to below it: false position in ln σ with the
    /// Illinois halving (a stalled end's value is halved), so it converges in about ten steps instead of the fifty
    /// or more of bisection; a step that does not shrink the bracket by a quarter is replaced by a bisection, so it
    /// can never be slower than bisection by more than that.
    /// </summary>
    private double ZeroInBracket(double lo, double hi)
    {
        double u0 = Math.Log(lo), u1 = Math.Log(hi);
        double f0 = OnAxis(lo), f1 = OnAxis(hi);
        var side = 0;
        for (var k = 0; k < 200 && hi > lo * (1 + 4e-16); k++)
        {
            var width = u1 - u0;
            var u = double.IsFinite(f0) && double.IsFinite(f1) && f0 > 0 && f1 < 0 ? u0 + (width * f0 / (f0 - f1)) : double.NaN;
            if (!(u > u0 + (width / 64) && u < u1 - (width / 64)))
            {
                u = u0 + (width / 2);
                side = 0;
            }

            var mid = Math.Exp(u);
            if (!(mid > lo && mid < hi))
            {
                mid = Math.Sqrt(lo * hi);
                u = Math.Log(mid);
            }

            var f = OnAxis(mid);
            if (f == 0)
            {
                return mid;
            }

            if (f > 0)
            {
                (lo, u0, f0) = (mid, u, f);
                f1 = side == -1 ? f1 / 2 : f1;
                side = -1;
            }
            else
            {
                (hi, u1, f1) = (mid, u, f);
                f0 = side == 1 ? f0 / 2 : f0;
                side = 1;
            }

            // A step that left most of the bracket in place: bisect once so the bracket keeps shrinking.
            if (u1 - u0 > 0.75 * width)
            {
                var m = Math.Sqrt(lo * hi);
                var fm = OnAxis(m);
                if (fm == 0)
                {
                    return m;
                }

                if (fm > 0)
                {
                    (lo, u0, f0) = (m, Math.Log(m), fm);
                }
                else
                {
                    (hi, u1, f1) = (m, Math.Log(m), fm);
                }

                side = 0;
            }
        }

        return Math.Sqrt(lo * hi);
    }
}
