using System.Reflection;

namespace SpecLint.Rules.Engine;

/// <summary>The rule pages (rules/&lt;id&gt;/&lt;id&gt;.md), embedded in the library so <c>speclint why</c> works from an installed tool.</summary>
public static class RuleDocs
{
    /// <summary>The base of the published help links; a rule's page is <c>{base}/{id}/{id}.md</c>.</summary>
    public const string HelpBase = "https://github.com/speclint/speclint/blob/main/rules";

    /// <summary>The help URI of a rule's page.</summary>
    public static Uri HelpUri(string id) => new($"{HelpBase}/{id}/{id}.md");

    /// <summary>The Markdown page of a built-in rule, or null.</summary>
    public static string? Page(string id)
    {
        using var stream = Assembly.GetExecutingAssembly().GetManifestResourceStream($"SpecLint.Rules.Docs.{id}.md");
        if (stream is null)
        {
            return null;
        }

        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }

    /// <summary>The ids that have an embedded page.</summary>
    public static IEnumerable<string> PageIds() =>
        Assembly.GetExecutingAssembly().GetManifestResourceNames()
            .Where(n => n.StartsWith("SpecLint.Rules.Docs.", StringComparison.Ordinal) && n.EndsWith(".md", StringComparison.Ordinal))
            .Select(n => n["SpecLint.Rules.Docs.".Length..^3])
            .Where(n => n != "README")
            .Order(StringComparer.Ordinal);
}
