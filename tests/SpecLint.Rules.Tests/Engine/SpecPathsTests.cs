using SpecLint.Core.Config;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests.Engine;

/// <summary>Which files a folder check takes: include and exclude patterns, relative to the configuration file.</summary>
public sealed class SpecPathsTests
{
    private static readonly string Valid = $"{Parts.Header}\nconditions: {{ temperature: 25 °C, supply: {{ positive: 5 V, negative: -5 V }} }}\nbias: 0 V\ninput: {{ type: photodiode, capacitance: 10 pF, current: {{ min: 1 µA, max: 1 µA }} }}\n{Parts.IdealAmp}\nfeedback:\n  resistance: 1 MΩ\n  capacitance: 2.2 pF\n";

    private static TempRepo Repo(string config)
    {
        var repo = new TempRepo();
        repo.Write(".speclint.yaml", config);
        var n = 0;
        foreach (var f in new[] { "hw/a.tia.yaml", "hw/rx/b.tia.yaml", "hw/archive/old.tia.yaml", "sim/c.tia.yaml" })
        {
            repo.Write(f, Valid.Replace("name: channel", $"name: ch{n++}", StringComparison.Ordinal));
        }

        return repo;
    }

    private static List<string> Checked(TempRepo repo, string folder) =>
        [.. CheckRunner.Run(new CheckOptions { Paths = [Path.Combine(repo.Root, folder)], Today = Lint.Today, Tolerances = false })
            .Specs.Select(s => Path.GetRelativePath(repo.Root, Path.GetFullPath(s.File)).Replace('\\', '/'))];

    [Theory]
    [InlineData("")]
    [InlineData("hw")]
    [InlineData("hw/rx")]
    public void Include_patterns_are_relative_to_the_configuration_file_whatever_folder_is_given(string folder)
    {
        // The README's example: include: ["hw/**/*.tia.yaml"], then 'speclint check hw/'.
        using var repo = Repo("include: [\"hw/**/*.tia.yaml\"]\n");

        var expected = new[] { "hw/a.tia.yaml", "hw/archive/old.tia.yaml", "hw/rx/b.tia.yaml" }
            .Where(f => f.StartsWith(folder, StringComparison.Ordinal));
        Assert.Equal(expected, Checked(repo, folder));
    }

    [Fact]
    public void Exclude_patterns_leave_files_out_of_a_folder_check()
    {
        using var repo = Repo("include: [\"hw/**/*.tia.yaml\"]\nexclude: [\"hw/archive/**\"]\n");

        Assert.Equal(["hw/a.tia.yaml", "hw/rx/b.tia.yaml"], Checked(repo, "hw"));
        Assert.Equal(["hw/a.tia.yaml", "hw/rx/b.tia.yaml"], Checked(repo, ""));
    }

    [Fact]
    public void A_file_named_on_the_command_line_is_checked_even_when_excluded()
    {
        using var repo = Repo("exclude: [\"hw/archive/**\"]\n");

        var run = CheckRunner.Run(new CheckOptions { Paths = [Path.Combine(repo.Root, "hw/archive/old.tia.yaml")], Today = Lint.Today, Tolerances = false });

        Assert.Single(run.Specs);
    }

    [Fact]
    public void Exclude_must_be_a_list_of_patterns()
    {
        var loaded = RepoConfigLoader.LoadText("exclude: 3\n", Lint.ConfigFile);

        Assert.Contains(loaded.Diagnostics, d => d.Pointer == "/exclude");
    }
}
