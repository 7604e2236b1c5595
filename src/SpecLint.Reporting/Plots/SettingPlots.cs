using SpecLint.Core.Analysis;
using SpecLint.Core.Units;

namespace SpecLint.Reporting.Plots;

/// <summary>
/// The settings of a channel with more than one gain drawn together: one curve per setting in the loop-gain,
/// transimpedance and noise charts, over one sweep that covers the frequencies of interest of every setting.
/// </summary>
internal static class SettingPlots
{
    /// <summary>The three charts, keyed by a file-name suffix.</summary>
    public static IReadOnlyList<(string Suffix, Chart Chart)> Build(IReadOnlyList<(string Name, AnalysisResult Analysis)> settings, string specName)
    {
        ArgumentNullException.ThrowIfNull(settings);
        var frequencies = settings.SelectMany(s => SpecPlots.Sweep(s.Analysis)).Distinct().Order().ToArray();
        var curves = settings.Select(s => Curves(s.Analysis, frequencies)).ToList();
        var first = settings[0].Analysis;

        var loop = LoopGainChart.Build(frequencies, curves[0].MagnitudeDb, curves[0].PhaseDeg, first.Crossover?.Hertz, first.PhaseMargin?.Degrees, $"{specName}: loop gain of each setting");
        loop = loop with
        {
            Series =
            [
                .. settings.Select((s, i) => new ChartSeries($"|T| {s.Name}", ChartData.Zip(frequencies, curves[i].MagnitudeDb, "magnitude"), ChartPalette.Series(i), Panel: 0)),
                .. settings.Select((s, i) => new ChartSeries($"∠T {s.Name}", ChartData.Zip(frequencies, curves[i].PhaseDeg, "phase"), ChartPalette.Series(i), Panel: 1)),
            ],
        };

        var zt = TransimpedanceChart.Build(frequencies, curves[^1].Zt, null, null, TransimpedanceScale.Ohms, $"{specName}: closed-loop transimpedance of each setting");
        zt = zt with
        {
            Series = [.. settings.Select((s, i) => new ChartSeries($"|Zt| {s.Name}", ChartData.Zip(frequencies, curves[i].Zt, "zt"), ChartPalette.Series(i)))],
        };

        var noise = NoiseDensityChart.Build(frequencies, [new NoiseContribution("total", curves[0].Noise)], curves[0].Noise,
            first.Noise?.BandLow.Hertz, first.Noise?.BandHigh.Hertz, $"{specName}: total output noise density of each setting");
        noise = noise with
        {
            Series = [.. settings.Select((s, i) => new ChartSeries($"total, {s.Name}", ChartData.Zip(frequencies, curves[i].Noise, "noise"), ChartPalette.Series(i)))],
        };
        return [("loop-gain", loop), ("transimpedance", zt), ("noise", noise)];
    }

    private static (double[] MagnitudeDb, double[] PhaseDeg, double[] Zt, double[] Noise) Curves(AnalysisResult analysis, double[] frequencies)
    {
        var model = new TiaModel(analysis.Circuit, analysis.Noise?.Temperature ?? analysis.Circuit.Temperature);
        var mag = new double[frequencies.Length];
        var phase = new double[frequencies.Length];
        var zt = new double[frequencies.Length];
        var noise = new double[frequencies.Length];
        for (var i = 0; i < frequencies.Length; i++)
        {
            var f = new Frequency(frequencies[i]);
            mag[i] = 20 * Math.Log10(model.LoopGain(f).Magnitude);
            phase[i] = model.LoopGainPhase(f).Degrees;
            zt[i] = model.Transimpedance(f).Magnitude;
            noise[i] = Math.Sqrt(model.OutputNoise(f).Total);
        }

        return (mag, phase, zt, noise);
    }
}
