using SpecLint.Core.Analysis;

namespace SpecLint.Reporting.Plots;

/// <summary>
/// The base and head versions of a changed channel with more than one gain drawn together: in the loop-gain and
/// the noise chart, one pair of curves per setting in the setting's colour, the base dotted and the head solid (a
/// setting on one side only has its one curve). One sweep covers the frequencies of interest of every curve.
/// </summary>
internal static class ChangeSettingPlots
{
    private const string BaseDash = "2 3";

    /// <summary>The two charts, keyed by the same suffixes as a single-gain change's (<see cref="ChangePlots"/>).</summary>
    public static IReadOnlyList<(string Suffix, Chart Chart)> Build(IReadOnlyList<(string Name, AnalysisResult? Before, AnalysisResult? After)> settings, string specName)
    {
        ArgumentNullException.ThrowIfNull(settings);
        var analyses = settings.SelectMany(s => new[] { s.Before, s.After }).OfType<AnalysisResult>().ToList();
        if (analyses.Count == 0)
        {
            return [];
        }

        var frequencies = analyses.SelectMany(SpecPlots.Sweep).Distinct().Order().ToArray();
        var curves = settings.Select(s => (Before: s.Before is null ? default : ChangePlots.Curves(s.Before, frequencies), After: s.After is null ? default : ChangePlots.Curves(s.After, frequencies))).ToList();
        // Markers (crossover, phase margin, noise band) follow the first setting on the head, as in the settings chart of a plain check.
        var (lead, leadCurves) = Lead(settings, curves);

        var loop = LoopGainChart.Build(frequencies, leadCurves.MagnitudeDb, leadCurves.PhaseDeg, lead.Crossover?.Hertz, lead.PhaseMargin?.Degrees,
            $"{specName}: loop gain of each setting, base (dotted) and this change");
        var noise = NoiseDensityChart.Build(frequencies, [new NoiseContribution("total", leadCurves.Noise)], leadCurves.Noise,
            lead.Noise?.BandLow.Hertz, lead.Noise?.BandHigh.Hertz, $"{specName}: total output noise density of each setting, base (dotted) and this change");

        var magnitude = new List<ChartSeries>();
        var phase = new List<ChartSeries>();
        var density = new List<ChartSeries>();
        for (var i = 0; i < settings.Count; i++)
        {
            var color = ChartPalette.Series(i).Color;
            var head = new SeriesStyle(color, null, 1.8);
            var based = new SeriesStyle(color, BaseDash, 1.4);
            var name = settings[i].Name;
            if (settings[i].Before is not null)
            {
                var c = curves[i].Before;
                magnitude.Add(new ChartSeries($"|T| {name}, base", ChartData.Zip(frequencies, c.MagnitudeDb, "magnitude"), based, Panel: 0));
                phase.Add(new ChartSeries($"∠T {name}, base", ChartData.Zip(frequencies, c.PhaseDeg, "phase"), based, Panel: 1));
                density.Add(new ChartSeries($"total, {name}, base", ChartData.Zip(frequencies, c.Noise, "noise"), based));
            }

            if (settings[i].After is not null)
            {
                var c = curves[i].After;
                magnitude.Add(new ChartSeries($"|T| {name}, this change", ChartData.Zip(frequencies, c.MagnitudeDb, "magnitude"), head, Panel: 0));
                phase.Add(new ChartSeries($"∠T {name}, this change", ChartData.Zip(frequencies, c.PhaseDeg, "phase"), head, Panel: 1));
                density.Add(new ChartSeries($"total, {name}, this change", ChartData.Zip(frequencies, c.Noise, "noise"), head));
            }
        }

        return [("change-loop-gain", loop with { Series = [.. magnitude, .. phase] }), ("change-noise", noise with { Series = [.. density] })];
    }

    /// <summary>The first setting's head analysis (else the first base one) and the curves already computed for it.</summary>
    private static (AnalysisResult Analysis, (double[] MagnitudeDb, double[] PhaseDeg, double[] Noise) Curves) Lead(
        IReadOnlyList<(string Name, AnalysisResult? Before, AnalysisResult? After)> settings,
        List<((double[] MagnitudeDb, double[] PhaseDeg, double[] Noise) Before, (double[] MagnitudeDb, double[] PhaseDeg, double[] Noise) After)> curves)
    {
        for (var i = 0; i < settings.Count; i++)
        {
            if (settings[i].After is { } after)
            {
                return (after, curves[i].After);
            }
        }

        var first = Enumerable.Range(0, settings.Count).First(i => settings[i].Before is not null);
        return (settings[first].Before!, curves[first].Before);
    }
}
