using SpecLint.Rules.Engine;

namespace SpecLint.Reporting;

/// <summary>Links to the project and to each rule's page (the base lives in <see cref="RuleDocs"/>, in one place).</summary>
internal static class RuleHelpLinks
{
    /// <summary>The folder of the rule pages, with a trailing slash.</summary>
    public const string DocsBase = RuleDocs.HelpBase + "/";

    /// <summary>The project's home page (a documented placeholder, see <see cref="RuleDocs.ProjectHome"/>).</summary>
    public const string Project = RuleDocs.ProjectHome;

    /// <summary>The page about the engine's own finding ids (spec-invalid, waiver-expired, ...).</summary>
    public const string EngineFindings = Project + "/docs/engine-findings.md";

    /// <summary>The page of one rule, or the section of the engine page for an engine id.</summary>
    public static string For(string ruleId) =>
        RuleIds.EngineIds.Contains(ruleId)
            ? EngineFindings + "#" + Uri.EscapeDataString(ruleId)
            : DocsBase + Uri.EscapeDataString(ruleId) + "/" + Uri.EscapeDataString(ruleId) + ".md";
}
