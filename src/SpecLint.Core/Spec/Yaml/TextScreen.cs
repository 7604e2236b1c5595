using System.Globalization;

namespace SpecLint.Core.Spec.Yaml;

/// <summary>
/// Screens YAML text before parsing for characters a spec file may not hold: controls other than tab, LF
/// and CR (NUL, ESC, DEL, C1), unpaired surrogates, U+FFFE/U+FFFF, and the three characters that older YAML
/// treated as line breaks (U+0085, U+2028, U+2029). The parser counts those as new lines while editors do
/// not, so every later line number would be off by one; refusing them keeps line and column true to what
/// the editor shows. Positions count lines by CR, LF and CRLF only.
/// </summary>
internal static class TextScreen
{
    /// <summary>The first disallowed character, with its position and a message; null when the text is clean.</summary>
    public static (int Line, int Column, string Message)? FindDisallowed(string text)
    {
        var line = 1;
        var column = 1;
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            if (c == '\n' || (c == '\r' && (i + 1 == text.Length || text[i + 1] != '\n')))
            {
                line++;
                column = 1;
                continue;
            }

            if (c == '\r')
            {
                continue;
            }

            if (char.IsHighSurrogate(c) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1]))
            {
                i++;
                column++;
                continue;
            }

            if (!Allowed(c))
            {
                return (line, column, Describe(c));
            }

            column++;
        }

        return null;
    }

    private static bool Allowed(char c) =>
        c == '\t' || (c >= 0x20 && c < 0x7F) || (c >= 0xA0 && c <= 0xD7FF && c is not '\u2028' and not '\u2029')
        || (c >= 0xE000 && c <= 0xFFFD);

    private static string Describe(char c)
    {
        var code = "U+" + ((int)c).ToString("X4", CultureInfo.InvariantCulture);
        var name = c switch
        {
            '\0' => " (NUL)",
            '\u001B' => " (ESC)",
            '\u007F' => " (DEL)",
            '\u0085' => " (next line)",
            '\u2028' => " (line separator)",
            '\u2029' => " (paragraph separator)",
            _ when char.IsSurrogate(c) => " (half of a surrogate pair)",
            _ => "",
        };
        var why = c is '\u0085' or '\u2028' or '\u2029'
            ? "YAML readers disagree on whether it ends a line; use an ordinary line break"
            : "spec files hold printable text only; write it as an escape in a double-quoted string if it is meant";
        return $"the character {code}{name} is not allowed here: {why}";
    }
}
