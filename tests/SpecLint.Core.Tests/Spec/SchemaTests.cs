using System.Text.Json.Nodes;
using SpecLint.Core.Spec;
using SpecLint.Core.Spec.Schema;

namespace SpecLint.Core.Tests.Spec;

public sealed class SchemaTests
{
    public static TheoryData<string> Examples()
    {
        var data = new TheoryData<string>();
        foreach (var f in Directory.GetFiles(TestPaths.Repo("examples"), "*.tia.yaml").Order(StringComparer.Ordinal))
        {
            data.Add(Path.GetFileName(f));
        }

        return data;
    }

    [Fact]
    public void There_are_at_least_three_examples()
    {
        Assert.True(Examples().Count >= 3);
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Every_example_loads_cleanly_and_names_the_schema(string file)
    {
        var path = TestPaths.Repo("examples", file);

        var result = SpecLoader.LoadFile(path, file);

        Assert.Empty(result.Diagnostics);
        Assert.NotNull(result.Spec);
        Assert.Equal("# yaml-language-server: $schema=../schema/speclint.schema.json", File.ReadLines(path).First());
    }

    [Fact]
    public void Committed_schema_copy_matches_the_embedded_schema()
    {
        var committed = File.ReadAllText(TestPaths.Repo("schema", "speclint.schema.json")).ReplaceLineEndings("\n");

        Assert.Equal(SpecSchema.Text.ReplaceLineEndings("\n"), committed);
    }

    [Fact]
    public void Schema_is_draft_07()
    {
        Assert.Equal("http://json-schema.org/draft-07/schema#", JsonNode.Parse(SpecSchema.Text)!["$schema"]!.GetValue<string>());
        Assert.Equal("http://json-schema.org/draft-07/schema#", JsonNode.Parse(ConfigSchema.Text)!["$schema"]!.GetValue<string>());
    }

    [Fact]
    public void Every_key_has_a_description_with_an_example_and_objects_are_closed()
    {
        var problems = new List<string>();
        Walk(JsonNode.Parse(SpecSchema.Text)!, "", problems);

        Assert.Empty(problems);
    }

    [Fact]
    public void Every_key_of_the_design_example_is_accepted()
    {
        var tree = SpecLint.Core.Spec.Yaml.YamlTreeReader.Read(File.ReadAllText(TestPaths.Output("Spec", "Resources", "design-example.tia.yaml")));
        var keys = tree.Positions.Keys.Where(k => k.Length > 0).ToList();

        Assert.Empty(SpecSchema.Validate(tree.Root));
        Assert.Contains("/requirements/noise/max-input", keys);
        Assert.Contains("/amplifier/output-swing/to-positive", keys);
        Assert.Equal(59, keys.Count);
    }

    private static void Walk(JsonNode node, string at, List<string> problems)
    {
        if (node is not JsonObject o)
        {
            return;
        }

        if (o["properties"] is JsonObject props)
        {
            if (o["additionalProperties"] is not JsonValue closed || closed.GetValue<bool>())
            {
                problems.Add($"{at}: additionalProperties is not false");
            }

            foreach (var (name, child) in props)
            {
                var description = child!["description"]?.GetValue<string>();
                if (description is null || (!description.Contains("Example", StringComparison.Ordinal) && at.Length > 0 && !at.EndsWith("/conditions", StringComparison.Ordinal)
                    && child["properties"] is null))
                {
                    problems.Add($"{at}/{name}: description without an example");
                }

                Walk(child, $"{at}/{name}", problems);
            }
        }

        foreach (var key in new[] { "items", "definitions" })
        {
            if (o[key] is JsonObject inner)
            {
                if (key == "definitions")
                {
                    foreach (var (name, def) in inner)
                    {
                        Walk(def!, $"#/definitions/{name}", problems);
                    }
                }
                else
                {
                    Walk(inner, at + "/items", problems);
                }
            }
        }
    }
}
