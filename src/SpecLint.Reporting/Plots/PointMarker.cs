namespace SpecLint.Reporting.Plots;

/// <summary>
/// A dot at one point of a panel with a label, optionally with a vertical span from <see cref="FromY"/> to the
/// point (the phase margin drawn as the distance from −180°).
/// </summary>
/// <param name="X">Position on the x-axis (SI).</param>
/// <param name="Y">Position on the panel's left y-axis.</param>
/// <param name="Label">Text beside the dot.</param>
/// <param name="Panel">Panel index.</param>
internal sealed record PointMarker(double X, double Y, string Label, int Panel = 0)
{
    /// <summary>Start of a span drawn up (or down) to the point, or null.</summary>
    public double? FromY { get; init; }
}
