using System.Text.RegularExpressions;
using YamlDotNet.RepresentationModel;

namespace SpecLint.Cli.Tests.Changes;

/// <summary>
/// The composite action at the repository root and the example workflow, checked offline against the action
/// metadata rules: required keys, composite steps that either run a shell or use an action, every
/// <c>inputs.X</c> and <c>steps.ID</c> that an expression names exists, and no package from a public registry.
/// </summary>
public sealed partial class ActionFileTests
{
    private static string RepoFile(string relative)
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "SpecLint.sln")))
        {
            dir = dir.Parent;
        }

        return Path.Combine(dir!.FullName, relative);
    }

    private static YamlMappingNode Load(string relative)
    {
        var stream = new YamlStream();
        using var reader = new StringReader(File.ReadAllText(RepoFile(relative)));
        stream.Load(reader);
        return (YamlMappingNode)stream.Documents[0].RootNode;
    }

    private static YamlNode? Get(YamlMappingNode map, string key) =>
        map.Children.TryGetValue(new YamlScalarNode(key), out var value) ? value : null;

    [GeneratedRegex(@"\binputs\.([A-Za-z0-9_-]+)")]
    private static partial Regex InputReference();

    [GeneratedRegex(@"\bsteps\.([A-Za-z0-9_-]+)\.")]
    private static partial Regex StepReference();

    [Fact]
    public void The_action_has_the_required_keys_and_every_reference_resolves()
    {
        var action = Load("action.yml");
        Assert.False(string.IsNullOrWhiteSpace((Get(action, "name") as YamlScalarNode)?.Value));
        Assert.False(string.IsNullOrWhiteSpace((Get(action, "description") as YamlScalarNode)?.Value));
        var inputs = (YamlMappingNode)Get(action, "inputs")!;
        foreach (var (key, value) in inputs.Children)
        {
            Assert.Matches("^[A-Za-z_][A-Za-z0-9_-]*$", ((YamlScalarNode)key).Value!);
            Assert.NotNull(Get((YamlMappingNode)value, "description"));
        }

        var outputs = (YamlMappingNode)Get(action, "outputs")!;
        foreach (var (_, value) in outputs.Children)
        {
            Assert.NotNull(Get((YamlMappingNode)value, "description"));
            Assert.NotNull(Get((YamlMappingNode)value, "value"));
        }

        var runs = (YamlMappingNode)Get(action, "runs")!;
        Assert.Equal("composite", ((YamlScalarNode)Get(runs, "using")!).Value);
        var steps = ((YamlSequenceNode)Get(runs, "steps")!).Children.Cast<YamlMappingNode>().ToList();
        Assert.NotEmpty(steps);
        var ids = new List<string>();
        foreach (var step in steps)
        {
            var hasRun = Get(step, "run") is not null;
            var hasUses = Get(step, "uses") is not null;
            Assert.True(hasRun ^ hasUses, "a composite step either runs a command or uses an action");
            if (hasRun)
            {
                Assert.NotNull(Get(step, "shell"));
            }

            if (Get(step, "id") is YamlScalarNode id)
            {
                ids.Add(id.Value!);
            }
        }

        var text = File.ReadAllText(RepoFile("action.yml"));
        var declared = inputs.Children.Keys.Cast<YamlScalarNode>().Select(k => k.Value!).ToHashSet(StringComparer.Ordinal);
        var used = InputReference().Matches(text).Select(m => m.Groups[1].Value).ToHashSet(StringComparer.Ordinal);
        Assert.Empty(used.Except(declared));
        // Every input does something.
        Assert.Empty(declared.Except(used));
        Assert.Empty(StepReference().Matches(text).Select(m => m.Groups[1].Value).Except(ids));
    }

    [Fact]
    public void The_example_workflow_uses_the_action_and_installs_nothing_from_a_public_registry()
    {
        var workflow = Load("docs/example-workflow.yml");
        var jobs = (YamlMappingNode)Get(workflow, "jobs")!;
        var steps = jobs.Children.Values.Cast<YamlMappingNode>()
            .SelectMany(j => ((YamlSequenceNode)Get(j, "steps")!).Children.Cast<YamlMappingNode>()).ToList();
        Assert.Contains(steps, s => Get(s, "uses") is YamlScalarNode u && u.Value!.StartsWith("./", StringComparison.Ordinal));
        var checkout = steps.Single(s => (Get(s, "uses") as YamlScalarNode)?.Value?.StartsWith("actions/checkout", StringComparison.Ordinal) == true);
        Assert.Equal("0", ((YamlScalarNode)Get((YamlMappingNode)Get(checkout, "with")!, "fetch-depth")!).Value);

        var action = (YamlMappingNode)Get(Load("action.yml"), "inputs")!;
        var actionStep = steps.Single(s => (Get(s, "uses") as YamlScalarNode)?.Value?.StartsWith("./", StringComparison.Ordinal) == true);
        foreach (var key in ((YamlMappingNode)Get(actionStep, "with")!).Children.Keys.Cast<YamlScalarNode>())
        {
            Assert.NotNull(Get(action, key.Value!));
        }

        foreach (var file in new[] { "action.yml", "docs/example-workflow.yml" })
        {
            foreach (var line in File.ReadAllLines(RepoFile(file)).Where(l => l.Contains("dotnet tool install", StringComparison.Ordinal)))
            {
                Assert.Contains("--configfile", line, StringComparison.Ordinal);
            }
        }
    }
}
