namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>Compares points of the box by value, so a point reached twice is analysed once.</summary>
internal sealed class PointComparer : IEqualityComparer<double[]>
{
    public static PointComparer Instance { get; } = new();

    public bool Equals(double[]? x, double[]? y) =>
        ReferenceEquals(x, y) || (x is not null && y is not null && x.AsSpan().SequenceEqual(y));

    public int GetHashCode(double[] obj)
    {
        ArgumentNullException.ThrowIfNull(obj);
        var h = new HashCode();
        foreach (var v in obj)
        {
            h.Add(v);
        }

        return h.ToHashCode();
    }
}
