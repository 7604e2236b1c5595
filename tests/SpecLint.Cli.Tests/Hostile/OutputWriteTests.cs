using System.Text;
using SpecLint.Core.Files;

namespace SpecLint.Cli.Tests.Hostile;

/// <summary>Issue 14: a failure to write is a clear message and exit 2 before the result; outputs are never half-written.</summary>
public sealed class OutputWriteTests
{
    private static void AssertWriteRefused(CliHarness cli, string option, string target, string fragment)
    {
        var (exit, output, error) = cli.Run("check", "ch.tia.yaml", "--nominal-only", option, target);
        Assert.True(exit == 2, $"exit {exit}:\n{output}\n{error}");
        Assert.Contains(fragment, error, StringComparison.Ordinal);
        Assert.DoesNotContain("internal error", error, StringComparison.Ordinal);
        Assert.DoesNotContain("Result: pass", output, StringComparison.Ordinal);
        Assert.Contains("Result: fail: an output could not be written", output, StringComparison.Ordinal);
    }

    private static CliHarness WithSpec()
    {
        var cli = new CliHarness();
        cli.Write("ch.tia.yaml", Specs.Clean);
        return cli;
    }

    [Fact]
    public void Report_under_proc_is_exit_2_with_a_message()
    {
        using var cli = WithSpec();
        AssertWriteRefused(cli, "--report", "/proc/speclint-none/r.md", "speclint: --report: cannot write '/proc/speclint-none/r.md'");
    }

    [Fact]
    public void Report_where_a_file_stands_in_for_a_folder_is_exit_2()
    {
        using var cli = WithSpec();
        cli.Write("out", "a file");
        AssertWriteRefused(cli, "--sarif", "out/r.sarif", "is a file where a folder is needed");
        Assert.Equal("a file", File.ReadAllText(cli.Path_("out")));
    }

    [Fact]
    public void Report_to_dev_full_is_exit_2()
    {
        using var cli = WithSpec();
        AssertWriteRefused(cli, "--html", "/dev/full", "not a regular file");
    }

    [Fact]
    public void Empty_report_path_is_exit_2()
    {
        using var cli = WithSpec();
        var (exit, _, error) = cli.Run("check", "ch.tia.yaml", "--nominal-only", "--report", "");
        Assert.Equal(2, exit);
        Assert.Contains("the path is empty", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Bad_job_summary_path_is_exit_2_with_a_message()
    {
        using var cli = WithSpec();
        Directory.CreateDirectory(cli.Path_("summary-folder"));
        var previous = Environment.GetEnvironmentVariable("GITHUB_STEP_SUMMARY");
        Environment.SetEnvironmentVariable("GITHUB_STEP_SUMMARY", cli.Path_("summary-folder"));
        try
        {
            var (exit, output, error) = cli.Run("check", "ch.tia.yaml", "--nominal-only", "--format", "github");
            Assert.Equal(2, exit);
            Assert.Contains("speclint: GITHUB_STEP_SUMMARY: cannot write", error, StringComparison.Ordinal);
            Assert.Contains("Result: fail: an output could not be written", output, StringComparison.Ordinal);
        }
        finally
        {
            Environment.SetEnvironmentVariable("GITHUB_STEP_SUMMARY", previous);
        }
    }

    [Fact]
    public void Demo_where_its_folder_name_is_a_file_is_exit_2_and_the_file_is_kept()
    {
        using var cli = new CliHarness();
        cli.Write("speclint-demo", "mine");
        var (exit, _, error) = cli.Run("demo");
        Assert.Equal(2, exit);
        Assert.Contains("is a file, not a folder", error, StringComparison.Ordinal);
        Assert.Equal("mine", File.ReadAllText(cli.Path_("speclint-demo")));
    }

    [Fact]
    public void Failed_write_keeps_the_old_report_and_leaves_no_temporary_file()
    {
        using var cli = WithSpec();
        var target = cli.Write("out/r.md", "old report");
        Directory.CreateDirectory(cli.Path_("out/r-plots/e2e-clean.loop-gain.svg"));
        var (exit, _, _) = cli.Run("check", "ch.tia.yaml", "--nominal-only", "--report", "out/r.md");
        Assert.Equal(2, exit);
        Assert.Equal("old report", File.ReadAllText(target));
        Assert.Empty(Directory.GetFiles(cli.Path_("out"), "*.tmp", SearchOption.AllDirectories));
    }

    [Fact]
    public async Task Readers_see_the_old_file_or_the_complete_new_one_never_a_partial_one()
    {
        using var cli = new CliHarness();
        var path = cli.Path_("r.html");
        var contents = new[] { new string('a', 2_000_000), new string('b', 3_000_000) };
        AtomicFile.WriteAllText(path, contents[0]);
        var writers = Enumerable.Range(0, 2).Select(w => Task.Run(() =>
        {
            for (var i = 0; i < 10; i++)
            {
                AtomicFile.WriteAllText(path, contents[(w + i) % 2]);
            }
        })).ToArray();
        var seen = 0;
        while (!writers.All(t => t.IsCompleted))
        {
            var text = File.ReadAllText(path, Encoding.UTF8);
            Assert.Contains(text, contents);
            seen++;
        }

        await Task.WhenAll(writers);
        Assert.Contains(File.ReadAllText(path), contents);
        Assert.True(seen > 0);
        Assert.Empty(Directory.GetFiles(cli.Root, "*.tmp"));
    }
}
