namespace SpecLint.Reporting.Plots;

/// <summary>A horizontal reference line in one panel, e.g. "0 dB", "−180°", "−3 dB". The axis range always includes it.</summary>
/// <param name="Y">Value on the y-axis.</param>
/// <param name="Label">Text on the line.</param>
/// <param name="Panel">Panel index.</param>
/// <param name="Axis">Which y-axis of the panel <paramref name="Y"/> refers to.</param>
internal sealed record HorizontalMarker(double Y, string Label, int Panel = 0, YAxisSide Axis = YAxisSide.Left)
{
    /// <summary>Put the label under the line (for two references close together).</summary>
    public bool LabelBelow { get; init; }

    /// <summary>Put the label at the left end instead of the right.</summary>
    public bool LabelAtStart { get; init; }
}
