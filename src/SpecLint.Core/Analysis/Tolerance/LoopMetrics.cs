namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>The small-signal figures the tolerance analysis tracks at one point of the box.</summary>
/// <param name="PhaseMarginDeg">Phase margin in degrees; null when |T| never falls through 1.</param>
/// <param name="BandwidthHz">−3 dB bandwidth; null when not found.</param>
/// <param name="PeakingDb">Peaking in dB.</param>
internal readonly record struct LoopMetrics(double? PhaseMarginDeg, double? BandwidthHz, double PeakingDb)
{
    /// <summary>Analyses a circuit on the loop-only path (<see cref="TiaAnalyzer.LoopFigures"/>).</summary>
    public static LoopMetrics Of(Circuit circuit)
    {
        var (pm, bw, peak) = TiaAnalyzer.LoopFigures(circuit);
        return new LoopMetrics(pm, bw, peak);
    }

    /// <summary>The same figures from the full analysis (what <see cref="Of"/> must agree with).</summary>
    public static LoopMetrics OfFullAnalysis(Circuit circuit)
    {
        var r = TiaAnalyzer.Analyze(circuit, AnalysisOptions.WithoutNoise);
        return new LoopMetrics(r.PhaseMargin?.Degrees, r.Bandwidth?.Hertz, r.PeakingDb);
    }
}
