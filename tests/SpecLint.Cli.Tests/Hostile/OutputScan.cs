using System.Text.RegularExpressions;

namespace SpecLint.Cli.Tests.Hostile;

/// <summary>What no output of SpecLint may ever contain, whatever the input.</summary>
internal static partial class OutputScan
{
    [GeneratedRegex(@"\bNaN\b|Infinity|∞|\d{40,}", RegexOptions.CultureInvariant)]
    private static partial Regex NonFiniteRegex();

    [GeneratedRegex("\"(?:[^\"\\\\\n]|\\\\.)*\"", RegexOptions.CultureInvariant)]
    private static partial Regex QuotedRegex();

    /// <summary>Fails when <paramref name="text"/> holds NaN, an infinity or an unbounded digit string.</summary>
    /// <remarks>Quoted spans are the user's own text echoed back (escaped), not figures SpecLint computed, so they are skipped.</remarks>
    public static void AssertFinite(string text, string what)
    {
        text = QuotedRegex().Replace(text, "\"…\"");
        var m = NonFiniteRegex().Match(text);
        Assert.False(m.Success, $"{what} contains \"{m.Value}\" near: {(m.Success ? text.Substring(Math.Max(0, m.Index - 80), Math.Min(160, text.Length - Math.Max(0, m.Index - 80))) : "")}");
    }

    /// <summary>Fails when <paramref name="text"/> holds a raw control character other than a line break (ESC would drive the terminal).</summary>
    public static void AssertNoControlCharacters(string text, string what)
    {
        var bad = text.FirstOrDefault(c => c < 0x20 && c is not '\n' and not '\r' || c is >= '\u007F' and <= '\u009F' || c is '\u2028' or '\u2029');
        Assert.True(bad == default, $"{what} contains the raw character U+{(int)bad:X4}");
    }
}
