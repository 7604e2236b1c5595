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
    public void Rules_lists_every_rule_and_why_prints_its_page()
    {
        using var cli = new CliHarness();
        var (exit, output, _) = cli.Run("rules");
        Assert.Equal(0, exit);
        foreach (var id in new[] { "phase-margin", "output-headroom", "thermal-vs-shot-noise", "capacitor-tolerance", "bandwidth", "peaking", "min-stable-gain", "noise-floor", "feedback-capacitor-size", "standard-values", "slew-rate", "high-voltage", "plausible-values" })
        {
            Assert.Contains(id, output, StringComparison.Ordinal);
        }

        Assert.Contains("'speclint why <id>'", output, StringComparison.Ordinal);
        var (whyExit, page, _) = cli.Run("why", "output-headroom");
        Assert.Equal(0, whyExit);
        Assert.StartsWith("# output-headroom:", page, StringComparison.Ordinal);
        Assert.Contains("## Flagged design", page, StringComparison.Ordinal);
    }

    [Fact]
    public void Why_names_the_closest_id_for_a_misspelt_one()
    {
        using var cli = new CliHarness();

        var (exit, output, error) = cli.Run("why", "phase-margn");

        Assert.Equal(2, exit);
        Assert.Empty(output);
        Assert.Contains("no rule 'phase-margn'. Did you mean 'phase-margin'?", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Why_shows_pages_from_any_page_source()
    {
        var command = Commands.WhyCommand.Create(id => id == "team-margin" ? "# team-margin: a house page\n" : null, () => ["team-margin"]);
        var root = new System.CommandLine.RootCommand { command };
        using var output = new StringWriter();
        using var error = new StringWriter();

        var exit = root.Parse(["why", "team-margin"]).Invoke(new System.CommandLine.InvocationConfiguration { Output = output, Error = error });

        Assert.Equal(0, exit);
        Assert.Equal("# team-margin: a house page\n", output.ToString());
    }

    [Fact]
    public void Explain_is_not_a_command_and_points_to_why()
    {
        using var cli = new CliHarness();

        var (exit, output, error) = cli.Run("explain", "phase-margin");

        Assert.Equal(2, exit);
        Assert.Empty(output);
        Assert.Contains("'explain' is not a SpecLint command", error, StringComparison.Ordinal);
        Assert.Contains("'speclint why <id>'", error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("chek", "unknown command 'chek'. Did you mean 'check'?")]
    [InlineData("rule", "unknown command 'rule'. Did you mean 'rules'?")]
    [InlineData("--verison", "unknown option '--verison' for speclint. Did you mean '--version'?")]
    public void An_unknown_command_gets_a_did_you_mean(string word, string expected)
    {
        using var cli = new CliHarness();

        var (exit, _, error) = cli.Run(word);

        Assert.Equal(2, exit);
        Assert.Contains(expected, error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--formt", "Did you mean '--format'?")]
    [InlineData("--nominal", "Did you mean '--nominal-only'?")]
    [InlineData("--fail-on=warning2", null)]
    public void A_mistyped_option_is_never_read_as_a_path(string option, string? hint)
    {
        using var cli = new CliHarness();

        var (exit, output, error) = cli.Run("check", option, "json");

        Assert.Equal(2, exit);
        Assert.DoesNotContain("no such file", output + error, StringComparison.Ordinal);
        if (hint is not null)
        {
            Assert.Contains($"unknown option '{option}' for 'check'. {hint}", error, StringComparison.Ordinal);
        }
    }
}
