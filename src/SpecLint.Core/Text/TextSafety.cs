using System.Globalization;
using System.Text;

namespace SpecLint.Core.Text;

/// <summary>
/// Makes user text safe to echo. A quoted YAML value can hold a line break, ESC or a bidirectional override;
/// echoed raw, it would forge a separate finding line, send terminal escape codes or reorder what a
/// reviewer reads. Every such character is shown as a visible escape instead (<c>\n</c>, <c>\x1B</c>,
/// <c>\u202E</c>), so the text stays on one line and means what it shows.
/// </summary>
internal static class TextSafety
{
    /// <summary>The text with every control, line-separator and direction-formatting character written as an escape.</summary>
    public static string ForTerminal(string? text)
    {
        if (string.IsNullOrEmpty(text))
        {
            return text ?? "";
        }

        var i = 0;
        while (i < text.Length && !NeedsEscape(text[i]))
        {
            i++;
        }

        if (i == text.Length)
        {
            return text;
        }

        var sb = new StringBuilder(text.Length + 16).Append(text, 0, i);
        for (; i < text.Length; i++)
        {
            var c = text[i];
            if (!NeedsEscape(c))
            {
                sb.Append(c);
                continue;
            }

            sb.Append(c switch
            {
                '\n' => "\\n",
                '\r' => "\\r",
                '\t' => "\\t",
                _ when c <= 0xFF => "\\x" + ((int)c).ToString("X2", CultureInfo.InvariantCulture),
                _ => "\\u" + ((int)c).ToString("X4", CultureInfo.InvariantCulture),
            });
        }

        return sb.ToString();
    }

    /// <summary>Whether a character is shown as an escape: C0 and C1 controls, DEL, line and paragraph separators, bidi controls, lone surrogates, BOM.</summary>
    public static bool NeedsEscape(char c) =>
        c < 0x20 || (c >= 0x7F && c <= 0x9F) || c is '\u2028' or '\u2029' or '\uFEFF'
        || (c >= '\u202A' && c <= '\u202E') || (c >= '\u2066' && c <= '\u2069') || c is '\u200E' or '\u200F' or '\u061C'
        || char.IsSurrogate(c);
}
