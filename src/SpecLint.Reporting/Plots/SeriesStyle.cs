namespace SpecLint.Reporting.Plots;

/// <summary>How a series is stroked. Colour and dash differ between series so that they also differ in greyscale.</summary>
/// <param name="Color">CSS colour, e.g. "#332288".</param>
/// <param name="Dash">SVG stroke-dasharray, or null for a solid line.</param>
/// <param name="Width">Stroke width in px.</param>
internal sealed record SeriesStyle(string Color, string? Dash, double Width);
