using SpecLint.Core.Config;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Config;

public sealed class RepoConfigLoaderTests : IDisposable
{
    private readonly string _root = Path.Combine(Path.GetTempPath(), "speclint-config-" + Guid.NewGuid().ToString("N"));

    public RepoConfigLoaderTests() => Directory.CreateDirectory(_root);

    public void Dispose() => Directory.Delete(_root, recursive: true);

    [Fact]
    public void Reads_the_design_example()
    {
        const string text = """
            include: ["**/*.tia.yaml"]
            fail-on: error                   # error | warning | note
            monte-carlo: { samples: 1000, seed: 1 }
            rules:
              phase-margin: { severity: error, floor: 50 deg }
              output-headroom: { margin: 100 mV }
              standard-values: { severity: off }
            """;

        var result = RepoConfigLoader.LoadText(text, ".speclint.yaml");

        Assert.Empty(result.Diagnostics);
        var c = result.Config;
        Assert.Equal(["**/*.tia.yaml"], c.Include.ToArray());
        Assert.Equal(ConfigSeverity.Error, c.FailOn);
        Assert.Equal(new MonteCarloSettings(1000, 1, MonteCarloDistribution.Uniform), c.MonteCarlo);
        Assert.Equal(ConfigSeverity.Error, c.ForRule("phase-margin")!.Severity);
        var floor = c.ForRule("phase-margin")!.Options["floor"];
        Assert.Equal("50 deg", floor.RawText);
        Assert.Equal((5, 43), (floor.Position.Line, floor.Position.Column));
        Assert.True(floor.TryGetQuantity(Dimension.Angle, out var angle, out _));
        Assert.Equal(50, Angle.FromSi(angle!.Typ).Degrees, 1e-9);
        Assert.Null(c.ForRule("output-headroom")!.Severity);
        Assert.True(c.ForRule("standard-values")!.IsOff);
    }

    [Fact]
    public void Empty_file_means_all_defaults()
    {
        var result = RepoConfigLoader.LoadText("# nothing to change\n", ".speclint.yaml");

        Assert.Empty(result.Diagnostics);
        Assert.Equal(RepoConfig.Default with { Path = ".speclint.yaml" }, result.Config);
    }

    [Fact]
    public void Defaults_are_documented_values()
    {
        var d = RepoConfig.Default;

        Assert.Equal(["**/*.tia.yaml"], d.Include.ToArray());
        Assert.Equal(ConfigSeverity.Error, d.FailOn);
        Assert.Equal(1000, d.MonteCarlo.Samples);
        Assert.Equal(1, d.MonteCarlo.Seed);
        Assert.Empty(d.Rules);
    }

    [Fact]
    public void Reports_a_bad_severity_and_keeps_the_default()
    {
        const string text = "fail-on: fatal\nrules:\n  peaking: { severity: loud, max: 1 dB }\nmonte-carlo: { samples: 0, distribution: normal }\n";

        var result = RepoConfigLoader.LoadText(text, ".speclint.yaml");

        Assert.Equal(["1:10", "3:24", "4:25"], result.Diagnostics.Select(d => $"{d.Line}:{d.Column}"));
        Assert.All(result.Diagnostics, d => Assert.Equal("config-invalid", d.RuleId));
        Assert.Contains("use \"error\", \"warning\" or \"note\"", result.Diagnostics[0].Message, StringComparison.Ordinal);
        Assert.Equal(ConfigSeverity.Error, result.Config.FailOn);
        Assert.Null(result.Config.ForRule("peaking")!.Severity);
        Assert.Equal("1 dB", result.Config.ForRule("peaking")!.Options["max"].RawText);
        Assert.Equal(MonteCarloDistribution.Normal, result.Config.MonteCarlo.Distribution);
        Assert.Equal(1000, result.Config.MonteCarlo.Samples);
    }

    [Fact]
    public void Flags_an_unknown_top_level_key_with_a_suggestion()
    {
        var d = Assert.Single(RepoConfigLoader.LoadText("fail_on: warning\n", ".speclint.yaml").Diagnostics);

        Assert.Equal("fail_on", d.KeyPath);
        Assert.Contains("did you mean \"fail-on\"?", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Finds_the_nearest_config_walking_up()
    {
        var deep = Directory.CreateDirectory(Path.Combine(_root, "hw", "rx", "ch2")).FullName;
        File.WriteAllText(Path.Combine(_root, ".speclint.yaml"), "fail-on: warning\n");
        File.WriteAllText(Path.Combine(_root, "hw", ".speclint.yaml"), "fail-on: note\n");
        var spec = Path.Combine(deep, "ch2.tia.yaml");

        Assert.Equal(Path.Combine(_root, "hw", ".speclint.yaml"), RepoConfigLoader.FindFor(spec));
        Assert.Equal(ConfigSeverity.Note, RepoConfigLoader.LoadFor(spec).Config.FailOn);
    }

    [Fact]
    public void Stops_walking_at_the_repository_root()
    {
        File.WriteAllText(Path.Combine(_root, ".speclint.yaml"), "fail-on: warning\n");
        var repo = Directory.CreateDirectory(Path.Combine(_root, "repo")).FullName;
        Directory.CreateDirectory(Path.Combine(repo, ".git"));
        var spec = Path.Combine(Directory.CreateDirectory(Path.Combine(repo, "hw")).FullName, "a.tia.yaml");

        Assert.Null(RepoConfigLoader.FindFor(spec));
        Assert.Equal(RepoConfig.Default, RepoConfigLoader.LoadFor(spec).Config);
    }

    [Fact]
    public void Config_at_the_repository_root_itself_is_found()
    {
        Directory.CreateDirectory(Path.Combine(_root, ".git"));
        File.WriteAllText(Path.Combine(_root, ".speclint.yaml"), "include: [\"specs/**/*.yaml\"]\n");
        var spec = Path.Combine(Directory.CreateDirectory(Path.Combine(_root, "specs")).FullName, "a.tia.yaml");

        var result = RepoConfigLoader.LoadFor(spec);

        Assert.Equal(["specs/**/*.yaml"], result.Config.Include.ToArray());
        Assert.Equal(Path.Combine(_root, ".speclint.yaml"), result.Config.Path);
    }
}
