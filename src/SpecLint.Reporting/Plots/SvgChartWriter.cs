using System.Globalization;
using System.Text;
using System.Xml;
using System.Xml.Linq;

namespace SpecLint.Reporting.Plots;

/// <summary>
/// Writes a <see cref="Chart"/> as a standalone SVG document without dependencies: stacked panels on a shared
/// x-axis, decade grids for log axes, engineering tick labels, series with colour and dash, reference lines,
/// markers and a legend under the plot. Output is deterministic: invariant culture, one decimal for every
/// coordinate, elements in input order.
/// </summary>
internal static class SvgChartWriter
{
    /// <summary>The font stack; generic sans-serif last so any system renders something readable.</summary>
    public const string FontFamily = "'DejaVu Sans', 'Liberation Sans', 'Helvetica Neue', Arial, sans-serif";

    private const double TickFont = 12;
    private const double AxisTitleFont = 12.5;
    private const double TitleFont = 15;
    private const double PanelGap = 18;
    private const double LegendRow = 20;
    private const double LegendSwatch = 28;

    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    /// <summary>Returns the SVG text (UTF-8 without BOM when saved as is; LF line ends).</summary>
    public static string Write(Chart chart)
    {
        ArgumentNullException.ThrowIfNull(chart);
        var document = Build(chart);
        var settings = new XmlWriterSettings
        {
            OmitXmlDeclaration = true,
            Indent = true,
            IndentChars = " ",
            NewLineChars = "\n",
            NewLineHandling = NewLineHandling.Replace,
        };
        var builder = new StringBuilder();
        using (var writer = XmlWriter.Create(builder, settings))
        {
            document.WriteTo(writer);
        }

        return builder.Append('\n').ToString();
    }

    /// <summary>Writes the SVG to a file as UTF-8 without BOM.</summary>
    public static void WriteFile(Chart chart, string path) => SpecLint.Core.Files.AtomicFile.WriteAllText(path, Write(chart));

