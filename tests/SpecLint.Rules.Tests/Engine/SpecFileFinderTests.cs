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
    public void Globs_agree_with_their_regular_expression_on_random_patterns_and_paths()
    {
        // The documented meaning written as a regular expression (common practice for globs: '**/' any number of
        // whole folders, '**' anything, '*' a run within one name, '?' one character other than '/').
        static string AsRegex(string glob)
        {
            var sb = new System.Text.StringBuilder("^");
            for (var i = 0; i < glob.Length; i++)
            {
                if (glob[i] == '*' && i + 1 < glob.Length && glob[i + 1] == '*')
                {
                    var folders = i + 2 < glob.Length && glob[i + 2] == '/';
                    sb.Append(folders ? "(?:[^/]+/)*" : ".*");
                    i += folders ? 2 : 1;
                }
                else
                {
                    sb.Append(glob[i] switch { '*' => "[^/]*", '?' => "[^/]", var c => System.Text.RegularExpressions.Regex.Escape(c.ToString()) });
                }
            }

            return sb.Append('$').ToString();
        }

        var random = new Random(20261202);
        string[] globParts = ["a", "b", ".", "/", "*", "?", "**/", "**"];
        string[] pathParts = ["a", "b", ".", "/", "ab", "a/b/"];
        for (var n = 0; n < 20000; n++)
        {
            var glob = string.Concat(Enumerable.Range(0, random.Next(1, 7)).Select(_ => globParts[random.Next(globParts.Length)]));
            var path = string.Concat(Enumerable.Range(0, random.Next(0, 7)).Select(_ => pathParts[random.Next(pathParts.Length)]));
            var expected = System.Text.RegularExpressions.Regex.IsMatch(path, AsRegex(glob.TrimStart('/')));
            Assert.True(expected == new GlobPattern(glob).IsMatch(path), $"glob '{glob}' on '{path}': expected {expected}");
        }
    }

    [Fact]
    public void A_glob_of_many_double_stars_matches_a_deep_path_in_linear_time()
    {
        // Backtracking would take exponential time here; the state-set matcher reads the path once.
        var glob = string.Concat(Enumerable.Repeat("**/", 40)) + "x.tia.yaml";
        var path = string.Concat(Enumerable.Repeat("d/", 200)) + "x.tia.yml";
        Assert.False(new GlobPattern(glob).IsMatch(path));
        Assert.True(new GlobPattern(glob).IsMatch(path[..^3] + "yaml"));
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
