namespace SpecLint.Cli;

/// <summary>Progress on stderr for long runs: only on a terminal, never in CI or with --quiet.</summary>
internal static class Progress
{
    public static Action<int, int, string>? For(TextWriter error, bool quiet)
    {
        var ci = !string.IsNullOrEmpty(Environment.GetEnvironmentVariable("CI")) || !string.IsNullOrEmpty(Environment.GetEnvironmentVariable("GITHUB_ACTIONS"));
        if (quiet || ci || Console.IsErrorRedirected || !ReferenceEquals(error, Console.Error))
        {
            return null;
        }

        return (i, n, file) =>
        {
            if (n < 5)
            {
                return;
            }

            error.Write($"\rchecking {i}/{n} {Path.GetFileName(file)}".PadRight(72));
            if (i == n)
            {
                error.Write("\r" + new string(' ', 72) + "\r");
            }
        };
    }
}
