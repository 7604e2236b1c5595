using System.Diagnostics;
using SpecLint.Core.Files;

namespace SpecLint.Cli.Tests.Hostile;

/// <summary>Issue 14: pipes, devices and folders are refused before they are opened; paths and globs stay bounded.</summary>
public sealed class HostileFileTests
{
    private static void MakeFifo(string path)
    {
        using var p = Process.Start(new ProcessStartInfo("mkfifo", [path]) { UseShellExecute = false })!;
        p.WaitForExit();
        Assert.Equal(0, p.ExitCode);
    }

    private static (int Exit, string Out, string Err) RunBounded(CliHarness cli, params string[] args)
    {
        var task = Task.Run(() => cli.Run(args));
        Assert.True(task.Wait(TimeSpan.FromSeconds(30)), "the run did not finish");
        return task.Result;
    }

    [Fact]
    public void Named_pipe_called_like_a_spec_is_refused_without_hanging()
    {
        if (OperatingSystem.IsWindows())
        {
            return;
        }

        using var cli = new CliHarness();
        MakeFifo(cli.Path_("x.tia.yaml"));
        var (exit, output, _) = RunBounded(cli, "check", "x.tia.yaml", "--nominal-only");
        Assert.Equal(2, exit);
        Assert.Contains("x.tia.yaml:1:1: error spec-invalid: (file): this is not a regular file", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Named_pipe_found_by_the_folder_walk_is_refused_and_the_rest_checked()
    {
        if (OperatingSystem.IsWindows())
        {
            return;
        }

        using var cli = new CliHarness();
        cli.Write("hw/good.tia.yaml", Specs.Clean);
        MakeFifo(cli.Path_("hw/x.tia.yaml"));
        var (exit, output, _) = RunBounded(cli, "check", "hw", "--nominal-only");
        Assert.Equal(2, exit);
        Assert.Contains("hw/x.tia.yaml:1:1: error spec-invalid", output, StringComparison.Ordinal);
        Assert.Contains("2 specs checked", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Config_option_naming_a_named_pipe_is_refused_without_hanging()
    {
        if (OperatingSystem.IsWindows())
        {
            return;
        }

        using var cli = new CliHarness();
        cli.Write("ch.tia.yaml", Specs.Clean);
        MakeFifo(cli.Path_("pipe.yaml"));
        var (exit, output, _) = RunBounded(cli, "check", "ch.tia.yaml", "--nominal-only", "--config", "pipe.yaml");
        Assert.Equal(2, exit);
        Assert.Contains("error config-invalid: (file): this is not a regular file", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Symlink_to_dev_zero_as_spec_and_as_config_is_refused_without_reading()
    {
        if (!File.Exists("/dev/zero"))
        {
            return;
        }

        using var cli = new CliHarness();
        cli.Write("ch.tia.yaml", Specs.Clean);
        File.CreateSymbolicLink(cli.Path_("zero.tia.yaml"), "/dev/zero");
        var (exit, output, _) = RunBounded(cli, "check", "zero.tia.yaml", "--nominal-only");
        Assert.Equal(2, exit);
        Assert.Contains("zero.tia.yaml:1:1: error spec-invalid: (file): this is not a regular file", output, StringComparison.Ordinal);

        (exit, output, _) = RunBounded(cli, "check", "ch.tia.yaml", "--nominal-only", "--config", "zero.tia.yaml");
        Assert.Equal(2, exit);
        Assert.Contains("error config-invalid: (file): this is not a regular file", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Folder_named_like_a_spec_is_not_read_as_one()
    {
        Assert.False(BoundedFileReader.TryRead(Path.GetTempPath(), 1024, out _, out var why));
        Assert.Contains("folder", why, StringComparison.Ordinal);
    }

    [Fact]
    public void Reads_are_capped_while_reading_not_only_by_the_claimed_size()
    {
        using var cli = new CliHarness();
        var path = cli.Write("big.tia.yaml", new string('#', 5000));
        Assert.False(BoundedFileReader.TryRead(path, 4096, out var bytes, out var why));
        Assert.Empty(bytes);
        Assert.Contains("over 4096 bytes", why, StringComparison.Ordinal);
        Assert.True(BoundedFileReader.TryRead(path, 5000, out bytes, out _));
        Assert.Equal(5000, bytes.Length);
    }

    [Fact]
    public void Include_glob_with_16_double_star_segments_matches_in_bounded_time()
    {
        using var cli = new CliHarness();
        cli.Write(".git/HEAD", "ref: refs/heads/main\n");
        var glob = string.Concat(Enumerable.Repeat("**/", 16)) + "x*.tia.yaml";
        cli.Write(".speclint.yaml", $"include: [\"{glob}\"]\n");
        cli.Write(string.Join('/', Enumerable.Range(0, 30).Select(i => "d" + i)) + "/y.tia.yaml", Specs.Clean);
        var watch = Stopwatch.StartNew();
        var (exit, output, _) = RunBounded(cli, "check", "--nominal-only");
        Assert.True(watch.Elapsed < TimeSpan.FromSeconds(10), $"took {watch.Elapsed}");
        Assert.Equal(2, exit);
        Assert.Contains("no spec files matching", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Folder_symlink_loop_is_not_followed_so_each_spec_is_checked_once()
    {
        using var cli = new CliHarness();
        cli.Write("hw/ch.tia.yaml", Specs.Clean);
        Directory.CreateSymbolicLink(cli.Path_("hw/loop"), "..");
        Directory.CreateSymbolicLink(cli.Path_("hw/root"), "/");
        var (exit, output, _) = RunBounded(cli, "check", "hw", "--nominal-only");
        Assert.Equal(0, exit);
        Assert.Contains("1 spec checked", output, StringComparison.Ordinal);
        Assert.DoesNotContain("already used", output, StringComparison.Ordinal);
    }

    [Fact]
    public void File_symlink_leading_outside_the_walked_folder_is_not_read()
    {
        using var cli = new CliHarness();
        var outside = cli.Write("elsewhere/secret.tia.yaml", Specs.Clean.Replace("e2e-clean", "outside", StringComparison.Ordinal));
        cli.Write("hw/ch.tia.yaml", Specs.Clean);
        File.CreateSymbolicLink(cli.Path_("hw/link.tia.yaml"), outside);
        var (exit, output, _) = RunBounded(cli, "check", "hw", "--nominal-only");
        Assert.Equal(0, exit);
        Assert.Contains("1 spec checked", output, StringComparison.Ordinal);
    }
}
