namespace SpecLint.Rules.Tests.Support;

/// <summary>Independent reference numbers for the physics checks; each names its source.</summary>
internal static class Reference
{
    /// <summary>Boltzmann constant, J/K: CODATA 2018 / SI Brochure 9th ed., exact (references.md [C]).</summary>
    public const double K = 1.380649e-23;

    /// <summary>Elementary charge, C: CODATA 2018 / SI Brochure 9th ed., exact (references.md [C]).</summary>
    public const double Q = 1.602176634e-19;

    /// <summary>2kT/q in volts (references.md §1 row 11, the "2kT/e" rule of Hobbs ch. 18, from memory).</summary>
    public static double TwoKtOverQ(double kelvin) => 2 * K * kelvin / Q;

    /// <summary>E12 mantissas, references.md §3.4 (IEC 60063, values from memory).</summary>
    public static readonly double[] E12 = [1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2];

    /// <summary>E24 mantissas, references.md §3.4 (IEC 60063, values from memory).</summary>
    public static readonly double[] E24 = [1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1];

    /// <summary>E96 mantissas: references.md §3.4 states E96 = round(10^(i/96), 2) for all 96 values.</summary>
    public static readonly double[] E96 = [.. Enumerable.Range(0, 96).Select(i => Math.Round(Math.Pow(10, i / 96.0), 2))];

    /// <summary>All values of a series over the decades 1e-15 … 1e12.</summary>
    public static IEnumerable<double> Values(double[] mantissas) =>
        Enumerable.Range(-15, 28).SelectMany(e => mantissas.Select(m => double.Parse((m * Math.Pow(10, e)).ToString("G12", System.Globalization.CultureInfo.InvariantCulture), System.Globalization.CultureInfo.InvariantCulture)));

    public static bool IsIn(double[] mantissas, double value) => Values(mantissas).Any(v => Math.Abs(v - value) <= 1e-9 * value);

    /// <summary>The largest series value ≤ <paramref name="value"/>.</summary>
    public static double AtOrBelow(double[] mantissas, double value) => Values(mantissas).Where(v => v <= value * (1 + 1e-9)).Max();

    /// <summary>The smallest series value ≥ <paramref name="value"/>.</summary>
    public static double AtOrAbove(double[] mantissas, double value) => Values(mantissas).Where(v => v >= value * (1 - 1e-9)).Min();

    /// <summary>The nearest series value on a log scale.</summary>
    public static double Nearest(double[] mantissas, double value) => Values(mantissas).MinBy(v => Math.Abs(Math.Log(v / value)));

    /// <summary>
    /// Phase margin in degrees of the ideal-op-amp-limit TIA loop T = (ωt/s)·(1 + s·Rf·Cf)/(1 + s·Rf·(Cin + Cf))
    /// (references.md §1 rows 1–5 with A0 → ∞, no second pole, Rsh = ∞): PM = 90° + atan(ω·Rf·Cf) − atan(ω·Rf·(Cin + Cf))
    /// at |T| = 1, found by bisection on a log scale.
    /// </summary>
    public static double PhaseMarginDeg(double cin, double rf, double cf, double gbw)
    {
        var wt = 2 * Math.PI * gbw;
        double Mag(double w) => wt / w * Math.Sqrt(1 + Math.Pow(w * rf * cf, 2)) / Math.Sqrt(1 + Math.Pow(w * rf * (cin + cf), 2));
        double lo = 1, hi = 1e12;
        for (var i = 0; i < 200; i++)
        {
            var mid = Math.Sqrt(lo * hi);
            if (Mag(mid) > 1)
            {
                lo = mid;
            }
            else
            {
                hi = mid;
            }
        }

        var wc = Math.Sqrt(lo * hi);
        return 90 + ((Math.Atan(wc * rf * cf) - Math.Atan(wc * rf * (cin + cf))) * 180 / Math.PI);
    }

    /// <summary>Asserts two positive values agree to a relative <paramref name="relative"/>.</summary>
    public static void AssertClose(double expected, double actual, double relative = 1e-9) =>
        Assert.True(Math.Abs(actual - expected) <= relative * Math.Abs(expected), $"expected {expected:G12}, got {actual:G12}");
}
