namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>One bin of a histogram: [From, To) and its count.</summary>
/// <param name="From">Lower edge.</param>
/// <param name="To">Upper edge.</param>
/// <param name="Count">Samples in the bin.</param>
public sealed record HistogramBin(double From, double To, int Count);