    private static XElement Build(Chart chart)
    {
        if (chart.Panels.Count == 0)
        {
            throw new ArgumentException("a chart needs at least one panel", nameof(chart));
        }

        var id = chart.Id ?? "sl" + StableHash(chart.Title);
        var width = Math.Max(240, chart.Width);
        var height = Math.Max(160, chart.Height);
        var styles = chart.Series.Select((s, i) => s.Style ?? ChartPalette.Series(i)).ToList();

        // Ranges first, so that label widths can size the margins; pixels are assigned afterwards.
        var xValues = chart.Series.SelectMany(s => s.Points.Select(p => p.X))
            .Concat(chart.VerticalMarkers.Select(m => m.X))
            .Concat(chart.PointMarkers.Select(m => m.X));
        var xProbe = AxisMap.Fit(chart.XAxis, xValues, 0, 1);
        var leftProbe = chart.Panels.Select((p, i) => AxisMap.Fit(p.YAxis, YValues(chart, i, YAxisSide.Left), 0, 1, headroom: true)).ToList();
        var rightProbe = chart.Panels.Select((p, i) => p.SecondaryYAxis is { } a ? AxisMap.Fit(a, YValues(chart, i, YAxisSide.Right), 0, 1, headroom: true) : null).ToList();

        var leftLabelWidth = leftProbe.SelectMany(m => m.Ticks()).Select(t => TextWidth(t.Label, TickFont)).DefaultIfEmpty(0).Max();
        var rightLabelWidth = rightProbe.Where(m => m is not null).SelectMany(m => m!.Ticks()).Select(t => TextWidth(t.Label, TickFont)).DefaultIfEmpty(0).Max();
        var xTicks = xProbe.Ticks();
        var lastXLabel = xTicks.LastOrDefault(t => t.Label.Length > 0).Label ?? "";

        var left = Math.Ceiling(Math.Max(56, leftLabelWidth + 34));
        var right = width - Math.Ceiling(rightProbe.Any(m => m is not null)
            ? Math.Max(56, rightLabelWidth + 34)
            : Math.Max(22, (TextWidth(lastXLabel, TickFont) / 2) + 6));
        var top = chart.Subtitle is null ? 42.0 : 58.0;

        var legend = LayoutLegend(chart, styles, left, right);
        var legendHeight = legend.Count == 0 ? 0 : (legend.Max(e => e.Row) + 1) * LegendRow;
        var bottomOfPlots = height - (48 + legendHeight + (legend.Count == 0 ? 0 : 8));
        var available = Math.Max(40, bottomOfPlots - top - (PanelGap * (chart.Panels.Count - 1)));
        var totalWeight = chart.Panels.Sum(p => Math.Max(0.05, p.Weight));

        var panelTops = new double[chart.Panels.Count];
        var panelBottoms = new double[chart.Panels.Count];
        var y = top;
        for (var i = 0; i < chart.Panels.Count; i++)
        {
            panelTops[i] = y;
            panelBottoms[i] = y + (available * Math.Max(0.05, chart.Panels[i].Weight) / totalWeight);
            y = panelBottoms[i] + PanelGap;
        }

        var xMap = AxisMap.Fit(chart.XAxis, xValues, left, right);
        var leftMaps = chart.Panels.Select((p, i) => AxisMap.Fit(p.YAxis, YValues(chart, i, YAxisSide.Left), panelBottoms[i], panelTops[i], headroom: true)).ToList();
        var rightMaps = chart.Panels.Select((p, i) => p.SecondaryYAxis is { } a ? AxisMap.Fit(a, YValues(chart, i, YAxisSide.Right), panelBottoms[i], panelTops[i], headroom: true) : null).ToList();

        var svg = new XElement(
            Svg + "svg",
            new XAttribute("width", width.ToString(CultureInfo.InvariantCulture)),
            new XAttribute("height", height.ToString(CultureInfo.InvariantCulture)),
            new XAttribute("viewBox", $"0 0 {width.ToString(CultureInfo.InvariantCulture)} {height.ToString(CultureInfo.InvariantCulture)}"),
            new XAttribute("font-family", FontFamily),
            new XAttribute("role", "img"),
            new XAttribute("aria-labelledby", id + "-title"),
            new XElement(Svg + "title", new XAttribute("id", id + "-title"), chart.Title + (chart.Subtitle is null ? "" : " — " + chart.Subtitle)));

        // An opaque background keeps the chart readable on dark pages and in screenshots.
        svg.Add(Rect(0, 0, width, height, "#FFFFFF", null));
        var defs = new XElement(Svg + "defs");
        for (var i = 0; i < chart.Panels.Count; i++)
        {
            defs.Add(new XElement(
                Svg + "clipPath",
                new XAttribute("id", $"{id}-clip{i.ToString(CultureInfo.InvariantCulture)}"),
                Rect(left, panelTops[i], right - left, panelBottoms[i] - panelTops[i], null, null)));
        }

        svg.Add(defs);
        svg.Add(Text(left, 26, chart.Title, TitleFont, ChartPalette.Ink, "start", "chart-title", weight: "600"));
        if (chart.Subtitle is not null)
        {
            svg.Add(Text(left, 44, chart.Subtitle, TickFont, ChartPalette.MutedInk, "start", "chart-subtitle"));
        }

        for (var i = 0; i < chart.Panels.Count; i++)
        {
            svg.Add(Panel(chart, i, id, styles, xMap, leftMaps[i], rightMaps[i], left, right, panelTops[i], panelBottoms[i], i == chart.Panels.Count - 1));
        }

        svg.Add(VerticalMarkers(chart, xMap, panelTops[0], panelBottoms[^1], left, right));
        svg.Add(Legend(legend, bottomOfPlots + 48));
        return svg;
    }

