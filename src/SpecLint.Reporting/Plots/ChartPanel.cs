namespace SpecLint.Reporting.Plots;

/// <summary>One plot area of a chart; stacked panels share the x-axis (e.g. loop gain magnitude above phase).</summary>
/// <param name="YAxis">The left y-axis.</param>
internal sealed record ChartPanel(ChartAxis YAxis)
{
    /// <summary>An optional right y-axis for series with <see cref="YAxisSide.Right"/>.</summary>
    public ChartAxis? SecondaryYAxis { get; init; }

    /// <summary>Relative height among the chart's panels.</summary>
    public double Weight { get; init; } = 1;
}
