using SpecLint.Core.Analysis;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Spec.Model;

namespace SpecLint.Rules.Engine;

/// <summary>A spec with what the analysis says about it: the nominal operating point, its results and the tolerance spread.</summary>
/// <param name="Spec">The spec.</param>
/// <param name="Circuit">The nominal operating point.</param>
/// <param name="Analysis">Nominal results (noise at the hottest temperature, when computed).</param>
/// <param name="Tolerances">Corners (and Monte Carlo), or null when nothing varies or they were not computed.</param>
public sealed record SpecAnalysis(TiaSpec Spec, Circuit Circuit, AnalysisResult Analysis, ToleranceResult? Tolerances)
{
    /// <summary>The smallest phase margin anywhere: the worst corner when corners exist, else nominal.</summary>
    public double? WorstPhaseMarginDeg => Tolerances is { } t
        ? (t.UnstableCornerExists && t.PhaseMarginMin is null ? null : Math.Min(t.PhaseMarginMin?.Degrees ?? double.NaN, Analysis.PhaseMargin?.Degrees ?? double.NaN))
        : Analysis.PhaseMargin?.Degrees;

    /// <summary>The smallest bandwidth anywhere: the worst corner when corners exist, else nominal.</summary>
    public double? WorstBandwidthHz => Tolerances?.BandwidthMin is { } b
        ? Math.Min(b.Hertz, Analysis.Bandwidth?.Hertz ?? double.PositiveInfinity)
        : Analysis.Bandwidth?.Hertz;
}
