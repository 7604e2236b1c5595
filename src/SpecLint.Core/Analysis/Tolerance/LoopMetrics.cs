namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>The small-signal figures the tolerance analysis tracks at one point of the box.</summary>
/// <param name="PhaseMarginDeg">Phase margin in degrees; null when |T| never falls through 1.</param>
/// <param name="BandwidthHz">−3 dB bandwidth; null when not found.</param>
/// <param name="PeakingDb">Peaking in dB.</param>
internal readonly record struct LoopMetrics(double? PhaseMarginDeg, double? BandwidthHz, double PeakingDb)
{
    /// <summary>Analyses a circuit on the loop-only path (<see cref="TiaAnalyzer.LoopFigures(Circuit, int)"/>).</summary>
    public static LoopMetrics Of(Circuit circuit) => Of(circuit, LoopHint.None);

    /// <summary><see cref="Of(Circuit)"/> starting from the roots of a nearby point (the box's typical one).</summary>
    public static LoopMetrics Of(Circuit circuit, in LoopHint hint)
    {
        var (pm, bw, peak) = TiaAnalyzer.LoopFigures(circuit, hint);
        return new LoopMetrics(pm, bw, peak);
    }

    /// <summary>The same figures from the full analysis (what <see cref="Of(Circuit)"/> must agree with).</summary>
    public static LoopMetrics OfFullAnalysis(Circuit circuit)
    {
        var r = TiaAnalyzer.Analyze(circuit, AnalysisOptions.WithoutNoise);
        return new LoopMetrics(r.PhaseMargin?.Degrees, r.Bandwidth?.Hertz, r.PeakingDb);
    }
}
