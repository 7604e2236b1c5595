namespace SpecLint.Reporting.Plots;

/// <summary>
/// Loop gain T = A·β as two stacked panels on a shared frequency axis: |T| in dB above ∠T in degrees, with the
/// 0 dB and −180° references, the crossover frequency and the phase margin marked.
/// </summary>
internal static class LoopGainChart
{
    /// <summary>Builds the chart from a sweep.</summary>
    /// <param name="frequencyHz">Sweep frequencies in Hz (ascending).</param>
    /// <param name="magnitudeDb">|T| in dB, one per frequency.</param>
    /// <param name="phaseDeg">∠T in degrees, unwrapped from DC, one per frequency.</param>
    /// <param name="crossoverHz">Where |T| falls through 0 dB, or null when it never reaches it.</param>
    /// <param name="phaseMarginDeg">180° + ∠T at the crossover, or null when undefined.</param>
    /// <param name="title">Chart title.</param>
    public static Chart Build(
        IReadOnlyList<double> frequencyHz,
        IReadOnlyList<double> magnitudeDb,
        IReadOnlyList<double> phaseDeg,
        double? crossoverHz,
        double? phaseMarginDeg,
        string title = "Loop gain T = A·β")
    {
        var magnitude = ChartData.Zip(frequencyHz, magnitudeDb, nameof(magnitudeDb));
        var phase = ChartData.Zip(frequencyHz, phaseDeg, nameof(phaseDeg));

        var finitePhase = phaseDeg.Where(double.IsFinite).Append(-180.0).ToList();
        var span = finitePhase.Max() - finitePhase.Min();
        // Phase reads best in steps of 45° (or 90° for a wide swing), never in the 1-2-5 steps of other axes.
        var phaseAxis = new ChartAxis("∠T", AxisScale.Linear, TickUnit.Degrees) { Step = span > 270 ? 90 : 45 };

        var chart = new Chart(
            title,
            ChartData.FrequencyAxis(),
            [new ChartPanel(new ChartAxis("|T|", AxisScale.Linear, TickUnit.Decibel)) { Weight = 1.15 }, new ChartPanel(phaseAxis)],
            [
                new ChartSeries("|T| magnitude", magnitude, ChartPalette.Series(0), Panel: 0),
                new ChartSeries("∠T phase", phase, ChartPalette.Series(1), Panel: 1),
            ])
        {
            Height = 580,
            HorizontalMarkers =
            [
                new HorizontalMarker(0, "0 dB", Panel: 0),
                new HorizontalMarker(-180, "−180°", Panel: 1) { LabelBelow = true },
            ],
        };

        if (crossoverHz is not { } fc || !double.IsFinite(fc) || fc <= 0)
        {
            return chart with { Subtitle = "|T| never reaches 0 dB: phase margin undefined" };
        }

        var label = "crossover " + MarkerText.Frequency(fc);
        if (phaseMarginDeg is { } pm && double.IsFinite(pm))
        {
            label += ", PM " + MarkerText.Degrees(pm);
            chart = chart with
            {
                PointMarkers = [new PointMarker(fc, pm - 180, "PM " + MarkerText.Degrees(pm), Panel: 1) { FromY = -180 }],
            };
        }

        return chart with { VerticalMarkers = [new VerticalMarker(fc, label)] };
    }
}
