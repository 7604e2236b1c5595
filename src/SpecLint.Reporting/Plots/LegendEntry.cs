namespace SpecLint.Reporting.Plots;

/// <summary>A placed legend entry: text, the series it stands for, its stroke, and where it sits.</summary>
internal sealed record LegendEntry(string Text, string SeriesName, SeriesStyle Style, double X, int Row);
