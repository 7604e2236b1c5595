namespace SpecLint.Reporting;

/// <summary>Where a rule's documentation page is published; every reporter links rules through here.</summary>
public static class RuleHelpLinks
{
    /// <summary>Base of the rule pages: a page sits at <c>&lt;base&gt;&lt;id&gt;/&lt;id&gt;.md</c>, as in the repository's <c>rules/</c> folder.</summary>
    public const string DocsBase = "https://github.com/speclint/speclint/blob/main/rules/";

    /// <summary>The project's home page.</summary>
    public const string Project = "https://github.com/speclint/speclint";

    /// <summary>The page of the rule <paramref name="ruleId"/>.</summary>
    public static string For(string ruleId) => DocsBase + Uri.EscapeDataString(ruleId) + "/" + Uri.EscapeDataString(ruleId) + ".md";
}
