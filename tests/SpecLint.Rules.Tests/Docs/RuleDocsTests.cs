using System.Text.RegularExpressions;
using SpecLint.Core.Spec.Yaml;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Tests.Docs;

public sealed partial class RuleDocsTests
{
    private static readonly string[] Sections = ["## What it flags", "## Why it matters", "## Example", "## Use instead", "## Options", "## References"];

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
    public void Every_page_starts_with_its_id_and_has_the_sections_in_order(string id)
    {
        var page = PageOf(id);

        Assert.StartsWith($"# {id}:", page, StringComparison.Ordinal);
        var headings = page.Split('\n').Select(l => l.TrimEnd('\r')).Where(l => l.StartsWith("## ", StringComparison.Ordinal)).ToList();
        Assert.Equal(Sections, headings);
    }

    [Theory]
    [MemberData(nameof(Ids))]
    public void Every_option_appears_in_the_options_table_with_its_default(string id)
    {
        var page = PageOf(id);
        var rule = RuleCatalog.BuiltIn.Find(id)!;
        var options = Section(page, "## Options");

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
    public void Every_yaml_block_of_the_example_parses(string id)
    {
        var blocks = YamlBlock().Matches(Section(PageOf(id), "## Example") + Section(PageOf(id), "## Use instead")).Select(m => m.Groups[1].Value).ToList();

        Assert.NotEmpty(blocks);
        foreach (var yaml in blocks)
        {
            var tree = YamlTreeReader.Read(yaml);
            Assert.True(tree.Problems.IsEmpty, $"{id}: {string.Join("; ", tree.Problems.Select(p => p.Message))}\n{yaml}");
            Assert.True(tree.HasRoot);
        }
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

    private static string Section(string page, string heading)
    {
        var start = page.IndexOf(heading, StringComparison.Ordinal);
        Assert.True(start >= 0, heading);
        var next = page.IndexOf("\n## ", start + heading.Length, StringComparison.Ordinal);
        return next < 0 ? page[start..] : page[start..next];
    }

    [GeneratedRegex(@"```yaml\r?\n(.*?)```", RegexOptions.Singleline)]
    private static partial Regex YamlBlock();

    [GeneratedRegex(@"^\| `([^`]+)` \|", RegexOptions.Multiline)]
    private static partial Regex OptionRow();
}