    private static IEnumerable<double> YValues(Chart chart, int panel, YAxisSide side) =>
        chart.Series.Where(s => s.Panel == panel && s.Axis == side).SelectMany(s => s.Points.Select(p => p.Y))
            .Concat(chart.HorizontalMarkers.Where(m => m.Panel == panel && m.Axis == side).Select(m => m.Y))
            .Concat(side == YAxisSide.Left
                ? chart.PointMarkers.Where(m => m.Panel == panel).SelectMany(m => m.FromY is { } f ? new[] { m.Y, f } : [m.Y])
                : []);

    private static XElement Panel(
        Chart chart, int index, string id, List<SeriesStyle> styles, AxisMap x, AxisMap yLeft, AxisMap? yRight,
        double left, double right, double top, double bottom, bool isBottom)
    {
        var clip = $"url(#{id}-clip{index.ToString(CultureInfo.InvariantCulture)})";
        var g = new XElement(Svg + "g", new XAttribute("class", "panel"), new XAttribute("data-panel", index.ToString(CultureInfo.InvariantCulture)));
        g.Add(Rect(left, top, right - left, bottom - top, ChartPalette.PlotBackground, null, "plot-area"));

        var clipped = new XElement(Svg + "g", new XAttribute("clip-path", clip));
        foreach (var band in chart.Bands.Where(b => x.IsUsable(b.FromX) && x.IsUsable(b.ToX)))
        {
            var x0 = x.Map(Math.Min(band.FromX, band.ToX));
            var x1 = x.Map(Math.Max(band.FromX, band.ToX));
            clipped.Add(Rect(x0, top, x1 - x0, bottom - top, ChartPalette.Band, null, "band"));
        }

        // Grid: minor lines first so major lines sit on top of them.
        var xTicks = x.Ticks();
        var yTicks = yLeft.Ticks();
        var grid = new XElement(Svg + "g", new XAttribute("class", "grid"), new XAttribute("fill", "none"));
        foreach (var major in new[] { false, true })
        {
            var colour = major ? ChartPalette.MajorGrid : ChartPalette.MinorGrid;
            foreach (var t in xTicks.Where(t => t.Major == major))
            {
                grid.Add(Line(x.Map(t.Value), top, x.Map(t.Value), bottom, colour, major ? 1 : 0.8, null));
            }

            foreach (var t in yTicks.Where(t => t.Major == major))
            {
                grid.Add(Line(left, yLeft.Map(t.Value), right, yLeft.Map(t.Value), colour, major ? 1 : 0.8, null));
            }
        }

        clipped.Add(grid);

        foreach (var reference in chart.HorizontalMarkers.Where(m => m.Panel == index))
        {
            var map = reference.Axis == YAxisSide.Right && yRight is not null ? yRight : yLeft;
            if (!map.IsUsable(reference.Y))
            {
                continue;
            }

            var ry = map.Map(reference.Y);
            var rg = new XElement(Svg + "g", new XAttribute("class", "reference"));
            rg.Add(Line(left, ry, right, ry, ChartPalette.Reference, 1.1, "6 4"));
            var lx = reference.LabelAtStart ? left + 6 : right - 6;
            var ly = reference.LabelBelow ? ry + 14 : ry - 5;
            rg.Add(Text(lx, ly, reference.Label, TickFont, ChartPalette.MutedInk, reference.LabelAtStart ? "start" : "end", "reference-label", halo: true));
            clipped.Add(rg);
        }

        for (var s = 0; s < chart.Series.Count; s++)
        {
            var series = chart.Series[s];
            if (series.Panel != index)
            {
                continue;
            }

            var map = series.Axis == YAxisSide.Right && yRight is not null ? yRight : yLeft;
            clipped.Add(SeriesElement(series, styles[s], x, map));
        }

        g.Add(clipped);

        foreach (var point in chart.PointMarkers.Where(m => m.Panel == index && x.IsUsable(m.X) && yLeft.IsUsable(m.Y)))
        {
            var px = x.Map(point.X);
            var py = yLeft.Map(point.Y);
            var pg = new XElement(Svg + "g", new XAttribute("class", "marker point-marker"));
            if (point.FromY is { } from && yLeft.IsUsable(from))
            {
                pg.Add(Line(px, yLeft.Map(from), px, py, ChartPalette.Marker, 2.2, null));
            }

            pg.Add(new XElement(
                Svg + "circle",
                new XAttribute("cx", SvgNumber.Px(px)),
                new XAttribute("cy", SvgNumber.Px(py)),
                new XAttribute("r", "3.5"),
                new XAttribute("fill", "#FFFFFF"),
                new XAttribute("stroke", ChartPalette.Marker),
                new XAttribute("stroke-width", "1.8")));
            var nearRight = px > left + ((right - left) * 0.72);
            var labelY = point.FromY is { } f2 && yLeft.IsUsable(f2) ? (py + yLeft.Map(f2)) / 2 + 4 : py - 7;
            if (point.Label.Length > 0)
            {
                pg.Add(Text(nearRight ? px - 8 : px + 8, labelY, point.Label, TickFont, ChartPalette.Marker, nearRight ? "end" : "start", "marker-label", halo: true, weight: "600"));
            }

            g.Add(pg);
        }

        g.Add(Rect(left, top, right - left, bottom - top, null, ChartPalette.Frame, "frame"));

        g.Add(YAxis(yLeft, left, top, bottom, leftSide: true));
        if (yRight is not null)
        {
            g.Add(YAxis(yRight, right, top, bottom, leftSide: false));
        }

        var xAxis = new XElement(Svg + "g", new XAttribute("class", "axis x-axis"));
        xAxis.Add(Line(left, bottom, right, bottom, ChartPalette.Ink, 1, null));
        foreach (var t in xTicks)
        {
            var tx = x.Map(t.Value);
            xAxis.Add(Line(tx, bottom, tx, bottom + (t.Major ? 5 : 3), ChartPalette.Ink, 1, null));
            if (isBottom && t.Label.Length > 0)
            {
                xAxis.Add(Text(tx, bottom + 19, t.Label, TickFont, ChartPalette.Ink, "middle", "tick-label"));
            }
        }

        if (isBottom)
        {
            xAxis.Add(Text((left + right) / 2, bottom + 38, x.Axis.Title, AxisTitleFont, ChartPalette.MutedInk, "middle", "axis-title"));
        }

        g.Add(xAxis);
        return g;
    }

