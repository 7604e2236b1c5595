using System.Globalization;
using System.Text;

namespace SpecLint.Reporting.Annotations;

/// <summary>
/// Appends Markdown to the job summary file GitHub Actions names in <c>$GITHUB_STEP_SUMMARY</c>. GitHub rejects a
/// step summary over 1 MiB (the upload fails with an error annotation), so an oversized summary is cut at a line
/// boundary, an open code fence is closed, and a note says what was left out.
/// </summary>
internal sealed class JobSummary
{
    /// <summary>GitHub's limit for one step's summary file.</summary>
    public const long MaxBytesPerStep = 1024 * 1024;

    /// <summary>The environment variable GitHub Actions sets to the summary file.</summary>
    public const string EnvironmentVariable = "GITHUB_STEP_SUMMARY";

    private static readonly UTF8Encoding Utf8 = new(encoderShouldEmitUTF8Identifier: false);

    /// <summary>A summary written to <paramref name="path"/>.</summary>
    public JobSummary(string path)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        Path = path;
    }

    /// <summary>The summary file.</summary>
    public string Path { get; }

    /// <summary>The summary of the current Actions step, or null when not running in GitHub Actions.</summary>
    public static JobSummary? FromEnvironment(Func<string, string?>? getVariable = null)
    {
        var path = (getVariable ?? Environment.GetEnvironmentVariable)(EnvironmentVariable);
        return string.IsNullOrWhiteSpace(path) ? null : new JobSummary(path);
    }

    /// <summary>Appends <paramref name="markdown"/> (UTF-8), cutting it politely if the file would pass 1 MiB.</summary>
    public JobSummaryAppend Append(string markdown)
    {
        ArgumentNullException.ThrowIfNull(markdown);
        var text = markdown.Replace("\r\n", "\n", StringComparison.Ordinal);
        if (!text.EndsWith('\n'))
        {
            text += "\n";
        }

        var existing = File.Exists(Path) ? new FileInfo(Path).Length : 0;
        var budget = MaxBytesPerStep - existing;
        var bytes = Utf8.GetBytes(text);
        if (bytes.Length <= budget)
        {
            AppendBytes(bytes);
            return new JobSummaryAppend(bytes.Length, false);
        }

        // Reserve room for the note with the largest numbers it can contain, then cut at the last line end.
        var reserve = Utf8.GetByteCount(Note(bytes.Length, bytes.Length)) + Utf8.GetByteCount("```\n");
        var room = budget - reserve;
        if (room <= 0)
        {
            var noteOnly = Utf8.GetBytes(Note(0, bytes.Length));
            if (noteOnly.Length > budget)
            {
                return new JobSummaryAppend(0, true);
            }

            AppendBytes(noteOnly);
            return new JobSummaryAppend(noteOnly.Length, true);
        }

        var cut = CutPoint(bytes, (int)Math.Min(room, bytes.Length));
        var kept = Utf8.GetString(bytes, 0, cut);
        if (cut > 0 && !kept.EndsWith('\n'))
        {
            kept += "\n";
        }

        if (OpenFence(kept))
        {
            kept += "```\n";
        }

        var output = Utf8.GetBytes(kept + Note(cut, bytes.Length));
        AppendBytes(output);
        return new JobSummaryAppend(output.Length, true);
    }

    private static string Note(long shown, long total) => string.Create(
        CultureInfo.InvariantCulture,
        $"\n> **SpecLint: summary cut short.** GitHub accepts 1 MiB of summary per step; {shown} of {total} bytes are shown. The full report is in the step's log and the uploaded report.\n");

    /// <summary>The largest cut ≤ <paramref name="limit"/> that ends a line, or at least ends a whole UTF-8 character.</summary>
    private static int CutPoint(byte[] bytes, int limit)
    {
        var newline = Array.LastIndexOf(bytes, (byte)'\n', Math.Max(0, limit - 1));
        if (newline >= 0 && limit > 0)
        {
            return newline + 1;
        }

        var cut = limit;
        // Step back over UTF-8 continuation bytes (10xxxxxx) so no character is split.
        while (cut > 0 && cut < bytes.Length && (bytes[cut] & 0xC0) == 0x80)
        {
            cut--;
        }

        return cut;
    }

    private static bool OpenFence(string text)
    {
        var open = false;
        foreach (var line in text.Split('\n'))
        {
            if (line.TrimStart().StartsWith("```", StringComparison.Ordinal))
            {
                open = !open;
            }
        }

        return open;
    }

    private void AppendBytes(byte[] bytes)
    {
        using var stream = new FileStream(Path, FileMode.Append, FileAccess.Write, FileShare.Read);
        stream.Write(bytes);
    }
}
