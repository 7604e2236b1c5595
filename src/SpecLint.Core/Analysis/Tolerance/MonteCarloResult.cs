using System.Collections.Immutable;

namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>The outcome of a seeded Monte Carlo run over the spec's tolerances.</summary>
/// <param name="Samples">Number of samples drawn.</param>
/// <param name="Seed">The seed; the same seed gives the same result on any thread count.</param>
/// <param name="Distribution">"uniform" or "normal" (tolerance at 3σ).</param>
/// <param name="Yield">Fraction of samples meeting every requirement and the phase-margin floor.</param>
/// <param name="YieldByCheck">Fraction meeting each check separately, by check name ("phase-margin", "bandwidth", "peaking").</param>
/// <param name="PhaseMarginPercentilesDeg">Phase margin percentiles (keys 1, 5, 50, 95, 99); samples with an undefined margin count as 0°.</param>
/// <param name="BandwidthPercentilesHz">Bandwidth percentiles (same keys).</param>
/// <param name="PhaseMarginHistogram">Counts of phase margin per bin, for the report.</param>
public sealed record MonteCarloResult(
    int Samples,
    int Seed,
    string Distribution,
    double Yield,
    ImmutableSortedDictionary<string, double> YieldByCheck,
    ImmutableSortedDictionary<int, double> PhaseMarginPercentilesDeg,
    ImmutableSortedDictionary<int, double> BandwidthPercentilesHz,
    ImmutableArray<HistogramBin> PhaseMarginHistogram)
{
    /// <summary>The seed as configured (a 64-bit whole number); <see cref="Seed"/> holds its low 32 bits.</summary>
    public long ConfiguredSeed { get; init; }

    /// <summary>Samples whose loop gain never fell through 1 (undefined margin, counted as failing the floor).</summary>
    public int PhaseMarginUndefinedCount { get; init; }
}
