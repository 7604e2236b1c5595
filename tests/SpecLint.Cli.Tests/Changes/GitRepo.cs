using System.Diagnostics;

namespace SpecLint.Cli.Tests.Changes;

/// <summary>A real git repository in the harness's scratch folder, driven with the git command line.</summary>
internal static class GitRepo
{
    /// <summary>Creates a repository on branch main with a local identity.</summary>
    public static void Init(CliHarness cli)
    {
        Git(cli.Root, "-c", "init.defaultBranch=main", "init", "-q");
        Git(cli.Root, "config", "user.name", "SpecLint Tests");
        Git(cli.Root, "config", "user.email", "tests@speclint.invalid");
        Git(cli.Root, "config", "commit.gpgsign", "false");
    }

    /// <summary>Stages everything and commits.</summary>
    public static void Commit(CliHarness cli, string message)
    {
        Git(cli.Root, "add", "-A");
        Git(cli.Root, "commit", "-q", "-m", message);
    }

    /// <summary>Runs git in <paramref name="folder"/>; fails the test when git fails.</summary>
    public static string Git(string folder, params string[] args)
    {
        var start = new ProcessStartInfo("git") { WorkingDirectory = folder, RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (var a in args)
        {
            start.ArgumentList.Add(a);
        }

        using var p = Process.Start(start)!;
        var output = p.StandardOutput.ReadToEnd();
        var error = p.StandardError.ReadToEnd();
        p.WaitForExit();
        Assert.True(p.ExitCode == 0, $"git {string.Join(' ', args)} failed: {error}");
        return output;
    }
}
