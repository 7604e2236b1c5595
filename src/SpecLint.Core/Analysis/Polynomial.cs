namespace SpecLint.Core.Analysis;

/// <summary>Real polynomials as coefficient arrays in ascending powers.</summary>
internal static class Polynomial
{
    public static double[] Multiply(double[] a, double[] b)
    {
        var r = new double[a.Length + b.Length - 1];
        for (var i = 0; i < a.Length; i++)
        {
            for (var j = 0; j < b.Length; j++)
            {
                r[i + j] += a[i] * b[j];
            }
        }

        return r;
    }

    public static double[] Add(double[] a, double[] b)
    {
        var r = new double[Math.Max(a.Length, b.Length)];
        for (var i = 0; i < r.Length; i++)
        {
            r[i] = (i < a.Length ? a[i] : 0) + (i < b.Length ? b[i] : 0);
        }

        return r;
    }
}