    private static XElement YAxis(AxisMap map, double at, double top, double bottom, bool leftSide)
    {
        var sign = leftSide ? -1 : 1;
        var axis = new XElement(Svg + "g", new XAttribute("class", leftSide ? "axis y-axis" : "axis y-axis secondary"));
        axis.Add(Line(at, top, at, bottom, ChartPalette.Ink, 1, null));
        var widest = 0.0;
        foreach (var t in map.Ticks())
        {
            var ty = map.Map(t.Value);
            axis.Add(Line(at, ty, at + (sign * (t.Major ? 5 : 3)), ty, ChartPalette.Ink, 1, null));
            if (t.Label.Length > 0)
            {
                axis.Add(Text(at + (sign * 8), ty + 4, t.Label, TickFont, ChartPalette.Ink, leftSide ? "end" : "start", "tick-label"));
                widest = Math.Max(widest, TextWidth(t.Label, TickFont));
            }
        }

        var titleX = at + (sign * (widest + 18));
        var titleY = (top + bottom) / 2;
        var title = Text(titleX, titleY, map.Axis.Title, AxisTitleFont, ChartPalette.MutedInk, "middle", "axis-title");
        title.Add(new XAttribute("transform", $"rotate({(leftSide ? "-90" : "90")} {SvgNumber.Px(titleX)} {SvgNumber.Px(titleY)})"));
        axis.Add(title);
        return axis;
    }

