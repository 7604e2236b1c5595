using SpecLint.Rules.Engine;

namespace SpecLint.Reporting;

/// <summary>Links to the project and to each rule's page (the base lives in <see cref="RuleDocs"/>, in one place).</summary>
public static class RuleHelpLinks
{
    /// <summary>The folder of the rule pages, with a trailing slash.</summary>
    public const string DocsBase = RuleDocs.HelpBase + "/";

    /// <summary>The project's home page.</summary>
    public const string Project = "https://github.com/speclint/speclint";

    /// <summary>The page of one rule.</summary>
    public static string For(string ruleId) => DocsBase + Uri.EscapeDataString(ruleId) + "/" + Uri.EscapeDataString(ruleId) + ".md";
}
