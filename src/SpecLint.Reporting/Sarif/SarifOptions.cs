namespace SpecLint.Reporting.Sarif;

/// <summary>What <see cref="SarifWriter"/> needs besides the rules and findings.</summary>
/// <param name="ToolVersion">SpecLint's version, written as <c>tool.driver.version</c>.</param>
internal sealed record SarifOptions(string ToolVersion)
{
    /// <summary>Rule documentation pages (Markdown, <c>rules/&lt;id&gt;/&lt;id&gt;.md</c>) by rule id; they give the full description and help.</summary>
    public IReadOnlyDictionary<string, string> RulePages { get; init; } = new Dictionary<string, string>();

    /// <summary>
    /// House rules by id, with the repository-relative path of the .cs file that declares each: their pages live in
    /// the team's repository, so they get no link to SpecLint's pages, and they are tagged as house rules.
    /// </summary>
    public IReadOnlyDictionary<string, string> HouseRuleSources { get; init; } = new Dictionary<string, string>();

    /// <summary>
    /// Absolute path of the repository root. Findings whose file is absolute are made relative to it, because code
    /// scanning matches results to files by repository-relative URI. Null leaves paths as given.
    /// </summary>
    public string? RepositoryRoot { get; init; }
}
