using System.Text.RegularExpressions;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Tests.Docs;

public sealed partial class RuleDocsTests
{
    public static TheoryData<string> Ids() => [.. RuleCatalog.BuiltIn.Rules.Select(r => r.Descriptor.Id)];

    private static string RulesFolder()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "SpecLint.sln")))
        {
            dir = dir.Parent;
        }

        Assert.NotNull(dir);
        return Path.Combine(dir.FullName, "rules");
    }

    private static string PageOf(string id) => Assert.IsType<string>(RuleDocs.Page(id));

    [Theory]
    [MemberData(nameof(Ids))]
    public void Every_rule_has_its_page_in_its_own_folder(string id)
    {
        Assert.NotNull(RuleDocs.Page(id));
        Assert.True(File.Exists(Path.Combine(RulesFolder(), id, id + ".md")), $"rules/{id}/{id}.md");
        var rule = RuleCatalog.BuiltIn.Find(id)!;
        Assert.True(File.Exists(Path.Combine(RulesFolder(), id, rule.GetType().Name + ".cs")), $"rules/{id}/{rule.GetType().Name}.cs");
    }

    [Theory]
    [MemberData(nameof(Ids))]
    public void Every_page_starts_with_its_id_and_has_the_design_review_sections_in_order(string id)
    {
        Assert.Empty(RulePageSections.Problems(id, PageOf(id)));
    }

    [Fact]
    public void A_page_in_another_shape_is_refused_with_the_expected_sections_named()
    {
        var foreign = "# peaking: x\n\n## Summary\ntext\n\n## Details\ntext\n";

        var problem = Assert.Single(RulePageSections.Problems("peaking", foreign));
        Assert.Contains("'## Condition', '## On the bench', '## Flagged design', '## Revised design', '## Settings', '## Sources'", problem, StringComparison.Ordinal);
        Assert.NotEmpty(RulePageSections.Problems("bandwidth", PageOf("peaking")));
    }

    [Fact]
    public void The_template_has_the_shape_it_describes()
    {
        Assert.Empty(RulePageSections.Problems("new-rule", RulePageSections.Template("new-rule", "what it checks")));
    }

    [Theory]
    [MemberData(nameof(Ids))]
    public void Every_option_appears_in_the_options_table_with_its_default(string id)
    {
        var page = PageOf(id);
        var rule = RuleCatalog.BuiltIn.Find(id)!;
        var options = RulePageSections.Section(page, RulePageSections.Settings);

        Assert.Contains($"| `severity` | `{rule.Descriptor.DefaultSeverity.Name()}` |", options, StringComparison.Ordinal);
        foreach (var o in rule.Descriptor.Options)
        {
            Assert.Contains($"| `{o.Key}` | `{o.Default}` |", options, StringComparison.Ordinal);
        }

        // And no option in the table that the rule does not declare.
        var documented = OptionRow().Matches(options).Select(m => m.Groups[1].Value).Where(k => k != "severity");
        Assert.Equal(rule.Descriptor.Options.Select(o => o.Key).Order(StringComparer.Ordinal), documented.Order(StringComparer.Ordinal));
    }

    [Theory]
    [MemberData(nameof(Ids))]
    public void Every_page_names_its_sources_or_marks_them(string id)
    {
        var sources = RulePageSections.Section(PageOf(id), RulePageSections.Sources);

        Assert.Contains("- ", sources, StringComparison.Ordinal);
        Assert.DoesNotContain("REFERENCE", sources, StringComparison.Ordinal);
        Assert.DoesNotContain("DESIGN", sources, StringComparison.Ordinal);
    }

    [Fact]
    public void Every_page_under_rules_belongs_to_a_rule()
    {
        var ids = RuleCatalog.BuiltIn.Rules.Select(r => r.Descriptor.Id).ToHashSet(StringComparer.Ordinal);
        var onDisk = Directory.EnumerateFiles(RulesFolder(), "*.md", SearchOption.AllDirectories)
            .Where(p => Path.GetFileName(p) != "README.md")
            .Select(p => Path.GetFileNameWithoutExtension(p))
            .ToList();

        Assert.NotEmpty(onDisk);
        Assert.All(onDisk, page => Assert.Contains(page, ids));
        Assert.All(RuleDocs.PageIds(), page => Assert.Contains(page, ids));
        Assert.All(Directory.EnumerateDirectories(RulesFolder()), d => Assert.Contains(Path.GetFileName(d), ids));
    }

    [GeneratedRegex(@"^\| `([^`]+)` \|", RegexOptions.Multiline)]
    private static partial Regex OptionRow();
}
