namespace SpecLint.Cli.Tests.Hostile;

/// <summary>Shared steps of the hostile-input regression tests (issue 14).</summary>
internal static class Hostile
{
    /// <summary>The clean spec with one line replaced (or added after <paramref name="find"/> when <paramref name="add"/> is set).</summary>
    public static string Spec(string find, string replace, bool add = false) =>
        Specs.Clean.Contains(find, StringComparison.Ordinal)
            ? Specs.Clean.Replace(find, add ? find + "\n" + replace : replace, StringComparison.Ordinal)
            : throw new ArgumentException($"'{find}' is not in the clean spec", nameof(find));

    /// <summary>Checks one spec in every terminal format; asserts exit 2, the message at its place, and finite, escaped output.</summary>
    public static void AssertRefused(string yaml, string located, string fragment)
    {
        using var cli = new CliHarness();
        cli.Write(".git/HEAD", "ref: refs/heads/main\n");
        cli.Write("ch.tia.yaml", yaml);
        foreach (var format in new[] { "text", "json", "github" })
        {
            var (exit, output, error) = cli.Run("check", "ch.tia.yaml", "--nominal-only", "--format", format, "--report", "r.md", "--sarif", "r.sarif", "--html", "r.html");
            Assert.True(exit == 2, $"exit {exit} in {format}:\n{output}\n{error}");
            OutputScan.AssertFinite(output + error, format);
            OutputScan.AssertNoControlCharacters(output + error, format);
            if (format == "text")
            {
                Assert.Contains("ch.tia.yaml:" + located + ": error spec-invalid: ", output, StringComparison.Ordinal);
                Assert.Contains(fragment, output, StringComparison.Ordinal);
            }

            foreach (var file in new[] { "r.md", "r.sarif", "r.html" })
            {
                OutputScan.AssertFinite(File.ReadAllText(cli.Path_(file)), file);
            }
        }
    }

    /// <summary>Checks a clean spec under a configuration; asserts exit 2 and a config-invalid message at its key.</summary>
    public static void AssertConfigRefused(string config, string located, string fragment)
    {
        using var cli = new CliHarness();
        cli.Write(".git/HEAD", "ref: refs/heads/main\n");
        cli.Write("ch.tia.yaml", Specs.Clean);
        cli.Write(".speclint.yaml", config);
        var (exit, output, error) = cli.Run("check", "--nominal-only");
        Assert.True(exit == 2, $"exit {exit}:\n{output}\n{error}");
        Assert.Contains(".speclint.yaml:" + located + ": error config-invalid: ", output, StringComparison.Ordinal);
        Assert.Contains(fragment, output, StringComparison.Ordinal);
        OutputScan.AssertFinite(output + error, "output");
    }
}
