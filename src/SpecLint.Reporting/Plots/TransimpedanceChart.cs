namespace SpecLint.Reporting.Plots;

/// <summary>
/// Closed-loop transimpedance |Zt| over frequency, with the DC value and the −3 dB level as references and the
/// −3 dB bandwidth marked.
/// </summary>
internal static class TransimpedanceChart
{
    /// <summary>Builds the chart from a sweep.</summary>
    /// <param name="frequencyHz">Sweep frequencies in Hz (ascending).</param>
    /// <param name="magnitudeOhm">|Zt| in Ω, one per frequency.</param>
    /// <param name="bandwidthHz">The −3 dB frequency, or null when not found in the sweep.</param>
    /// <param name="dcOhm">|Zt(0)| in Ω, or null to leave out the DC and −3 dB references.</param>
    /// <param name="scale">Ω on a log axis, or dBΩ on a linear one.</param>
    /// <param name="title">Chart title.</param>
    public static Chart Build(
        IReadOnlyList<double> frequencyHz,
        IReadOnlyList<double> magnitudeOhm,
        double? bandwidthHz,
        double? dcOhm,
        TransimpedanceScale scale = TransimpedanceScale.Ohms,
        string title = "Transimpedance |Zt|")
    {
        var db = scale == TransimpedanceScale.DecibelOhms;
        Func<double, double> toAxis = db ? (ohm => ohm > 0 ? 20 * Math.Log10(ohm) : double.NaN) : (ohm => ohm);
        var points = ChartData.Zip(frequencyHz, magnitudeOhm, nameof(magnitudeOhm), toAxis);
        var yAxis = db
            ? new ChartAxis("|Zt|", AxisScale.Linear, TickUnit.DecibelOhm)
            : new ChartAxis("|Zt|", AxisScale.Log, TickUnit.Of(SpecLint.Core.Units.Dimension.Resistance));
        var top = magnitudeOhm.Where(v => double.IsFinite(v) && v > 0).Append(dcOhm is { } d0 && d0 > 0 ? d0 : 0).Max();
        if (!db && top > 0)
        {
            // Room above the flat part for the DC label and the bandwidth label, which would otherwise touch the frame.
            yAxis = yAxis with { Max = AxisMap.NiceAtOrAbove(top * 2.5) };
        }

        var chart = new Chart(title, ChartData.FrequencyAxis(), [new ChartPanel(yAxis)], [new ChartSeries("|Zt|", points, ChartPalette.Series(0))])
        {
            Height = 420,
        };

        var references = new List<HorizontalMarker>();
        var minus3 = (double?)null;
        if (dcOhm is { } dc && double.IsFinite(dc) && dc > 0)
        {
            minus3 = toAxis(dc / Math.Sqrt(2));
            references.Add(new HorizontalMarker(toAxis(dc), "DC " + MarkerText.Ohms(dc)) { LabelAtStart = true });
            references.Add(new HorizontalMarker(minus3.Value, "−3 dB") { LabelAtStart = true, LabelBelow = true });
        }

        chart = chart with { HorizontalMarkers = references };
        if (bandwidthHz is { } bw && double.IsFinite(bw) && bw > 0)
        {
            chart = chart with { VerticalMarkers = [new VerticalMarker(bw, "−3 dB at " + MarkerText.Frequency(bw))] };
            if (minus3 is { } level)
            {
                chart = chart with { PointMarkers = [new PointMarker(bw, level, "")] };
            }
        }
        else
        {
            chart = chart with { Subtitle = "no −3 dB point inside the sweep" };
        }

        return chart;
    }
}
