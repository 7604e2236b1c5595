using System.Globalization;
using SpecLint.Core.Units;
using SpecLint.Reporting.Markdown;
using SpecLint.Rules.Changes;

namespace SpecLint.Reporting.Changes;

/// <summary>One figure of a changed spec, before and after, as display text.</summary>
/// <param name="Metric">What it is.</param>
/// <param name="Before">The base value ("—" when there is none).</param>
/// <param name="After">The head value ("—" when there is none).</param>
/// <param name="Change">The difference, or "" when it cannot be computed.</param>
internal sealed record DeltaRow(string Metric, string Before, string After, string Change)
{
    /// <summary>The gain setting the row belongs to, or null for a spec with one gain.</summary>
    public string? Setting { get; init; }

    /// <summary>"added" or "removed" when the setting is on one side only, else null.</summary>
    public string? SettingStatus { get; init; }

    /// <summary>" [setting night]" (with ", added" or ", removed"), or "" for one gain: the suffix findings also carry.</summary>
    public string SettingSuffix => Setting is null ? "" : $" [setting {Setting}{(SettingStatus is null ? "" : ", " + SettingStatus)}]";
}

/// <summary>
/// The metric deltas of a changed spec, in the order a reviewer reads them; rows whose value did not change are
/// left out. A channel with more than one gain gets its rows setting by setting, each naming its setting.
/// </summary>
internal static class DeltaRows
{
    private const string None = "—";

    public static IEnumerable<DeltaRow> For(SpecChange change)
    {
        ArgumentNullException.ThrowIfNull(change);
        var settings = change.Settings;
        if (settings.IsEmpty)
        {
            return For(change.MetricsBefore, change.MetricsAfter);
        }

        // A setting whose figures are all the same on both sides shows nothing.
        return settings.Where(s => !Equals(s.MetricsBefore, s.MetricsAfter)).SelectMany(s => For(s.MetricsBefore, s.MetricsAfter).Select(r => r with { Setting = s.Name, SettingStatus = s.Status }));
    }

    /// <summary>The rows of one pair of snapshots (a spec with one gain, or one setting).</summary>
    internal static IEnumerable<DeltaRow> For(MetricSnapshot? b, MetricSnapshot? a)
    {
        var rows = new[]
        {
            Row("Phase margin", b?.PhaseMarginDeg, a?.PhaseMarginDeg, MetricRows.Deg, Difference("°", "0.0")),
            Row(WorstCorner, b?.PhaseMarginDegMin, a?.PhaseMarginDegMin, MetricRows.Deg, Difference("°", "0.0")),
            Row("Bandwidth", b?.BandwidthHz, a?.BandwidthHz, v => MetricRows.Q(v, Dimension.Frequency), Relative),
            Row("Peaking", b?.PeakingDb, a?.PeakingDb, v => Text($"{v:0.00} dB"), Difference(" dB", "0.00")),
            Row("Input noise, rms", b?.InputNoiseRmsA, a?.InputNoiseRmsA, v => MetricRows.Q(v, Dimension.Current), Relative),
            Row("Output low", b?.OutputMinV, a?.OutputMinV, v => MetricRows.Q(v, Dimension.Voltage), (x, y) => Signed(MetricRows.Q(y - x, Dimension.Voltage), y - x)),
            Row("Output high", b?.OutputMaxV, a?.OutputMaxV, v => MetricRows.Q(v, Dimension.Voltage), (x, y) => Signed(MetricRows.Q(y - x, Dimension.Voltage), y - x)),
            Row("Yield", b?.Yield, a?.Yield, v => Text($"{100 * v:0.0} %"), (x, y) => Signed(Text($"{Math.Abs(100 * (y - x)):0.0} points"), y - x)),
        };
        // Rows whose value did not move are left out; the head's worst corner is named only after that comparison,
        // so an unchanged margin does not show as a change because one side names its corner.
        return rows.Where(r => r.Before != r.After).Select(r => r.Metric == WorstCorner && a?.PhaseMarginDegMin is { } w
            ? r with { After = MetricRows.Deg(w) + (a.PhaseMarginMinCorner is { Length: > 0 } c ? $" ({c})" : "") }
            : r);
    }

    private const string WorstCorner = "Phase margin, worst corner";

    private static DeltaRow Row(string metric, double? before, double? after, Func<double, string> format, Func<double, double, string> change) =>
        new(metric, before is { } x ? format(x) : None, after is { } y ? format(y) : None, before is { } p && after is { } q ? change(p, q) : "");

    private static Func<double, double, string> Difference(string unit, string pattern) =>
        (x, y) => (y - x >= 0 ? "+" : "−") + Math.Abs(y - x).ToString(pattern, CultureInfo.InvariantCulture) + unit;

    private static string Relative(double x, double y) =>
        x == 0 ? "" : (y >= x ? "+" : "−") + Text($"{Math.Abs(100 * (y - x) / x):0.#} %");

    private static string Signed(string magnitude, double difference) =>
        (difference >= 0 ? "+" : "−") + magnitude.TrimStart('-', '−');

    private static string Text(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
