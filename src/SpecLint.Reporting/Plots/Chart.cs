namespace SpecLint.Reporting.Plots;

/// <summary>
/// A chart as plain data: a shared x-axis, one or more stacked panels, series and markers. The caller supplies
/// the sweeps; <see cref="SvgChartWriter"/> turns it into a standalone SVG.
/// </summary>
/// <param name="Title">Heading above the plot.</param>
/// <param name="XAxis">The x-axis shared by all panels.</param>
/// <param name="Panels">Plot areas from top to bottom (at least one).</param>
/// <param name="Series">Curves; each names its panel.</param>
internal sealed record Chart(string Title, ChartAxis XAxis, IReadOnlyList<ChartPanel> Panels, IReadOnlyList<ChartSeries> Series)
{
    /// <summary>Smaller grey text after the title, e.g. why a marker is missing.</summary>
    public string? Subtitle { get; init; }

    /// <summary>Vertical lines through every panel.</summary>
    public IReadOnlyList<VerticalMarker> VerticalMarkers { get; init; } = [];

    /// <summary>Horizontal reference lines.</summary>
    public IReadOnlyList<HorizontalMarker> HorizontalMarkers { get; init; } = [];

    /// <summary>Labelled dots.</summary>
    public IReadOnlyList<PointMarker> PointMarkers { get; init; } = [];

    /// <summary>Shaded x ranges.</summary>
    public IReadOnlyList<BandMarker> Bands { get; init; } = [];

    /// <summary>Width of the SVG in px.</summary>
    public int Width { get; init; } = 760;

    /// <summary>Height of the SVG in px, legend included.</summary>
    public int Height { get; init; } = 440;

    /// <summary>
    /// Prefix for ids inside the SVG (clip paths). Several charts inlined in one HTML page need different
    /// prefixes; null derives one from the title, which is enough when titles differ.
    /// </summary>
    public string? Id { get; init; }
}
