using System.Globalization;

namespace SpecLint.Core.Config;

/// <summary>Reads a short duration written with its unit, such as <c>2 s</c> or <c>500 ms</c> (the house-rule budget).</summary>
internal static class DurationText
{
    /// <summary>The longest budget accepted: beyond this a rule is not being budgeted at all.</summary>
    public static readonly TimeSpan Max = TimeSpan.FromMinutes(10);

    /// <summary>The shortest budget accepted: below this the clock's resolution decides.</summary>
    public static readonly TimeSpan Min = TimeSpan.FromMilliseconds(10);

    /// <summary>Parses <paramref name="text"/>; on failure <paramref name="error"/> says what to write instead.</summary>
    public static bool TryParse(string text, out TimeSpan value, out string error)
    {
        ArgumentNullException.ThrowIfNull(text);
        value = default;
        var t = text.Trim();
        var (number, scale) = t.EndsWith("ms", StringComparison.Ordinal) ? (t[..^2], 1e-3)
            : t.EndsWith("min", StringComparison.Ordinal) ? (t[..^3], 60.0)
            : t.EndsWith('s') ? (t[..^1], 1.0)
            : (t, double.NaN);
        if (double.IsNaN(scale))
        {
            error = $"'{text}' needs a unit; write e.g. \"2 s\" or \"500 ms\"";
            return false;
        }

        if (!double.TryParse(number.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out var n) || !double.IsFinite(n))
        {
            error = $"'{text}' is not a duration; write e.g. \"2 s\" or \"500 ms\"";
            return false;
        }

        var seconds = n * scale;
        if (seconds < Min.TotalSeconds || seconds > Max.TotalSeconds)
        {
            error = $"'{text}' is outside {Min.TotalMilliseconds:0} ms .. {Max.TotalMinutes:0} min";
            return false;
        }

        value = TimeSpan.FromSeconds(seconds);
        error = "";
        return true;
    }
}
