using SpecLint.Rules.Checking;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests.Engine;

public sealed class SpecFileFinderTests
{
    [Theory]
    [InlineData("**/*.tia.yaml", "a.tia.yaml", true)]
    [InlineData("**/*.tia.yaml", "hw/rx/ch2.tia.yaml", true)]
    [InlineData("**/*.tia.yaml", "hw/rx/ch2.yaml", false)]
    [InlineData("hw/*.tia.yaml", "hw/ch1.tia.yaml", true)]
    [InlineData("hw/*.tia.yaml", "hw/rx/ch1.tia.yaml", false)]
    [InlineData("hw/**", "hw/rx/ch1.tia.yaml", true)]
    [InlineData("ch?.tia.yaml", "ch1.tia.yaml", true)]
    [InlineData("ch?.tia.yaml", "ch12.tia.yaml", false)]
    [InlineData("/hw/*.tia.yaml", "hw\\ch1.tia.yaml", true)]
    [InlineData("a.b.yaml", "axb.yaml", false)]
    public void Globs_match_as_documented(string glob, string path, bool matches)
    {
        Assert.Equal(matches, new GlobPattern(glob).IsMatch(path));
    }

    [Fact]
    public void Finds_the_included_files_in_ordinal_order_and_skips_build_folders()
    {
        using var repo = new TempRepo();
        foreach (var f in new[] { "z.tia.yaml", "hw/b.tia.yaml", "hw/A.tia.yaml", "hw/rx/c.tia.yaml", "notes.yaml", "bin/x.tia.yaml", "obj/y.tia.yaml", "node_modules/n.tia.yaml" })
        {
            repo.Write(f, "spec: 1\n");
        }

        var found = SpecFileFinder.Find([repo.Root], ["**/*.tia.yaml"], out var missing);

        Assert.Empty(missing);
        var relative = found.Select(f => Path.GetRelativePath(repo.Root, f).Replace('\\', '/')).ToList();
        Assert.Equal(["hw/A.tia.yaml", "hw/b.tia.yaml", "hw/rx/c.tia.yaml", "z.tia.yaml"], relative);
        Assert.Equal(found.Order(StringComparer.Ordinal), found);
    }

    [Fact]
    public void Uses_the_include_globs_and_reports_missing_paths()
    {
        using var repo = new TempRepo();
        repo.Write("hw/a.tia.yaml", "spec: 1\n");
        repo.Write("sim/b.tia.yaml", "spec: 1\n");
        var missingPath = Path.Combine(repo.Root, "nope");

        var found = SpecFileFinder.Find([repo.Root, missingPath], ["hw/**/*.tia.yaml"], out var missing);

        Assert.Equal(["hw/a.tia.yaml"], found.Select(f => Path.GetRelativePath(repo.Root, f).Replace('\\', '/')));
        Assert.Equal([missingPath], missing);
    }
}