    private static XElement SeriesElement(ChartSeries series, SeriesStyle style, AxisMap x, AxisMap y)
    {
        var g = new XElement(Svg + "g", new XAttribute("class", "series"), new XAttribute("data-series", series.Name));
        var path = new StringBuilder();
        var run = new List<(double X, double Y)>();

        void Flush()
        {
            if (run.Count == 1)
            {
                // A lone point has no segment to stroke; show it as a dot.
                g.Add(new XElement(
                    Svg + "circle",
                    new XAttribute("cx", SvgNumber.Px(run[0].X)),
                    new XAttribute("cy", SvgNumber.Px(run[0].Y)),
                    new XAttribute("r", SvgNumber.Px(Math.Max(2.5, style.Width * 1.4))),
                    new XAttribute("fill", style.Color)));
            }
            else if (run.Count > 1)
            {
                for (var i = 0; i < run.Count; i++)
                {
                    path.Append(path.Length == 0 ? "" : " ").Append(i == 0 ? 'M' : 'L')
                        .Append(SvgNumber.Px(run[i].X)).Append(' ').Append(SvgNumber.Px(run[i].Y));
                }
            }

            run.Clear();
        }

        foreach (var (px, py) in series.Points)
        {
            if (x.IsUsable(px) && y.IsUsable(py))
            {
                run.Add((x.Map(px), y.Map(py)));
            }
            else
            {
                Flush();
            }
        }

        Flush();
        if (path.Length > 0)
        {
            var element = new XElement(
                Svg + "path",
                new XAttribute("class", "series-line"),
                new XAttribute("d", path.ToString()),
                new XAttribute("fill", "none"),
                new XAttribute("stroke", style.Color),
                new XAttribute("stroke-width", SvgNumber.Px(style.Width)),
                new XAttribute("stroke-linejoin", "round"));
            if (style.Dash is not null)
            {
                element.Add(new XAttribute("stroke-dasharray", style.Dash));
            }

            g.AddFirst(element);
        }

        return g;
    }

    private static XElement VerticalMarkers(Chart chart, AxisMap x, double top, double bottom, double left, double right)
    {
        var g = new XElement(Svg + "g", new XAttribute("class", "markers"));
        var row = 0;
        foreach (var band in chart.Bands.Where(b => x.IsUsable(b.FromX) && x.IsUsable(b.ToX)))
        {
            var x0 = Math.Clamp(x.Map(Math.Min(band.FromX, band.ToX)), left, right);
            var x1 = Math.Clamp(x.Map(Math.Max(band.FromX, band.ToX)), left, right);
            g.Add(Text((x0 + x1) / 2, bottom - 8, band.Label, TickFont, ChartPalette.MutedInk, "middle", "band-label", halo: true));
        }

        foreach (var marker in chart.VerticalMarkers.Where(m => x.Contains(m.X)))
        {
            var mx = x.Map(marker.X);
            var mg = new XElement(Svg + "g", new XAttribute("class", "marker vertical-marker"));
            mg.Add(Line(mx, top, mx, bottom, ChartPalette.Marker, 1.3, "3 3"));
            // Labels go left of the line near the right edge, and stagger when there are several.
            var nearRight = mx > left + ((right - left) * 0.62);
            mg.Add(Text(nearRight ? mx - 6 : mx + 6, top + 16 + (row * 16), marker.Label, TickFont, ChartPalette.Marker, nearRight ? "end" : "start", "marker-label", halo: true, weight: "600"));
            g.Add(mg);
            row++;
        }

        return g;
    }

    private static List<LegendEntry> LayoutLegend(Chart chart, List<SeriesStyle> styles, double left, double right)
    {
        var entries = new List<LegendEntry>();
        double x = left;
        var row = 0;
        for (var i = 0; i < chart.Series.Count; i++)
        {
            var s = chart.Series[i];
            var hasData = s.Points.Any(p => double.IsFinite(p.X) && double.IsFinite(p.Y));
            var text = s.Name + (s.Axis == YAxisSide.Right && chart.Panels[Math.Clamp(s.Panel, 0, chart.Panels.Count - 1)].SecondaryYAxis is not null ? " (right axis)" : "") + (hasData ? "" : " (no data)");
            var w = LegendSwatch + 6 + TextWidth(text, TickFont);
            if (x > left && x + w > right)
            {
                row++;
                x = left;
            }

            entries.Add(new LegendEntry(text, s.Name, styles[i], x, row));
            x += w + 22;
        }

        return entries;
    }

