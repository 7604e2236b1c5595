namespace SpecLint.Reporting.Plots;

/// <summary>A shaded x range through every panel, e.g. the noise integration band.</summary>
/// <param name="FromX">Lower end (SI).</param>
/// <param name="ToX">Upper end (SI).</param>
/// <param name="Label">Text at the top of the band.</param>
internal sealed record BandMarker(double FromX, double ToX, string Label);
