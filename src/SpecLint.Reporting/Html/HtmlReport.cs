using System.Net;
using System.Text;
using System.Text.RegularExpressions;
using Markdig;

namespace SpecLint.Reporting.Html;

/// <summary>
/// The Markdown report rendered with Markdig as one standalone page: styles embedded, every chart inlined as
/// SVG, so a reviewer can open it straight from a CI artifact with no other files.
/// </summary>
internal static partial class HtmlReport
{
    // Raw HTML in the Markdown is shown as text: every user string reaches the page escaped, never as markup.
    private static readonly MarkdownPipeline Pipeline = new MarkdownPipelineBuilder().UseAdvancedExtensions().DisableHtml().Build();

    [GeneratedRegex("<img src=\"(?<src>[^\"]+\\.svg)\" alt=\"(?<alt>[^\"]*)\"\\s*/?>", RegexOptions.CultureInvariant)]
    private static partial Regex SvgImage();

    /// <summary>Renders <paramref name="markdown"/>; SVG images are read from <paramref name="baseDirectory"/> and inlined.</summary>
    public static string Render(string markdown, string baseDirectory, string title) =>
        Render(markdown, src =>
        {
            var path = Path.Combine(baseDirectory, src);
            return File.Exists(path) ? File.ReadAllText(path, Encoding.UTF8) : null;
        }, title);

    /// <summary>
    /// Renders <paramref name="markdown"/>; each SVG image is inlined with the text <paramref name="svgFor"/> gives for
    /// its (decoded) relative path, or left as a link when it gives null.
    /// </summary>
    public static string Render(string markdown, Func<string, string?> svgFor, string title)
    {
        ArgumentNullException.ThrowIfNull(markdown);
        ArgumentNullException.ThrowIfNull(svgFor);
        var body = Markdig.Markdown.ToHtml(markdown, Pipeline);
        body = SvgImage().Replace(body, m =>
        {
            if (svgFor(WebUtility.UrlDecode(m.Groups["src"].Value)) is not { } svg)
            {
                return m.Value;
            }

            var start = svg.IndexOf("<svg", StringComparison.Ordinal);
            return $"<figure class=\"chart\" aria-label=\"{m.Groups["alt"].Value}\">{(start >= 0 ? svg[start..] : svg)}</figure>";
        });

        return $$"""
            <!DOCTYPE html>
            <html lang="en">
            <head>
            <meta charset="utf-8">
            <meta name="viewport" content="width=device-width, initial-scale=1">
            <title>{{WebUtility.HtmlEncode(title)}}</title>
            <style>
            body { font-family: "Segoe UI", "Helvetica Neue", Arial, sans-serif; color: #1f2a33; background: #fbfaf7; max-width: 1100px; margin: 2rem auto; padding: 0 1.5rem; line-height: 1.5; }
            h1 { border-bottom: 3px solid #2f6f73; padding-bottom: .3rem; }
            h2 { margin-top: 2.2rem; color: #2f4f5f; border-bottom: 1px solid #d8d4c8; }
            table { border-collapse: collapse; margin: 1rem 0; font-size: .92rem; }
            th, td { border: 1px solid #d8d4c8; padding: .3rem .6rem; vertical-align: top; }
            th { background: #eef0ea; text-align: left; }
            blockquote { border-left: 4px solid #b5651d; background: #f6efe6; margin: 1rem 0; padding: .5rem 1rem; }
            code { background: #eef0ea; padding: 0 .25rem; border-radius: 3px; }
            pre { background: #eef0ea; padding: .6rem; overflow-x: auto; }
            figure.chart { margin: 1rem 0; }
            figure.chart svg { max-width: 100%; height: auto; }
            </style>
            </head>
            <body>
            {{body}}
            </body>
            </html>

            """;
    }
}
