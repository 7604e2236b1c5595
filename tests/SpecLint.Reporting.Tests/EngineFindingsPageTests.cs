using SpecLint.Rules.Accepting;
using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Tests;

/// <summary>
/// docs/engine-findings.md has one section per id the engine reports under, and only those: help links of
/// engine findings point at these sections.
/// </summary>
public sealed class EngineFindingsPageTests
{
    [Fact]
    public void Every_engine_id_has_a_section_and_every_section_is_an_engine_id()
    {
        var page = File.ReadAllLines(Path.Combine(RepositoryFiles.Root, "docs", "engine-findings.md"));
        var sections = page.Where(l => l.StartsWith("## ", StringComparison.Ordinal)).Select(l => l[3..].Trim()).Order(StringComparer.Ordinal);

        Assert.Equal(RuleIds.EngineIds.Append(Acceptance.StaleId).Order(StringComparer.Ordinal), sections);
    }
}
