using System.Reflection;

namespace SpecLint.Rules.Engine;

/// <summary>The rule pages (rules/&lt;id&gt;/&lt;id&gt;.md), embedded in the library so <c>speclint why</c> works from an installed tool.</summary>
internal static class RuleDocs
{
    /// <summary>
    /// Where the project's files will be published. A placeholder until then: the reserved <c>.invalid</c>
    /// domain (RFC 2606) cannot point anywhere by accident. Change it here, in one place, when the project has
    /// a home of its own.
    /// </summary>
    public const string ProjectHome = "https://speclint.invalid";

    /// <summary>The base of the help links; a rule's page is <c>{base}/{id}/{id}.md</c>, the same path as in the repository.</summary>
    public const string HelpBase = ProjectHome + "/rules";

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
