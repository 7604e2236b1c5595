using SpecLint.Core.Config;
using SpecLint.Core.Spec;
using SpecLint.Core.Units;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests.Engine;

/// <summary>
/// Every fix SpecLint offers on the demo, the examples and the specs the tests run (the designs on the rule pages,
/// the design example) is a value the spec grammar reads back, and written into the spec at its key, clears the
/// finding it came with. Checked as the tool checks: with tolerance corners and Monte Carlo.
/// </summary>
public sealed class EveryFixClearsItsFindingTests
{
    public static TheoryData<string> Specs() => [.. Names()];

    private static List<string> Names()
    {
        var root = RepoRoot();
        var names = Directory.EnumerateFiles(Path.Combine(root, "src", "SpecLint.Cli", "Demo"), "*.tia.yaml")
            .Concat(Directory.EnumerateFiles(Path.Combine(root, "examples"), "*.tia.yaml"))
            .Concat(Directory.EnumerateFiles(Path.Combine(root, "tests", "SpecLint.Core.Tests", "Spec", "Resources"), "*.tia.yaml"))
            .Select(f => Path.GetRelativePath(root, f).Replace('\\', '/'))
            .Order(StringComparer.Ordinal)
            .ToList();
        foreach (var rule in RuleCatalog.BuiltIn.Rules)
        {
            names.Add($"{rule.Descriptor.Id}#{RulePageSections.FlaggedDesign}");
            names.Add($"{rule.Descriptor.Id}#{RulePageSections.RevisedDesign}");
        }

        return names;
    }

    [Fact]
    public void The_set_holds_the_demo_the_examples_and_every_rule_page()
    {
        var names = Names();

        Assert.Equal(8, names.Count(n => n.StartsWith("src/SpecLint.Cli/Demo/", StringComparison.Ordinal)));
        Assert.True(names.Count(n => n.StartsWith("examples/", StringComparison.Ordinal)) >= 4);
        Assert.Equal(2 * RuleCatalog.BuiltIn.Rules.Length, names.Count(n => n.Contains('#', StringComparison.Ordinal)));
    }

    [Fact]
    public void The_set_offers_fixes_of_several_rules_to_check()
    {
        var rules = Names().SelectMany(n => Check(Text(n)).Findings).Where(f => f.Fix is not null).Select(f => f.RuleId).Distinct().ToList();

        Assert.True(rules.Count >= 5, "fixes offered by: " + string.Join(", ", rules));
    }

    [Theory]
    [MemberData(nameof(Specs))]
    public void Every_fix_parses_back_and_clears_its_finding(string name)
    {
        var yaml = Text(name);
        var before = Check(yaml);

        foreach (var finding in before.Findings.Where(f => f.Fix is not null && !f.Waived))
        {
            var fix = finding.Fix!;
            var dimension = QuantityKeys.DimensionOf(fix.Path);
            if (dimension is { } d)
            {
                Assert.True(QuantityParser.TryParse(fix.Value, d, out _, out var error), $"{name}: {finding.RuleId} offers \"{fix.Value}\" for {fix.Path}, which does not parse: {error}");
            }

            var fixedYaml = Lint.ApplyFix(yaml, fix);
            var loaded = SpecLoader.LoadText(fixedYaml, Lint.SpecFile);
            Assert.True(loaded.IsValid, $"{name}: {finding.RuleId}'s fix \"{fix.Value}\" at {fix.Path} makes the spec invalid: " + string.Join("; ", loaded.Diagnostics));
            var after = CheckRunner.CheckSpec(loaded.Spec!, RepoConfig.Default, new CheckOptions { Today = Lint.Today });
            var still = after.Findings.Where(f => f.RuleId == finding.RuleId && f.Pointer == finding.Pointer).ToList();
            Assert.True(still.Count == 0, $"{name}: {finding.RuleId}'s fix \"{fix.Value}\" at {fix.Path} leaves:\n" + string.Join("\n", still));
        }
    }

    private static SpecOutcome Check(string yaml)
    {
        var loaded = SpecLoader.LoadText(yaml, Lint.SpecFile);
        Assert.True(loaded.IsValid, string.Join("; ", loaded.Diagnostics));
        return CheckRunner.CheckSpec(loaded.Spec!, RepoConfig.Default, new CheckOptions { Today = Lint.Today });
    }

    private static string Text(string name)
    {
        var hash = name.IndexOf('#', StringComparison.Ordinal);
        if (hash < 0)
        {
            return File.ReadAllText(Path.Combine(RepoRoot(), name)).ReplaceLineEndings("\n");
        }

        var page = Assert.IsType<string>(RuleDocs.Page(name[..hash]));
        return Assert.Single(RulePageSections.YamlBlocks(RulePageSections.Section(page, name[(hash + 1)..])));
    }

    private static string RepoRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "SpecLint.sln")))
        {
            dir = dir.Parent;
        }

        return Assert.IsType<DirectoryInfo>(dir).FullName;
    }
}
