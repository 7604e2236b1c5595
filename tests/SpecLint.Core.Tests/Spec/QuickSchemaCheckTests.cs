using System.Globalization;
using System.Text.Json.Nodes;
using SpecLint.Core.Spec.Schema;
using SpecLint.Core.Spec.Yaml;

namespace SpecLint.Core.Tests.Spec;

/// <summary>
/// The quick schema check may only pass what the schema library passes (it answers "valid for certain" or
/// "ask the library"), and it must pass the valid specs, or it saves nothing. Every spec in the repository, and
/// many damaged copies of the examples, are put to both.
/// </summary>
public sealed class QuickSchemaCheckTests
{
    // Values tried at every position of a document: each type, bounds, and text whose length or pattern match
    // depends on how a library counts or classifies characters outside ASCII.
    private static readonly JsonNode?[] Replacements =
    [
        null, JsonValue.Create(true), JsonValue.Create(0L), JsonValue.Create(1L), JsonValue.Create(-3L), JsonValue.Create(1.5),
        JsonValue.Create(1.0), JsonValue.Create(1e300), JsonValue.Create(1000000L), JsonValue.Create(1000001L), JsonValue.Create(long.MaxValue),
        JsonValue.Create(""), JsonValue.Create("x"), JsonValue.Create("1 pF"), JsonValue.Create(" 2.2 pF"), JsonValue.Create("\u00A02.2 pF"),
        JsonValue.Create("\u20032.2 pF"), JsonValue.Create("\u0085" + "1 V"), JsonValue.Create("µ1"), JsonValue.Create("phase-margin"),
        JsonValue.Create("2027-03-31"), JsonValue.Create("٣ pF"), JsonValue.Create("1 pF\n"), JsonValue.Create("a-b"),
        JsonValue.Create(new string('a', 100)), JsonValue.Create(new string('a', 101)), JsonValue.Create(string.Concat(Enumerable.Repeat("𝔸", 60))),
        JsonValue.Create(string.Concat(Enumerable.Repeat("e\u0301", 55))), JsonValue.Create("transimpedance"), JsonValue.Create("photodiode"),
        new JsonObject(), new JsonObject { ["min"] = "1 pF", ["max"] = "2 pF" }, new JsonArray(), new JsonArray("a", "a"), new JsonArray("a", 1L),
    ];

    public static TheoryData<string> SpecFiles()
    {
        var data = new TheoryData<string>();
        foreach (var f in Directory.EnumerateFiles(TestPaths.RepoRoot, "*.tia.yaml", SearchOption.AllDirectories)
                     .Where(f => !f.Contains($"{Path.DirectorySeparatorChar}bin{Path.DirectorySeparatorChar}", StringComparison.Ordinal)
                                 && !f.Contains($"{Path.DirectorySeparatorChar}obj{Path.DirectorySeparatorChar}", StringComparison.Ordinal))
                     .Select(f => Path.GetRelativePath(TestPaths.RepoRoot, f))
                     .Order(StringComparer.Ordinal))
        {
            data.Add(f);
        }

        return data;
    }

    [Fact]
    public void Both_schemas_compile_for_the_quick_check()
    {
        Assert.True(SpecSchema.Shared.HasQuickCheck);
        Assert.True(ConfigSchema.Shared.HasQuickCheck);
    }

    [Theory]
    [MemberData(nameof(SpecFiles))]
    public void Passes_only_what_the_library_passes_and_every_valid_spec(string file)
    {
        var tree = YamlTreeReader.Read(File.ReadAllText(Path.Combine(TestPaths.RepoRoot, file)));
        var library = SpecSchema.Shared.LibraryAccepts(tree.Root);

        Assert.Equal(library, SpecSchema.Shared.QuickAccepts(tree.Root));
    }

    [Theory]
    [InlineData("examples/scatter.tia.yaml")]
    [InlineData("src/SpecLint.Cli/Demo/tern-do-electrode.tia.yaml")]
    [InlineData("src/SpecLint.Cli/Demo/tern-turbidity.tia.yaml")]
    public void Never_passes_a_damaged_spec_that_the_library_refuses(string file)
    {
        var root = YamlTreeReader.Read(File.ReadAllText(Path.Combine(TestPaths.RepoRoot, file))).Root!;

        var (tried, passed) = CompareDamaged(SpecSchema.Shared, root);

        Assert.True(tried > 1000, $"{tried} damaged copies");
        Assert.True(passed > 50, $"the quick check passed only {passed} damaged copies that the library passes");
    }

