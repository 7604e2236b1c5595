namespace SpecLint.Reporting.Plots;

/// <summary>Which y-axis of a panel a series or reference line is drawn against.</summary>
internal enum YAxisSide
{
    /// <summary>The panel's main axis, on the left.</summary>
    Left,

    /// <summary>The panel's optional second axis, on the right (<see cref="ChartPanel.SecondaryYAxis"/>).</summary>
    Right,
}
