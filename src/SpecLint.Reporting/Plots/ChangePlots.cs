using SpecLint.Core.Analysis;
using SpecLint.Core.Units;

namespace SpecLint.Reporting.Plots;

/// <summary>
/// The base and head versions of a changed spec drawn together: one loop-gain chart (|T| and ∠T, base dashed)
/// and one chart of the total output noise density. Both versions are swept over one grid that covers the
/// frequencies of interest of either.
/// </summary>
internal static class ChangePlots
{
    // Dotted and grey, so the base reads apart from the head series whatever their palette dashes.
    private static readonly SeriesStyle BaseStyle = new(ChartPalette.MutedInk, "2 3", 1.6);

    /// <summary>The key under which <see cref="PlotFiles"/> hands a changed spec's chart links to the report.</summary>
    public static string LinkKey(string file) => "change:" + file;

    /// <summary>The two charts, keyed by a file-name suffix.</summary>
    public static IReadOnlyList<(string Suffix, Chart Chart)> Build(AnalysisResult before, AnalysisResult after, string specName)
    {
        ArgumentNullException.ThrowIfNull(before);
        ArgumentNullException.ThrowIfNull(after);
        var frequencies = SpecPlots.Sweep(before).Concat(SpecPlots.Sweep(after)).Distinct().Order().ToArray();
        var (baseMag, basePhase, baseNoise) = Curves(before, frequencies);
        var (headMag, headPhase, headNoise) = Curves(after, frequencies);

        var loop = LoopGainChart.Build(frequencies, headMag, headPhase, after.Crossover?.Hertz, after.PhaseMargin?.Degrees, $"{specName}: loop gain, base (dotted) and this change");
        loop = loop with
        {
            Series =
            [
                new ChartSeries("|T| base", ChartData.Zip(frequencies, baseMag, nameof(baseMag)), BaseStyle, Panel: 0),
                new ChartSeries("∠T base", ChartData.Zip(frequencies, basePhase, nameof(basePhase)), BaseStyle, Panel: 1),
                .. loop.Series.Select(s => s with { Name = s.Name + ", this change" }),
            ],
        };

        var noise = NoiseDensityChart.Build(frequencies, [new NoiseContribution("total, this change", headNoise)], headNoise,
            after.Noise?.BandLow.Hertz, after.Noise?.BandHigh.Hertz, $"{specName}: total output noise density, base (dotted) and this change");
        noise = noise with
        {
            Series =
            [
                new ChartSeries("total, base", ChartData.Zip(frequencies, baseNoise, nameof(baseNoise)), BaseStyle),
                noise.Series[0],
            ],
        };
        return [("change-loop-gain", loop), ("change-noise", noise)];
    }

    /// <summary>|T| in dB, ∠T in degrees and the total output noise density of <paramref name="analysis"/> at each frequency.</summary>
    internal static (double[] MagnitudeDb, double[] PhaseDeg, double[] Noise) Curves(AnalysisResult analysis, double[] frequencies)
    {
        var model = new TiaModel(analysis.Circuit, analysis.Noise?.Temperature ?? analysis.Circuit.Temperature);
        var mag = new double[frequencies.Length];
        var phase = new double[frequencies.Length];
        var noise = new double[frequencies.Length];
        for (var i = 0; i < frequencies.Length; i++)
        {
            var f = new Frequency(frequencies[i]);
            mag[i] = 20 * Math.Log10(model.LoopGain(f).Magnitude);
            phase[i] = model.LoopGainPhase(f).Degrees;
            noise[i] = Math.Sqrt(model.OutputNoise(f).Total);
        }

        return (mag, phase, noise);
    }
}
