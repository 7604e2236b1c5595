using System.Globalization;
using SpecLint.Core.Analysis;
using SpecLint.Core.Units;

namespace SpecLint.Reporting.Plots;

/// <summary>
/// Sweeps a spec's nominal circuit and builds its three charts: loop gain, transimpedance and output noise
/// density by source. The sweep spans the noise band and a decade beyond the loop crossover.
/// </summary>
internal static class SpecPlots
{
    private const int PointsPerDecade = 40;

    /// <summary>The three charts of one analysed spec, keyed by a file-name suffix.</summary>
    public static IReadOnlyList<(string Suffix, Chart Chart)> Build(AnalysisResult analysis, string specName)
    {
        ArgumentNullException.ThrowIfNull(analysis);
        var circuit = analysis.Circuit;
        var noiseTemperature = analysis.Noise?.Temperature ?? circuit.Temperature;
        var model = new TiaModel(circuit, noiseTemperature);
        var frequencies = Sweep(analysis);

        var magnitudeDb = new double[frequencies.Length];
        var phaseDeg = new double[frequencies.Length];
        var zt = new double[frequencies.Length];
        var rf = new double[frequencies.Length];
        var rsh = new double[frequencies.Length];
        var shot = new double[frequencies.Length];
        var inoise = new double[frequencies.Length];
        var enoise = new double[frequencies.Length];
        var total = new double[frequencies.Length];
        var series = new double[frequencies.Length];
        for (var i = 0; i < frequencies.Length; i++)
        {
            var f = new Frequency(frequencies[i]);
            magnitudeDb[i] = 20 * Math.Log10(model.LoopGain(f).Magnitude);
            phaseDeg[i] = model.LoopGainPhase(f).Degrees;
            zt[i] = model.Transimpedance(f).Magnitude;
            var n = model.OutputNoise(f);
            rf[i] = Math.Sqrt(n.RfThermal);
            rsh[i] = Math.Sqrt(n.RshThermal);
            shot[i] = Math.Sqrt(n.Shot);
            inoise[i] = Math.Sqrt(n.CurrentNoise);
            enoise[i] = Math.Sqrt(n.VoltageNoise);
            total[i] = Math.Sqrt(n.Total);
            series[i] = Math.Sqrt(n.SeriesThermal);
        }

        var sources = new List<NoiseContribution> { new("Rf thermal", rf) };
        if (circuit.Rsh is not null)
        {
            sources.Add(new("Rsh thermal", rsh));
        }

        sources.Add(new("shot (Imin + Idark)", shot));
        sources.Add(new("op-amp i_n", inoise));
        sources.Add(new("op-amp e_n × noise gain", enoise));
        if (circuit.HasNetwork)
        {
            sources.Add(new("switch, wiper or access R thermal", series));
        }

        var temperature = noiseTemperature.Celsius.ToString("0.#", CultureInfo.InvariantCulture);
        return
        [
            ("loop-gain", LoopGainChart.Build(frequencies, magnitudeDb, phaseDeg, analysis.Crossover?.Hertz, analysis.PhaseMargin?.Degrees, $"{specName}: loop gain T = A·β")),
            ("transimpedance", TransimpedanceChart.Build(frequencies, zt, analysis.Bandwidth?.Hertz, analysis.Transimpedance.Ohms, TransimpedanceScale.Ohms, $"{specName}: closed-loop transimpedance |Zt|")),
            ("noise", NoiseDensityChart.Build(frequencies, sources, total, analysis.Noise?.BandLow.Hertz, analysis.Noise?.BandHigh.Hertz, $"{specName}: output noise density at {temperature} °C")),
        ];
    }

    /// <summary>Log-spaced frequencies covering the band of interest.</summary>
    public static double[] Sweep(AnalysisResult analysis)
    {
        ArgumentNullException.ThrowIfNull(analysis);
        var marks = new List<double>();
        if (analysis.Noise is { } n)
        {
            marks.Add(n.BandLow.Hertz);
            marks.Add(n.BandHigh.Hertz);
        }

        foreach (var f in new[] { analysis.Bandwidth, analysis.Crossover, analysis.BetaZero, analysis.BetaPole, analysis.PeakFrequency })
        {
            if (f is { } v && v.Hertz > 0 && double.IsFinite(v.Hertz))
            {
                marks.Add(v.Hertz);
            }
        }

        marks.AddRange(analysis.Crossings.Select(c => c.Frequency.Hertz));
        var lo = marks.Count == 0 ? 1 : Math.Min(1, marks.Min() / 10);
        var hi = marks.Count == 0 ? 1e6 : marks.Max() * 10;
        var decadeLo = Math.Floor(Math.Log10(lo));
        var decadeHi = Math.Ceiling(Math.Log10(hi));
        var count = (int)((decadeHi - decadeLo) * PointsPerDecade) + 1;
        return Enumerable.Range(0, count).Select(i => Math.Pow(10, decadeLo + ((double)i / PointsPerDecade))).ToArray();
    }
}
