using SpecLint.Core.Analysis;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Analysis;

/// <summary>IEC 60063 tables (references.md §3.4; values from memory, the standard was not consulted).</summary>
public sealed class ESeriesTests
{
    [Fact]
    public void E12_and_E24_are_the_IEC_60063_tables()
    {
        // references.md §3.4 (IEC 60063:2015, from memory).
        Assert.Equal([1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2], ESeries.E12.Values.ToArray());
        Assert.Equal(
            [1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1],
            ESeries.E24.Values.ToArray());
        Assert.Equal([1.0, 1.5, 2.2, 3.3, 4.7, 6.8], ESeries.E6.Values.ToArray());
    }

    [Fact]
    public void E96_starts_and_ends_as_in_the_reference()
    {
        // references.md §3.4: 1.00 1.02 1.05 1.07 1.10 1.13 1.15 1.18 1.21 1.24 1.27 1.30 … 9.53 9.76.
        Assert.Equal([1.00, 1.02, 1.05, 1.07, 1.10, 1.13, 1.15, 1.18, 1.21, 1.24, 1.27, 1.30], ESeries.E96.Values.Take(12).ToArray());
        Assert.Equal([9.53, 9.76], ESeries.E96.Values.TakeLast(2).ToArray());
        Assert.Equal(96, ESeries.E96.Values.Length);
    }

    [Fact]
    public void E96_equals_the_rounded_geometric_formula()
    {
        // references.md §3.4 finding: E96 = round(10^(i/96), 2) for all 96 values.
        for (var i = 0; i < 96; i++)
        {
            Assert.Equal(Math.Round(Math.Pow(10, i / 96.0), 2), ESeries.E96.Values[i]);
        }
    }

    [Fact]
    public void E24_does_not_follow_the_formula_at_eight_values()
    {
        // references.md §3.4: round(10^(i/24), 1) differs at 2.7 3.0 3.3 3.6 3.9 4.3 4.7 8.2.
        var differ = Enumerable.Range(0, 24)
            .Where(i => Math.Round(Math.Pow(10, i / 24.0), 1) != ESeries.E24.Values[i])
            .Select(i => ESeries.E24.Values[i]);
        Assert.Equal([2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 8.2], differ);
    }

    [Fact]
    public void Every_table_is_ascending_within_one_decade_and_coarser_series_nest_in_finer_ones()
    {
        foreach (var s in ESeries.All)
        {
            Assert.Equal(1.0, s.Values[0]);
            Assert.True(s.Values[^1] < 10);
            Assert.True(s.Values.Zip(s.Values.Skip(1)).All(p => p.First < p.Second), s.Name);
        }

        Assert.All(ESeries.E6.Values, v => Assert.Contains(v, ESeries.E12.Values));
        Assert.All(ESeries.E12.Values, v => Assert.Contains(v, ESeries.E24.Values));
        Assert.All(ESeries.E48.Values, v => Assert.Contains(v, ESeries.E96.Values));
        Assert.All(ESeries.E96.Values, v => Assert.Contains(v, ESeries.E192.Values));
    }

    // The tolerance that goes with each series (E6 ±20 %, E12 ±10 %, E24 ±5 %, E48 ±2 %, E96 ±1 %, E192 tighter):
    // references.md §3.4 and [IEC60063], from memory. 7 % falls back to the next series with a tighter step.
    [Theory]
    [InlineData(0.20, "E6")]
    [InlineData(0.10, "E12")]
    [InlineData(0.05, "E24")]
    [InlineData(0.02, "E48")]
    [InlineData(0.01, "E96")]
    [InlineData(0.005, "E192")]
    [InlineData(0.001, "E192")]
    [InlineData(0.07, "E24")]
    public void Series_is_chosen_by_tolerance(double tolerance, string name)
    {
        Assert.Equal(name, ESeries.ForTolerance(tolerance).Name);
    }

    [Fact]
    public void Nearest_and_next_values_work_across_decades()
    {
        Assert.Equal(4.7e-12, ESeries.E12.Nearest(new Capacitance(4.4e-12)).Farads);
        Assert.Equal(10e3, ESeries.E24.Nearest(9.6e3));
        Assert.Equal(9.1e3, ESeries.E24.Nearest(9.5e3));
        Assert.Equal(1.0e-6, ESeries.E6.NextUp(6.9e-7));
        Assert.Equal(6.8e-7, ESeries.E6.NextDown(1.0e-6));
        Assert.Equal(2.2, ESeries.E12.NextUp(1.8));
        Assert.Equal(1.8, ESeries.E12.NextUpOrEqual(1.8));
        Assert.Equal(8.2e2, ESeries.E12.NextDown(1e3));
    }

    // Members and non-members from the E12, E24 and E96 lists of references.md §3.4 ([IEC60063], from memory);
    // E192's 9.20 from the round(10^(i/192), 2) rule stated there for E96 and E192.
    [Fact]
    public void Membership_uses_a_relative_tolerance_in_every_decade()
    {
        Assert.True(ESeries.E24.Contains(new Resistance(4.7e3)));
        Assert.True(ESeries.E24.Contains(2.2e-12 * (1 + 5e-10)));
        Assert.False(ESeries.E24.Contains(2.2e-12 * (1 + 1e-8)));
        Assert.True(ESeries.E96.Contains(1.02e9));
        Assert.False(ESeries.E12.Contains(4.3e3));
        Assert.True(ESeries.E192.Contains(9.20));
        Assert.False(ESeries.E192.Contains(9.19));
    }
}
