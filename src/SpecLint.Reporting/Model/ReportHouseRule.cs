using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Model;

/// <summary>A house rule as the reports and SARIF describe it.</summary>
/// <param name="Id">The rule id.</param>
/// <param name="Title">The descriptor's one-line title.</param>
/// <param name="DefaultSeverity">The descriptor's default severity.</param>
/// <param name="Source">The .cs file that declares it, as the catalog gives it.</param>
/// <param name="Page">Its page (Markdown), or null when it has none.</param>
internal sealed record ReportHouseRule(string Id, string Title, Severity DefaultSeverity, string Source, string? Page)
{
    /// <summary>The descriptor SARIF writes; options are not part of SARIF's rule description.</summary>
    public RuleDescriptor Descriptor => new(Id, Title, DefaultSeverity, []);
}
