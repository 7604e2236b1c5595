namespace SpecLint.Reporting.Plots;

/// <summary>One noise source's output noise density over the sweep.</summary>
/// <param name="Source">Legend text, e.g. "Rf thermal", "op-amp en".</param>
/// <param name="DensityVPerRtHz">Output noise density in V/√Hz, one per frequency.</param>
internal sealed record NoiseContribution(string Source, IReadOnlyList<double> DensityVPerRtHz);
