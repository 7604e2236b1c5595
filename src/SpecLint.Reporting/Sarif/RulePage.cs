using System.Text.RegularExpressions;
using Markdig;
using Markdig.Syntax;
using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Sarif;

/// <summary>Reads the parts SARIF needs out of a rule page (its shape is <see cref="RulePageSections"/>).</summary>
internal static partial class RulePage
{
    /// <summary>The first paragraph under the condition heading as plain text, or null.</summary>
    public static string? Condition(string markdown)
    {
        var doc = Markdig.Markdown.Parse(markdown);
        var inSection = false;
        foreach (var block in doc)
        {
            if (block is HeadingBlock heading)
            {
                inSection = heading.Level == 2 && Inline(heading).Trim().Equals(RulePageSections.Condition, StringComparison.Ordinal);
                continue;
            }

            if (inSection && block is ParagraphBlock paragraph)
            {
                return Collapse(Markdig.Markdown.ToPlainText(markdown.Substring(paragraph.Span.Start, paragraph.Span.Length)));
            }
        }

        return null;
    }

    /// <summary>The whole page as plain text, for SARIF's required <c>help.text</c>.</summary>
    public static string PlainText(string markdown) => Markdig.Markdown.ToPlainText(markdown).Replace("\r\n", "\n", StringComparison.Ordinal).Trim();

    private static string Inline(HeadingBlock heading) => heading.Inline is null ? "" : string.Concat(heading.Inline.Descendants<Markdig.Syntax.Inlines.LiteralInline>().Select(l => l.Content.ToString()));

    private static string Collapse(string text) => Whitespace().Replace(text, " ").Trim();

    [GeneratedRegex(@"\s+")]
    private static partial Regex Whitespace();
}
