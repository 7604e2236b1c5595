using System.Text;
using SpecLint.Cli.Commands;
using SpecLint.Rules.Checking;

namespace SpecLint.Cli.Tests;

/// <summary>Specs checked on every core give the same output, byte for byte, as one after another.</summary>
public sealed class ParallelCheckTests
{
    [Fact]
    public void A_check_on_many_threads_writes_what_a_check_on_one_writes()
    {
        using var cli = new CliHarness();
        // The demo channels (with their house rule) three times under other names, and the examples (with theirs):
        // two configurations, two sets of compiled house rules, 31 specs.
        cli.Run("demo", "--out", "d");
        foreach (var (name, text) in DemoCommand.DemoSpecs())
        {
            for (var copy = 1; copy <= 2; copy++)
            {
                cli.Write($"d/specs/copy{copy}-{name}", text.Replace("\nname: ", $"\nname: copy{copy}-", StringComparison.Ordinal));
            }
        }

        var examples = Path.Combine(RepoPaths.Root, "examples");
        foreach (var file in Directory.EnumerateFiles(examples, "*", SearchOption.AllDirectories))
        {
            cli.Write(Path.Combine("x", Path.GetRelativePath(examples, file)), File.ReadAllText(file));
        }

        var paths = new[] { cli.Path_("d/specs"), cli.Path_("x") };
        var (oneJson, oneText, oneCount) = Check(paths, 1);
        var (manyJson, manyText, manyCount) = Check(paths, 4);

        Assert.Equal(31, oneCount);
        Assert.Equal(oneCount, manyCount);
        Assert.Contains("build-spread", oneJson, StringComparison.Ordinal);
        Assert.Equal(oneJson, manyJson);
        Assert.Equal(oneText, manyText);
    }

    private static (string Json, string Text, int Specs) Check(string[] paths, int threads)
    {
        var run = CheckRunner.Run(new CheckOptions
        {
            Paths = paths,
            Today = new DateOnly(2026, 6, 1),
            HouseRules = HouseRuleSources.Create(),
            MaxDegreeOfParallelism = threads,
        });
        return (Render(run, "json"), Render(run, "text"), run.Specs.Length);
    }

    private static string Render(Rules.Checking.CheckRun run, string format)
    {
        var sb = new StringBuilder();
        using (var w = new StringWriter(sb))
        using (var e = new StringWriter(sb))
        {
            Outputs.Write(run, new OutputRequest(format), w, e);
        }

        return sb.ToString();
    }
}
