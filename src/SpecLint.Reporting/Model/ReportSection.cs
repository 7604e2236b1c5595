using System.Collections.Immutable;

namespace SpecLint.Reporting.Model;

/// <summary>The per-spec section of an analysed spec, as display text.</summary>
/// <param name="Temperature">The nominal temperature in °C, formatted.</param>
/// <param name="Metrics">The metric table's rows.</param>
/// <param name="Corners">The corners and Monte Carlo lines, empty when nothing was varied.</param>
internal sealed record ReportSection(string Temperature, ImmutableArray<ReportMetric> Metrics, ImmutableArray<string> Corners)
{
    /// <summary>The gain settings, one column each, for a channel with more than one gain; empty for a single gain.</summary>
    public ImmutableArray<string> Settings { get; init; } = [];
}

/// <summary>One row of a spec's metric table.</summary>
internal sealed record ReportMetric(string Metric, string Value, string Note)
{
    /// <summary>The value at each of <see cref="ReportSection.Settings"/> (empty for a single gain, which uses <see cref="Value"/>).</summary>
    public ImmutableArray<string> Values { get; init; } = [];
}