    private static XElement Legend(List<LegendEntry> entries, double top)
    {
        var g = new XElement(Svg + "g", new XAttribute("class", "legend"));
        foreach (var e in entries)
        {
            var y = top + (e.Row * LegendRow) + 10;
            var entry = new XElement(Svg + "g", new XAttribute("class", "legend-entry"), new XAttribute("data-series", e.SeriesName));
            var line = Line(e.X, y - 4, e.X + LegendSwatch, y - 4, e.Style.Color, e.Style.Width, e.Style.Dash);
            entry.Add(line);
            entry.Add(Text(e.X + LegendSwatch + 6, y, e.Text, TickFont, ChartPalette.Ink, "start", "legend-label"));
            g.Add(entry);
        }

        return g;
    }

    private static XElement Rect(double x, double y, double w, double h, string? fill, string? stroke, string? cssClass = null)
    {
        var r = new XElement(Svg + "rect");
        if (cssClass is not null)
        {
            r.Add(new XAttribute("class", cssClass));
        }

        r.Add(
            new XAttribute("x", SvgNumber.Px(x)),
            new XAttribute("y", SvgNumber.Px(y)),
            new XAttribute("width", SvgNumber.Px(Math.Max(0, w))),
            new XAttribute("height", SvgNumber.Px(Math.Max(0, h))),
            new XAttribute("fill", fill ?? "none"));
        if (stroke is not null)
        {
            r.Add(new XAttribute("stroke", stroke), new XAttribute("stroke-width", "1"));
        }

        return r;
    }

    private static XElement Line(double x1, double y1, double x2, double y2, string stroke, double width, string? dash)
    {
        var line = new XElement(
            Svg + "line",
            new XAttribute("x1", SvgNumber.Px(x1)),
            new XAttribute("y1", SvgNumber.Px(y1)),
            new XAttribute("x2", SvgNumber.Px(x2)),
            new XAttribute("y2", SvgNumber.Px(y2)),
            new XAttribute("stroke", stroke),
            new XAttribute("stroke-width", SvgNumber.Px(width)));
        if (dash is not null)
        {
            line.Add(new XAttribute("stroke-dasharray", dash));
        }

        return line;
    }

    private static XElement Text(double x, double y, string text, double size, string fill, string anchor, string cssClass, bool halo = false, string? weight = null)
    {
        var t = new XElement(
            Svg + "text",
            new XAttribute("class", cssClass),
            new XAttribute("x", SvgNumber.Px(x)),
            new XAttribute("y", SvgNumber.Px(y)),
            new XAttribute("font-size", SvgNumber.Px(size)),
            new XAttribute("fill", fill),
            new XAttribute("text-anchor", anchor));
        if (weight is not null)
        {
            t.Add(new XAttribute("font-weight", weight));
        }

        if (halo)
        {
            // A white outline under the glyphs keeps labels legible where they cross grid lines and curves.
            t.Add(
                new XAttribute("stroke", "#FFFFFF"),
                new XAttribute("stroke-width", "3"),
                new XAttribute("stroke-linejoin", "round"),
                new XAttribute("paint-order", "stroke"));
        }

        t.Add(text);
        return t;
    }

    /// <summary>Approximate advance width: no font metrics without a renderer, so a conservative average.</summary>
    internal static double TextWidth(string text, double size) => text.Length * size * 0.62;

    private static string StableHash(string text)
    {
        // FNV-1a: string.GetHashCode is randomised per process, which would break byte-identical output.
        var hash = 2166136261u;
        foreach (var b in Encoding.UTF8.GetBytes(text))
        {
            hash = (hash ^ b) * 16777619u;
        }

        return hash.ToString("x8", CultureInfo.InvariantCulture);
    }
}
