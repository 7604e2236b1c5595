using SpecLint.Reporting.Changes;
using SpecLint.Rules.Changes;

namespace SpecLint.Reporting.Tests.Changes;

/// <summary>The delta table of a changed spec: only figures that moved get a row.</summary>
public sealed class DeltaRowsTests
{
    private static readonly MetricSnapshot Base = new(62.0, 55.0, "GBW low (8 MHz)", 1.0e5, 0.5, 1e-12, 0.1, 2.0, 0.99);

    [Fact]
    public void An_unchanged_worst_corner_margin_has_no_row_although_the_head_names_its_corner()
    {
        var rows = DeltaRows.For(Base, Base with { BandwidthHz = 1.2e5 }).ToList();

        Assert.Equal(["Bandwidth"], rows.Select(r => r.Metric));
    }

    [Fact]
    public void A_moved_worst_corner_margin_shows_the_corner_it_is_at()
    {
        var rows = DeltaRows.For(Base, Base with { PhaseMarginDegMin = 48.0 }).ToList();

        var row = Assert.Single(rows);
        Assert.Equal("Phase margin, worst corner", row.Metric);
        Assert.Equal("55.0°", row.Before);
        Assert.Equal("48.0° (GBW low (8 MHz))", row.After);
        Assert.Equal("−7.0°", row.Change);
    }
}
