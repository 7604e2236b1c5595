namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>The small-signal figures the tolerance analysis tracks at one point of the box.</summary>
/// <param name="PhaseMarginDeg">Phase margin in degrees; null when |T| never falls through 1.</param>
/// <param name="BandwidthHz">−3 dB bandwidth; null when not found.</param>
/// <param name="PeakingDb">Peaking in dB.</param>
internal readonly record struct LoopMetrics(double? PhaseMarginDeg, double? BandwidthHz, double PeakingDb)
{
    /// <summary>Analyses a circuit on the fast path (no noise).</summary>
    public static LoopMetrics Of(Circuit circuit)
    {
        var r = TiaAnalyzer.Analyze(circuit, AnalysisOptions.WithoutNoise);
        return new LoopMetrics(r.PhaseMargin?.Degrees, r.Bandwidth?.Hertz, r.PeakingDb);
    }
}
