using System.Xml.Linq;
using SpecLint.Core.Units;
using SpecLint.Reporting.Plots;

namespace SpecLint.Reporting.Tests.Plots;

public sealed class SvgChartWriterTests
{
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    public static TheoryData<string> ChartNames => new() { "loop-gain", "transimpedance", "noise-density" };

    private static Chart Sample(string name) => name switch
    {
        "loop-gain" => SampleChannel.LoopGain(),
        "transimpedance" => SampleChannel.Transimpedance(),
        _ => SampleChannel.NoiseDensity(),
    };

    private static IEnumerable<XElement> WithClass(XDocument doc, string cssClass) =>
        doc.Descendants().Where(e => ((string?)e.Attribute("class"))?.Split(' ').Contains(cssClass) == true);

    [Theory]
    [MemberData(nameof(ChartNames))]
    public void Every_chart_is_svg_with_axes_tick_labels_series_paths_and_legend_entries(string name)
    {
        var chart = Sample(name);
        var doc = XDocument.Parse(SvgChartWriter.Write(chart));

        Assert.Equal(Svg + "svg", doc.Root!.Name);
        Assert.Equal(chart.Panels.Count, WithClass(doc, "x-axis").Count());
        Assert.Equal(chart.Panels.Count, WithClass(doc, "y-axis").Count());
        var ticks = WithClass(doc, "tick-label").Select(t => t.Value).ToList();
        Assert.Contains("1 kHz", ticks);
        Assert.Contains("1 MHz", ticks);
        Assert.Equal(chart.Series.Count, WithClass(doc, "series").Count(g => g.Elements(Svg + "path").Any()));
        var legend = WithClass(doc, "legend-entry").Select(e => (string?)e.Attribute("data-series")).ToList();
        Assert.Equal(chart.Series.Select(s => s.Name), legend);
        Assert.Contains(WithClass(doc, "chart-title"), t => t.Value == chart.Title);
    }

    [Fact]
    public void Loop_gain_marks_the_crossover_and_phase_margin_and_draws_both_references()
    {
        var doc = XDocument.Parse(SvgChartWriter.Write(SampleChannel.LoopGain()));

        var ticks = WithClass(doc, "tick-label").Select(t => t.Value).ToList();
        Assert.Contains("0 dB", ticks);
        Assert.Contains("\u2212180°", ticks);
        Assert.Matches(@"^crossover \d+(\.\d+)? kHz, PM \d+°$", WithClass(doc, "vertical-marker").Single().Value);
        Assert.Matches(@"^PM \d+°$", WithClass(doc, "point-marker").Single().Value);
        Assert.Equal(["0 dB", "\u2212180°"], WithClass(doc, "reference-label").Select(t => t.Value));
    }

    [Fact]
    public void Transimpedance_on_a_log_axis_labels_ohms_and_marks_the_minus_3_dB_point()
    {
        var doc = XDocument.Parse(SvgChartWriter.Write(SampleChannel.Transimpedance()));

        Assert.Contains("1 MΩ", WithClass(doc, "tick-label").Select(t => t.Value));
        Assert.Equal(["DC 1 MΩ", "\u22123 dB"], WithClass(doc, "reference-label").Select(t => t.Value));
        Assert.StartsWith("\u22123 dB at ", WithClass(doc, "vertical-marker").Single().Value, StringComparison.Ordinal);
    }

    [Fact]
    public void Transimpedance_in_dB_ohm_uses_a_linear_axis()
    {
        var chart = TransimpedanceChart.Build([1, 10, 100], [1e6, 1e6, 1e5], 50, 1e6, TransimpedanceScale.DecibelOhms);
        var doc = XDocument.Parse(SvgChartWriter.Write(chart));

        Assert.Contains("120 dBΩ", WithClass(doc, "tick-label").Select(t => t.Value));
    }

    [Fact]
    public void Noise_density_is_log_log_with_the_total_emphasised_and_the_band_shaded()
    {
        var chart = SampleChannel.NoiseDensity();
        var doc = XDocument.Parse(SvgChartWriter.Write(chart));

        Assert.Contains("10 nV/√Hz", WithClass(doc, "tick-label").Select(t => t.Value));
        var total = WithClass(doc, "series").Single(g => (string?)g.Attribute("data-series") == "total").Element(Svg + "path")!;
        Assert.Equal("2.4", (string?)total.Attribute("stroke-width"));
        Assert.Single(WithClass(doc, "band"));
        Assert.Equal("noise band 1 Hz – 100 kHz", WithClass(doc, "band-label").Single().Value);
    }

    [Fact]
    public void Series_differ_in_dash_pattern_or_weight_as_well_as_colour()
    {
        var doc = XDocument.Parse(SvgChartWriter.Write(SampleChannel.NoiseDensity()));

        var strokes = WithClass(doc, "series-line")
            .Select(p => ((string?)p.Attribute("stroke"), ((string?)p.Attribute("stroke-dasharray") ?? "solid") + "/" + (string?)p.Attribute("stroke-width")))
            .ToList();
        Assert.Equal(strokes.Count, strokes.Select(s => s.Item1).Distinct().Count());
        // What tells series apart in greyscale: the dash pattern, or the total's heavier stroke.
        Assert.Equal(strokes.Count, strokes.Select(s => s.Item2).Distinct().Count());
    }

    [Fact]
    public void The_same_chart_gives_byte_identical_svg()
    {
        Assert.Equal(SvgChartWriter.Write(SampleChannel.LoopGain()), SvgChartWriter.Write(SampleChannel.LoopGain()));
        Assert.DoesNotContain("\r", SvgChartWriter.Write(SampleChannel.NoiseDensity()), StringComparison.Ordinal);
    }

