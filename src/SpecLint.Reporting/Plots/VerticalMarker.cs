namespace SpecLint.Reporting.Plots;

/// <summary>A vertical line at one x value through every panel, labelled at the top, e.g. "crossover 1.2 MHz, PM 58°".</summary>
/// <param name="X">Position on the x-axis (SI).</param>
/// <param name="Label">Text beside the line.</param>
internal sealed record VerticalMarker(double X, string Label);
