namespace SpecLint.Reporting.Plots;

/// <summary>One axis: its title, scale and tick labels, and optionally a fixed range or tick step.</summary>
/// <param name="Title">Axis title, e.g. "frequency" or "|T| (dB)".</param>
/// <param name="Scale">Linear or logarithmic.</param>
/// <param name="Unit">How tick values are written.</param>
internal sealed record ChartAxis(string Title, AxisScale Scale, TickUnit Unit)
{
    /// <summary>Lower end; null to fit the data (rounded out to a tick or a decade).</summary>
    public double? Min { get; init; }

    /// <summary>Upper end; null to fit the data (rounded out to a tick or a decade).</summary>
    public double? Max { get; init; }

    /// <summary>Linear tick step; null to pick 1, 2 or 5 × 10ⁿ.</summary>
    public double? Step { get; init; }
}