    [Fact]
    public void NaN_and_infinite_points_break_the_line_instead_of_ending_it()
    {
        var chart = Single([(1, 1), (10, 2), (100, double.NaN), (1e3, 3), (1e4, double.PositiveInfinity), (1e5, 4), (1e6, 5)]);
        var doc = XDocument.Parse(SvgChartWriter.Write(chart));

        var d = (string)WithClass(doc, "series-line").Single().Attribute("d")!;
        Assert.Equal(2, d.Count(c => c == 'M'));
        Assert.Single(WithClass(doc, "series").Single().Elements(Svg + "circle"));
        Assert.DoesNotContain("NaN", SvgChartWriter.Write(chart), StringComparison.Ordinal);
        Assert.DoesNotContain("Infinity", SvgChartWriter.Write(chart), StringComparison.Ordinal);
    }

    [Fact]
    public void Non_positive_values_on_a_log_axis_are_gaps()
    {
        var chart = Single([(1, 1), (10, 2), (0, 3), (-5, 4), (1e3, 5), (1e4, 6)]);
        var d = (string)WithClass(XDocument.Parse(SvgChartWriter.Write(chart)), "series-line").Single().Attribute("d")!;

        Assert.Equal(2, d.Count(c => c == 'M'));
    }

    [Fact]
    public void A_single_point_is_drawn_as_a_dot()
    {
        var doc = XDocument.Parse(SvgChartWriter.Write(Single([(1e3, 2)])));

        var series = WithClass(doc, "series").Single();
        Assert.Empty(series.Elements(Svg + "path"));
        Assert.Single(series.Elements(Svg + "circle"));
    }

    [Fact]
    public void An_empty_series_keeps_its_legend_entry_and_draws_nothing()
    {
        var doc = XDocument.Parse(SvgChartWriter.Write(Single([])));

        Assert.Empty(WithClass(doc, "series").Single().Elements());
        Assert.Equal("data (no data)", WithClass(doc, "legend-label").Single().Value);
        Assert.NotEmpty(WithClass(doc, "tick-label"));
    }

    [Fact]
    public void A_second_y_axis_gets_its_own_ticks_and_a_legend_hint()
    {
        var chart = new Chart(
            "two axes",
            new ChartAxis("frequency", AxisScale.Log, TickUnit.Of(Dimension.Frequency)),
            [new ChartPanel(new ChartAxis("gain", AxisScale.Linear, TickUnit.Decibel)) { SecondaryYAxis = new ChartAxis("phase", AxisScale.Linear, TickUnit.Degrees) { Step = 45 } }],
            [
                new ChartSeries("gain", [(1, 40), (1e6, -20)]),
                new ChartSeries("phase", [(1, 0), (1e6, -135)], Axis: YAxisSide.Right),
            ]);
        var doc = XDocument.Parse(SvgChartWriter.Write(chart));

        var secondary = WithClass(doc, "secondary").Single();
        Assert.Contains(secondary.Descendants(), e => e.Value == "\u2212135°");
        Assert.Equal("phase (right axis)", WithClass(doc, "legend-label").Last().Value);
    }

    [Fact]
    public void Loop_gain_without_a_crossover_says_the_margin_is_undefined()
    {
        var chart = LoopGainChart.Build([1, 10, 100], [-3, -6, -20], [-10, -45, -90], null, null);
        var doc = XDocument.Parse(SvgChartWriter.Write(chart));

        Assert.Empty(WithClass(doc, "vertical-marker"));
        Assert.Contains("undefined", WithClass(doc, "chart-subtitle").Single().Value, StringComparison.Ordinal);
    }

    [Fact]
    public void Builders_reject_arrays_of_different_lengths()
    {
        Assert.Throws<ArgumentException>(() => LoopGainChart.Build([1, 10], [0], [0, 0], null, null));
        Assert.Throws<ArgumentException>(() => NoiseDensityChart.Build([1, 10], [new("x", [1e-9])], [1e-9, 1e-9]));
    }

    [Theory]
    [InlineData(1e4, "10 kHz")]
    [InlineData(1.2e6, "1.2 MHz")]
    [InlineData(1, "1 Hz")]
    public void Frequency_ticks_use_engineering_notation(double hz, string expected) =>
        Assert.Equal(expected, TickUnit.Of(Dimension.Frequency).Format(hz));

    [Fact]
    public void Suffix_ticks_write_a_true_minus_sign_and_no_float_noise()
    {
        Assert.Equal("\u22123 dB", TickUnit.Decibel.Format(-3));
        Assert.Equal("0.3 dB", TickUnit.Decibel.Format(0.1 + 0.2));
        Assert.Equal("\u2212180°", TickUnit.Degrees.Format(-180));
        Assert.Equal("10 nV/√Hz", TickUnit.Of(Dimension.VoltageNoiseDensity).Format(1e-8));
        Assert.Equal("\u22122 V", TickUnit.Of(Dimension.Voltage).Format(-2));
    }

    [Fact]
    public void Two_charts_with_different_titles_use_different_clip_ids()
    {
        static string ClipId(Chart c) => (string)XDocument.Parse(SvgChartWriter.Write(c)).Descendants(Svg + "clipPath").First().Attribute("id")!;

        Assert.NotEqual(ClipId(SampleChannel.LoopGain()), ClipId(SampleChannel.NoiseDensity()));
        Assert.Equal("mine-clip0", ClipId(SampleChannel.NoiseDensity() with { Id = "mine" }));
    }

    private static Chart Single(IReadOnlyList<(double X, double Y)> points) => new(
        "one series",
        new ChartAxis("frequency", AxisScale.Log, TickUnit.Of(Dimension.Frequency)),
        [new ChartPanel(new ChartAxis("value", AxisScale.Log, TickUnit.Of(Dimension.Voltage)))],
        [new ChartSeries("data", points)]);
}
