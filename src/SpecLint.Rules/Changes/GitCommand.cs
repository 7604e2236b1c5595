using System.Diagnostics;
using System.Text;

namespace SpecLint.Rules.Changes;

/// <summary>The outcome of one <c>git</c> invocation.</summary>
/// <param name="ExitCode">git's exit code, or -1 when git could not be started.</param>
/// <param name="Output">Standard output as bytes (file contents are not always text).</param>
/// <param name="Error">Standard error, trimmed.</param>
internal sealed record GitOutput(int ExitCode, byte[] Output, string Error)
{
    /// <summary>True when git ran and exited 0.</summary>
    public bool Ok => ExitCode == 0;

    /// <summary>Standard output as UTF-8 text.</summary>
    public string Text => Encoding.UTF8.GetString(Output);
}

/// <summary>Runs the <c>git</c> command line in a folder. Never throws for a git failure; the caller reads the exit code.</summary>
internal static class GitCommand
{
    /// <summary>Runs <c>git args…</c> in <paramref name="folder"/> with a fixed, non-interactive environment.</summary>
    public static GitOutput Run(string folder, params string[] args)
    {
        var start = new ProcessStartInfo("git")
        {
            WorkingDirectory = folder,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            RedirectStandardInput = true,
            UseShellExecute = false,
        };
        // Plain, stable output whatever the user's configuration: no pager, no colour, no localized messages.
        start.ArgumentList.Add("-c");
        start.ArgumentList.Add("core.quotepath=off");
        start.ArgumentList.Add("-c");
        start.ArgumentList.Add("color.ui=never");
        foreach (var a in args)
        {
            start.ArgumentList.Add(a);
        }

        start.Environment["GIT_PAGER"] = "cat";
        start.Environment["LC_ALL"] = "C";
        start.Environment["GIT_TERMINAL_PROMPT"] = "0";
        try
        {
            using var process = Process.Start(start);
            if (process is null)
            {
                return new GitOutput(-1, [], "git could not be started");
            }

            process.StandardInput.Close();
            var error = process.StandardError.ReadToEndAsync();
            using var buffer = new MemoryStream();
            process.StandardOutput.BaseStream.CopyTo(buffer);
            process.WaitForExit();
            return new GitOutput(process.ExitCode, buffer.ToArray(), error.GetAwaiter().GetResult().Trim());
        }
        catch (System.ComponentModel.Win32Exception e)
        {
            return new GitOutput(-1, [], $"git could not be started ({e.Message}); install git or put it on PATH");
        }
    }
}
