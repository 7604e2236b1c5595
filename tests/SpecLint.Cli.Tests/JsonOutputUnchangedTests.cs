using System.Globalization;
using System.Text.Json;

namespace SpecLint.Cli.Tests;

/// <summary>
/// The JSON output of the example and demo specs against committed output (<c>Expected/</c>), so work on speed
/// cannot change a figure, a finding or a fix unnoticed. Text, keys, order and counts must match exactly;
/// numbers to 1e-9 relative, which is what the loop-metrics path promises against the full analysis (a dB figure
/// that is rounding noise around 0 to 1e-12 dB). After a deliberate change, the failure message names a file
/// with the new output; review it and copy it over the expected one.
/// </summary>
public sealed class JsonOutputUnchangedTests
{
    private const double Relative = 1e-9;
    private const double DbNoise = 1e-12;

    [Fact]
    public void The_examples_check_as_committed()
    {
        using var cli = new CliHarness();
        CopyTree(Path.Combine(RepoPaths.Root, "examples"), cli.Root);

        var (_, output, error) = cli.Run("check", ".", "--format", "json");

        AssertSame("examples.json", output, error);
    }

    [Fact]
    public void The_demo_specs_check_as_committed()
    {
        using var cli = new CliHarness();
        cli.Run("demo", "--out", "d");

        var (_, output, error) = cli.Run("check", "d/specs", "--format", "json");

        AssertSame("demo.json", output, error);
    }

    [Fact]
    public void The_comparison_catches_a_changed_figure_and_a_changed_word()
    {
        var expected = """{"a": [1.0, "x"], "b": {"peakingDb": 0}}""";

        Assert.Empty(Differences(expected, """{"a": [1.0000000001, "x"], "b": {"peakingDb": 1e-13}}"""));
        Assert.NotEmpty(Differences(expected, """{"a": [1.00000001, "x"], "b": {"peakingDb": 0}}"""));
        Assert.NotEmpty(Differences(expected, """{"a": [1.0, "y"], "b": {"peakingDb": 0}}"""));
        Assert.NotEmpty(Differences(expected, """{"a": [1.0, "x", 2], "b": {"peakingDb": 0}}"""));
        Assert.NotEmpty(Differences(expected, """{"a": [1.0, "x"], "b": {"peakingDb": 0, "c": null}}"""));
    }

    private static void AssertSame(string name, string actual, string error)
    {
        var expectedPath = Path.Combine(RepoPaths.Root, "tests", "SpecLint.Cli.Tests", "Expected", name);
        var differences = Differences(File.ReadAllText(expectedPath), actual);
        if (differences.Count > 0)
        {
            var actualPath = Path.Combine(Path.GetTempPath(), "speclint-" + name);
            File.WriteAllText(actualPath, actual);
            Assert.Fail($"{name}: {differences.Count} difference(s), first: {string.Join("; ", differences.Take(5))}; the new output is in {actualPath}. {error}");
        }
    }

    internal static List<string> Differences(string expected, string actual)
    {
        using var e = JsonDocument.Parse(expected);
        using var a = JsonDocument.Parse(actual);
        var found = new List<string>();
        Compare(e.RootElement, a.RootElement, "", "", found);
        return found;
    }

    private static void Compare(JsonElement e, JsonElement a, string path, string key, List<string> found)
    {
        if (e.ValueKind != a.ValueKind)
        {
            found.Add($"{path}: {e.ValueKind} became {a.ValueKind}");
            return;
        }

        switch (e.ValueKind)
        {
            case JsonValueKind.Object:
                var eNames = e.EnumerateObject().Select(p => p.Name).ToList();
                var aNames = a.EnumerateObject().Select(p => p.Name).ToList();
                if (!eNames.SequenceEqual(aNames, StringComparer.Ordinal))
                {
                    found.Add($"{path}: keys [{string.Join(", ", eNames)}] became [{string.Join(", ", aNames)}]");
                    return;
                }

                foreach (var p in e.EnumerateObject())
                {
                    Compare(p.Value, a.GetProperty(p.Name), path + "/" + p.Name, p.Name, found);
                }

                break;
            case JsonValueKind.Array:
                if (e.GetArrayLength() != a.GetArrayLength())
                {
                    found.Add($"{path}: {e.GetArrayLength()} items became {a.GetArrayLength()}");
                    return;
                }

                for (var i = 0; i < e.GetArrayLength(); i++)
                {
                    Compare(e[i], a[i], path + "/" + i.ToString(CultureInfo.InvariantCulture), key, found);
                }

                break;
            case JsonValueKind.Number:
                var (x, y) = (e.GetDouble(), a.GetDouble());
                var allowed = (Relative * Math.Max(Math.Abs(x), Math.Abs(y))) + (key.Contains("Db", StringComparison.Ordinal) ? DbNoise : 0);
                if (!(Math.Abs(x - y) <= allowed))
                {
                    found.Add(string.Create(CultureInfo.InvariantCulture, $"{path}: {x:R} became {y:R}"));
                }

                break;
            default:
                if (e.GetRawText() != a.GetRawText())
                {
                    found.Add($"{path}: {e.GetRawText()} became {a.GetRawText()}");
                }

                break;
        }
    }

    private static void CopyTree(string from, string to)
    {
        foreach (var file in Directory.EnumerateFiles(from, "*", SearchOption.AllDirectories))
        {
            var target = Path.Combine(to, Path.GetRelativePath(from, file));
            Directory.CreateDirectory(Path.GetDirectoryName(target)!);
            File.Copy(file, target);
        }
    }
}
