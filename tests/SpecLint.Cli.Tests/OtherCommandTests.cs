using System.Text.Json;

namespace SpecLint.Cli.Tests;

public sealed class OtherCommandTests
{
    [Fact]
    public void Demo_writes_only_into_its_own_folder()
    {
        using var cli = new CliHarness();
        var (exit, output, _) = cli.Run("demo", "--out", "demo-out");
        Assert.Equal(0, exit);
        Assert.Equal(new[] { "demo-out" }, Directory.EnumerateFileSystemEntries(cli.Root).Select(p => Path.GetFileName(p)!).ToArray());
        Assert.True(File.Exists(cli.Path_("demo-out/report.md")));
        Assert.True(File.Exists(cli.Path_("demo-out/report.html")));
        Assert.True(Directory.EnumerateFiles(cli.Path_("demo-out/specs"), "*.tia.yaml").Count() >= 6);
        Assert.Contains("error phase-margin", output, StringComparison.Ordinal);
        Assert.Contains("error output-headroom", output, StringComparison.Ordinal);

        // A second run may reuse the folder it made.
        Assert.Equal(0, cli.Run("demo", "--out", "demo-out").Exit);
    }

    [Fact]
    public void Demo_refuses_a_folder_it_did_not_make()
    {
        using var cli = new CliHarness();
        var precious = cli.Write("mine/notes.txt", "keep me");
        var (exit, _, error) = cli.Run("demo", "--out", "mine");
        Assert.Equal(2, exit);
        Assert.Contains("nothing was written", error, StringComparison.Ordinal);
        Assert.Equal(new[] { "notes.txt" }, Directory.EnumerateFileSystemEntries(cli.Path_("mine")).Select(p => Path.GetFileName(p)!).ToArray());
        Assert.Equal("keep me", File.ReadAllText(precious));
    }

    [Fact]
    public void Demo_has_clean_and_failing_channels()
    {
        using var cli = new CliHarness();
        cli.Run("demo", "--out", "d");
        var (exit, output, _) = cli.Run("check", "d/specs", "--format", "json");
        Assert.Equal(1, exit);
        using var doc = JsonDocument.Parse(output);
        var specs = doc.RootElement.GetProperty("specs").EnumerateArray().ToList();
        Assert.InRange(specs.Count, 6, 8);
        Assert.Contains(specs, s => !s.GetProperty("findings").EnumerateArray().Any());
        Assert.Contains(specs, s => s.GetProperty("findings").EnumerateArray().Any(f => f.GetProperty("severity").GetString() == "error"));
    }

    [Fact]
    public void Schema_prints_a_draft_07_schema()
    {
        using var cli = new CliHarness();
        var (exit, output, _) = cli.Run("schema");
        Assert.Equal(0, exit);
        using var doc = JsonDocument.Parse(output);
        Assert.Equal("http://json-schema.org/draft-07/schema#", doc.RootElement.GetProperty("$schema").GetString());
        var (_, config, _) = cli.Run("schema", "--config");
        using var configDoc = JsonDocument.Parse(config);
        Assert.True(configDoc.RootElement.GetProperty("properties").TryGetProperty("fail-on", out _));
    }

    [Fact]
    public void Rules_lists_every_rule_and_explain_prints_its_page()
    {
        using var cli = new CliHarness();
        var (exit, output, _) = cli.Run("rules");
        Assert.Equal(0, exit);
        foreach (var id in new[] { "phase-margin", "output-headroom", "thermal-vs-shot-noise", "capacitor-tolerance", "bandwidth", "peaking", "min-stable-gain", "noise-floor", "feedback-capacitor-size", "standard-values", "slew-rate", "high-voltage" })
        {
            Assert.Contains(id, output, StringComparison.Ordinal);
        }

        var (explainExit, page, _) = cli.Run("explain", "output-headroom");
        Assert.Equal(0, explainExit);
        Assert.StartsWith("# output-headroom:", page, StringComparison.Ordinal);
        Assert.Equal(2, cli.Run("explain", "no-such-rule").Exit);
    }
}
