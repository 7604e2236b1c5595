namespace SpecLint.Reporting.Plots;

/// <summary>
/// One curve. Points are drawn in the order given (a sweep); a NaN or infinite value, or a non-positive one on
/// a logarithmic axis, breaks the line rather than ending it, and a lone valid point is drawn as a dot.
/// </summary>
/// <param name="Name">Legend text.</param>
/// <param name="Points">X (SI, e.g. Hz) and Y (in the units of the axis it is drawn against).</param>
/// <param name="Style">Stroke; null for the palette entry of the series' position in the chart.</param>
/// <param name="Panel">Index of the panel (0 = top) the series is drawn in.</param>
/// <param name="Axis">Which y-axis of the panel it uses.</param>
internal sealed record ChartSeries(
    string Name,
    IReadOnlyList<(double X, double Y)> Points,
    SeriesStyle? Style = null,
    int Panel = 0,
    YAxisSide Axis = YAxisSide.Left);
