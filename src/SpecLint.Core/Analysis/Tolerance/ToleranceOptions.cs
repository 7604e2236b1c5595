using SpecLint.Core.Config;
using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>What <see cref="ToleranceAnalyzer.Analyze(Spec.Model.TiaSpec, ToleranceOptions)"/> computes, and how.</summary>
internal sealed record ToleranceOptions
{
    /// <summary>Corners only, no Monte Carlo: the cheap setting fix re-checks use.</summary>
    public static ToleranceOptions CornersOnly { get; } = new();

    /// <summary>
    /// Monte Carlo settings, or null for corners only. Uniform draws are uniform between the limits; normal
    /// draws put the limits at ±3σ (σ taken separately on each side of the typical value for an asymmetric
    /// tolerance) and clip at ±3σ, so no draw leaves the tolerance box.
    /// </summary>
    public MonteCarloSettings? MonteCarlo { get; init; }

    /// <summary>Phase-margin floor for the Monte Carlo yield when the spec has no <c>requirements.phase-margin</c> (default 45°).</summary>
    public Angle PhaseMarginFloor { get; init; } = Angle.FromDegrees(45);

    /// <summary>Peaking limit for the Monte Carlo yield when the spec has no <c>requirements.peaking</c> (default 1 dB).</summary>
    public double PeakingLimitDb { get; init; } = 1;

    /// <summary>
    /// The temperature rise, in kelvin, over which the op-amp's input bias current doubles (default 10 K, the
    /// usual figure for FET inputs, common practice). The spec's bias current is taken at 25 °C. Use
    /// <see cref="double.PositiveInfinity"/> for a bipolar input whose bias current barely moves.
    /// </summary>
    public double BiasCurrentDoublingKelvin { get; init; } = 10;

    /// <summary>
    /// The most parameters whose 2ⁿ vertices are all evaluated (default 12, i.e. 4096 vertices). With more,
    /// the <see cref="MaxVertexParameters"/> with the largest one-at-a-time effect are enumerated, the others
    /// held typical, and the search inside the box then moves every parameter, the others included. Values
    /// above 20 count as 20.
    /// </summary>
    public int MaxVertexParameters { get; init; } = 12;

    /// <summary>Whether to search inside the box for interior extremes (references.md §4 item 13); on by default.</summary>
    public bool SearchInterior { get; init; } = true;

    /// <summary>Threads for Monte Carlo; -1 (the default) for all cores. Results do not depend on it.</summary>
    public int MaxDegreeOfParallelism { get; init; } = -1;
}
