namespace SpecLint.Reporting.Plots;

/// <summary>Argument checks and zipping shared by the ready-made chart builders.</summary>
internal static class ChartData
{
    public static IReadOnlyList<(double X, double Y)> Zip(IReadOnlyList<double> x, IReadOnlyList<double> y, string yName, Func<double, double>? transform = null)
    {
        ArgumentNullException.ThrowIfNull(x);
        ArgumentNullException.ThrowIfNull(y, yName);
        if (x.Count != y.Count)
        {
            throw new ArgumentException($"{yName} has {y.Count} values for {x.Count} frequencies", yName);
        }

        var points = new (double X, double Y)[x.Count];
        for (var i = 0; i < x.Count; i++)
        {
            points[i] = (x[i], transform is null ? y[i] : transform(y[i]));
        }

        return points;
    }

    public static ChartAxis FrequencyAxis() =>
        new("frequency", AxisScale.Log, TickUnit.Of(SpecLint.Core.Units.Dimension.Frequency));
}
