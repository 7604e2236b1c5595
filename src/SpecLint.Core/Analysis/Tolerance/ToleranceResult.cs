using System.Collections.Immutable;
using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>
/// The spread a real build will see: extremes over the tolerance box (every vertex plus a search inside
/// it, references.md §4 item 13) with the corner that gives each, and optionally a Monte Carlo run.
/// </summary>
/// <param name="VariedParameters">The parameters varied, in a stable order.</param>
/// <param name="PhaseMarginMin">The smallest phase margin; null when the loop gain never reaches 1 at some corner.</param>
/// <param name="PhaseMarginMinAt">The corner giving it.</param>
/// <param name="PhaseMarginMax">The largest phase margin (may lie inside the box).</param>
/// <param name="BandwidthMin">The smallest −3 dB bandwidth.</param>
/// <param name="BandwidthMinAt">The corner giving it.</param>
/// <param name="BandwidthMax">The largest −3 dB bandwidth.</param>
/// <param name="BandwidthMaxAt">The corner giving it.</param>
/// <param name="PeakingDbMax">The largest peaking.</param>
/// <param name="PeakingMaxAt">The corner giving it.</param>
/// <param name="UnstableCornerExists">True when at some corner the margin is undefined or below 0°.</param>
/// <param name="MonteCarlo">The Monte Carlo outcome, when requested.</param>
public sealed record ToleranceResult(
    ImmutableArray<VariedParameter> VariedParameters,
    Angle? PhaseMarginMin,
    Corner PhaseMarginMinAt,
    Angle? PhaseMarginMax,
    Frequency? BandwidthMin,
    Corner BandwidthMinAt,
    Frequency? BandwidthMax,
    Corner BandwidthMaxAt,
    double PeakingDbMax,
    Corner PeakingMaxAt,
    bool UnstableCornerExists,
    MonteCarloResult? MonteCarlo)
{
    /// <summary>The corner giving <see cref="PhaseMarginMax"/>.</summary>
    public Corner? PhaseMarginMaxAt { get; init; }

    /// <summary>Distinct points of the box analysed for the extremes (vertices plus the inner search).</summary>
    public int CornerEvaluations { get; init; }

    /// <summary>Parameters whose vertices were all enumerated (fewer than the loop parameters only past <see cref="ToleranceOptions.MaxVertexParameters"/>).</summary>
    public int VertexParameters { get; init; }
}
