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

    /// <summary>
    /// <see cref="Of(Circuit, in LoopHint)"/> at a point of a box: a plain circuit's loop is read from the point
    /// without building the circuit, so a Monte Carlo sample allocates nothing.
    /// </summary>
    public static LoopMetrics At(ToleranceBox box, ReadOnlySpan<double> x, in LoopHint hint)
    {
        if (box.TryPlainLoop(x, out var loop) && loop.TryFigures(20, hint, out var f, out _))
        {
            return new LoopMetrics(f.PhaseMarginDeg, f.BandwidthHz, f.PeakingDb);
        }

        return Of(box.Build(x), hint);
    }

    /// <summary>The same figures from the full analysis (what <see cref="Of(Circuit)"/> must agree with).</summary>
    public static LoopMetrics OfFullAnalysis(Circuit circuit)
    {
        var r = TiaAnalyzer.Analyze(circuit, AnalysisOptions.WithoutNoise);
        return new LoopMetrics(r.PhaseMargin?.Degrees, r.Bandwidth?.Hertz, r.PeakingDb);
    }
}
