using SpecLint.Core.Text;

namespace SpecLint.Reporting.Markdown;

/// <summary>Escaping for text placed in Markdown tables and paragraphs.</summary>
internal static class MarkdownText
{
    /// <summary>Escapes characters that would break a table cell or start markup.</summary>
    public static string Cell(string text) =>
        TextSafety.ForTerminal(text).Replace("\\", "\\\\", StringComparison.Ordinal)
            .Replace("|", "\\|", StringComparison.Ordinal)
            .Replace("\r", "", StringComparison.Ordinal)
            .Replace("\n", " ", StringComparison.Ordinal)
            .Replace("*", "\\*", StringComparison.Ordinal)
            .Replace("_", "\\_", StringComparison.Ordinal)
            .Replace("&", "&amp;", StringComparison.Ordinal)
            .Replace("<", "&lt;", StringComparison.Ordinal)
            .Replace("[", "\\[", StringComparison.Ordinal)
            .Replace("]", "\\]", StringComparison.Ordinal)
            .Replace("`", "\\`", StringComparison.Ordinal);

    /// <summary>A link target with spaces and parentheses encoded.</summary>
    public static string Target(string path) =>
        path.Replace('\\', '/').Replace(" ", "%20", StringComparison.Ordinal).Replace("(", "%28", StringComparison.Ordinal).Replace(")", "%29", StringComparison.Ordinal)
            .Replace("<", "%3C", StringComparison.Ordinal).Replace(">", "%3E", StringComparison.Ordinal);

    /// <summary>A GitHub-style heading anchor for a heading text.</summary>
    public static string Anchor(string heading)
    {
        var chars = heading.ToLowerInvariant().Where(c => char.IsLetterOrDigit(c) || c is '-' or ' ' or '_').ToArray();
        return new string(chars).Replace(' ', '-');
    }
}
