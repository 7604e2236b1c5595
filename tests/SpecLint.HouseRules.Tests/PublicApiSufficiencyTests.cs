using SpecLint.HouseRules.Compiling;
using SpecLint.HouseRules.Discovery;

namespace SpecLint.HouseRules.Tests;

/// <summary>
/// Built-in and house rules use one API: the built-in rules, compiled exactly as a house rule is (public API only,
/// allow-list and units analyzer on), must compile without a single diagnostic; so must the example team's rules.
/// </summary>
public sealed class PublicApiSufficiencyTests
{
    [Fact]
    public void The_built_in_rules_compile_as_house_rules_against_the_public_api()
    {
        var root = RepoPaths.Root;
        var files = Sources(root, "rules");

        var compiled = HouseRuleCompiler.Compile(files, "BuiltInAsHouseRules");

        // CS0436: the rules also exist inside SpecLint.Rules itself, which this compilation references.
        Assert.Empty(compiled.Problems.Where(p => !p.Message.StartsWith("CS0436", StringComparison.Ordinal)).Select(p => $"{p.Path}:{p.Line}:{p.Column}: {p.Message}"));
        Assert.Equal(13, compiled.Rules.Length);
    }

    [Fact]
    public void The_example_teams_rules_compile_without_a_diagnostic()
    {
        var files = Sources(RepoPaths.Root, "examples/house-rules");

        var compiled = HouseRuleCompiler.Compile(files, "ExampleHouseRules");

        Assert.Empty(compiled.Problems.Select(p => $"{p.Path}:{p.Line}:{p.Column}: {p.Message}"));
        Assert.Equal(3, compiled.Rules.Length);
    }

    [Fact]
    public void A_unit_mistake_in_a_house_rule_is_a_warning_at_its_line_during_check()
    {
        using var repo = new HouseRuleRepo();
        var src = Marked.Parse(Tests.Sources.Rule("cf-floor", """
                var smallest = [|new Capacitance(2.2)|];
                if (context.Circuit.Cf < smallest) yield return context.Report("/feedback/capacitance", "Cf is small");
        """));
        repo.Write("house-rules/cf-floor/ProbeRule.cs", src.Text);
        repo.Write("a.tia.yaml", Tests.Sources.Spec);

        var run = repo.Check();

        var warning = Assert.Single(run.RunProblems);
        Assert.Equal((src.Line, src.Column), (warning.Line, warning.Column));
        Assert.StartsWith("SLU0001", warning.Message, StringComparison.Ordinal);
        Assert.Equal(SpecLint.Rules.Engine.Severity.Warning, warning.Severity);
        Assert.True(run.Catalog.IsHouseRule("cf-floor"));
    }

    private static List<SourceFile> Sources(string root, string folder) =>
        Directory.GetFiles(Path.Combine(root, folder), "*.cs", SearchOption.AllDirectories)
            .Order(StringComparer.Ordinal)
            .Select(f => new SourceFile(Path.GetRelativePath(root, f).Replace('\\', '/'), f, File.ReadAllText(f)))
            .ToList();
}
