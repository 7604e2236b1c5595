namespace SpecLint.Reporting.Plots;

/// <summary>
/// Output noise density per source and in total, log-log in V/√Hz, with the integration band shaded. The total is
/// drawn last, thicker and near-black, so it sits on top of its sources.
/// </summary>
internal static class NoiseDensityChart
{
    // Sources far below the total do not matter to the reader and would stretch the axis over many decades.
    private const double DecadesBelowTotal = 5;

    /// <summary>Builds the chart from a sweep.</summary>
    /// <param name="frequencyHz">Sweep frequencies in Hz (ascending).</param>
    /// <param name="sources">Each source's output noise density, V/√Hz.</param>
    /// <param name="totalVPerRtHz">The root-sum-square total, V/√Hz.</param>
    /// <param name="bandLowHz">Lower end of the integration band, or null.</param>
    /// <param name="bandHighHz">Upper end of the integration band, or null.</param>
    /// <param name="title">Chart title.</param>
    public static Chart Build(
        IReadOnlyList<double> frequencyHz,
        IReadOnlyList<NoiseContribution> sources,
        IReadOnlyList<double> totalVPerRtHz,
        double? bandLowHz = null,
        double? bandHighHz = null,
        string title = "Output noise density")
    {
        ArgumentNullException.ThrowIfNull(sources);
        var series = sources
            .Select((s, i) => new ChartSeries(s.Source, ChartData.Zip(frequencyHz, s.DensityVPerRtHz, nameof(sources)), ChartPalette.Series(i)))
            .Append(new ChartSeries("total", ChartData.Zip(frequencyHz, totalVPerRtHz, nameof(totalVPerRtHz)), ChartPalette.Emphasis))
            .ToList();

        var yAxis = new ChartAxis("output noise density", AxisScale.Log, TickUnit.Of(SpecLint.Core.Units.Dimension.VoltageNoiseDensity));
        var totalMax = totalVPerRtHz.Where(v => double.IsFinite(v) && v > 0).DefaultIfEmpty(0).Max();
        var smallest = series.SelectMany(s => s.Points).Select(p => p.Y).Where(v => double.IsFinite(v) && v > 0).DefaultIfEmpty(0).Min();
        if (totalMax > 0 && smallest < totalMax / Math.Pow(10, DecadesBelowTotal))
        {
            yAxis = yAxis with { Min = Math.Pow(10, Math.Floor(Math.Log10(totalMax)) - DecadesBelowTotal) };
        }

        var chart = new Chart(title, ChartData.FrequencyAxis(), [new ChartPanel(yAxis)], series) { Height = 440 };
        if (bandLowHz is { } lo && bandHighHz is { } hi && lo > 0 && hi > lo)
        {
            chart = chart with { Bands = [new BandMarker(lo, hi, "noise band " + MarkerText.Frequency(lo) + " – " + MarkerText.Frequency(hi))] };
        }

        return chart;
    }
}
