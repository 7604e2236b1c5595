namespace SpecLint.Reporting.Model;

/// <summary>One chart of a report, already drawn.</summary>
/// <param name="Suffix">The file-name suffix (<c>loop-gain</c>, <c>noise</c>, ...).</param>
/// <param name="Title">The chart's title, which the report uses as the image's alternative text.</param>
/// <param name="Svg">The SVG document.</param>
internal sealed record ReportChart(string Suffix, string Title, string Svg);