    [Fact]
    public void Never_passes_a_damaged_configuration_that_the_library_refuses()
    {
        var root = YamlTreeReader.Read(
            "fail-on: warning\ninclude: ['**/*.tia.yaml']\nexclude: [old/]\nmonte-carlo: { samples: 1000, seed: 7, distribution: normal }\n"
            + "rules:\n  phase-margin: { severity: warning, floor: 50 deg, tags: [x] }\n  slew-rate: { severity: off }\n").Root!;

        Assert.True(ConfigSchema.Shared.LibraryAccepts(root));
        Assert.True(ConfigSchema.Shared.QuickAccepts(root));
        var (tried, _) = CompareDamaged(ConfigSchema.Shared, root);

        Assert.True(tried > 100, $"{tried} damaged copies");
    }

    private static (int Tried, int Passed) CompareDamaged(SchemaValidator validator, JsonNode root)
    {
        var tried = 0;
        var passed = 0;
        foreach (var copy in Damaged(root))
        {
            tried++;
            var quick = validator.QuickAccepts(copy);
            var library = LibraryAccepts(validator, copy);
            Assert.False(quick && !library, $"the quick check passes what the library refuses: {copy?.ToJsonString()}");
            passed += quick ? 1 : 0;
        }

        return (tried, passed);
    }

    // The library throws for some values it cannot compare (a number too large for a decimal against an enum);
    // the quick check must not pass those either.
    private static bool LibraryAccepts(SchemaValidator validator, JsonNode? document)
    {
        try
        {
            return validator.LibraryAccepts(document);
        }
        catch (FormatException)
        {
            return false;
        }
        catch (OverflowException)
        {
            return false;
        }
    }

    /// <summary>Copies of <paramref name="root"/> with one change each: a value replaced, a key removed, a key added.</summary>
    private static IEnumerable<JsonNode?> Damaged(JsonNode root)
    {
        foreach (var pointer in Pointers(root, ""))
        {
            foreach (var replacement in Replacements)
            {
                yield return With(root, pointer, parent => Set(parent, Last(pointer), replacement?.DeepClone()));
            }

            if (pointer.Length > 0)
            {
                yield return With(root, pointer, parent => Remove(parent, Last(pointer)));
            }

            yield return With(root, pointer + "/extra-key", parent =>
            {
                if (parent is JsonArray list)
                {
                    list.Add("1 pF");
                }
                else
                {
                    Set(parent, "extra-key", "1 pF");
                }
            });
        }
    }

    private static JsonNode? With(JsonNode root, string pointer, Action<JsonNode?> change)
    {
        if (pointer.Length == 0)
        {
            return null;
        }

        var copy = root.DeepClone();
        var tokens = JsonPointerText.Split(pointer);
        JsonNode? parent = copy;
        foreach (var token in tokens.Take(tokens.Count - 1))
        {
            parent = parent is JsonArray a ? a[int.Parse(token, CultureInfo.InvariantCulture)] : parent?[token];
        }

        if (parent is JsonObject or JsonArray)
        {
            change(parent);
        }

        return copy;
    }

    private static string Last(string pointer) => JsonPointerText.Split(pointer)[^1];

    private static void Set(JsonNode? parent, string token, JsonNode? value)
    {
        if (parent is JsonArray a)
        {
            a[int.Parse(token, CultureInfo.InvariantCulture)] = value;
        }
        else if (parent is JsonObject o)
        {
            o[token] = value;
        }
    }

    private static void Remove(JsonNode? parent, string token)
    {
        if (parent is JsonArray a)
        {
            a.RemoveAt(int.Parse(token, CultureInfo.InvariantCulture));
        }
        else if (parent is JsonObject o)
        {
            o.Remove(token);
        }
    }

    private static IEnumerable<string> Pointers(JsonNode? node, string at)
    {
        yield return at;
        var children = node switch
        {
            JsonObject o => o.Select(p => (JsonPointerText.Append(at, p.Key), p.Value)).ToList(),
            JsonArray a => a.Select((v, i) => (JsonPointerText.Append(at, i.ToString(CultureInfo.InvariantCulture)), v)).ToList(),
            _ => [],
        };
        foreach (var (pointer, child) in children)
        {
            foreach (var p in Pointers(child, pointer))
            {
                yield return p;
            }
        }
    }
}
