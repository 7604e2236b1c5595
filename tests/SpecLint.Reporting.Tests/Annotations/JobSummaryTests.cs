using System.Text;
using SpecLint.Reporting.Annotations;

namespace SpecLint.Reporting.Tests.Annotations;

public sealed class JobSummaryTests : IDisposable
{
    private static readonly UTF8Encoding Strict = new(false, throwOnInvalidBytes: true);
    private readonly string _path = Path.Combine(Path.GetTempPath(), "speclint-summary-" + Guid.NewGuid().ToString("N") + ".md");

    public void Dispose() => File.Delete(_path);

    [Fact]
    public void Markdown_is_appended_as_utf8_without_a_byte_order_mark()
    {
        var summary = new JobSummary(_path);

        summary.Append("# Run 1\n");
        var result = summary.Append("| PM | 58° |");

        var bytes = File.ReadAllBytes(_path);
        Assert.False(result.Truncated);
        Assert.NotEqual(0xEF, bytes[0]);
        Assert.Equal("# Run 1\n| PM | 58° |\n", Strict.GetString(bytes));
    }

    [Fact]
    public void Outside_github_actions_there_is_no_summary()
    {
        Assert.Null(JobSummary.FromEnvironment(_ => null));
        Assert.Equal("/tmp/s.md", JobSummary.FromEnvironment(name => name == "GITHUB_STEP_SUMMARY" ? "/tmp/s.md" : null)!.Path);
    }

    [Fact]
    public void An_oversized_summary_is_cut_at_a_line_under_one_mebibyte_with_a_note()
    {
        File.WriteAllText(_path, new string('x', 1000) + "\n");
        var big = string.Concat(Enumerable.Range(0, 40_000).Select(i => $"| row {i} | 1 MΩ | 10 nV/√Hz |\n"));

        var result = new JobSummary(_path).Append(big);

        var text = Strict.GetString(File.ReadAllBytes(_path));
        Assert.True(result.Truncated);
        Assert.InRange(new FileInfo(_path).Length, JobSummary.MaxBytesPerStep - 200, JobSummary.MaxBytesPerStep);
        Assert.Contains("summary cut short", text, StringComparison.Ordinal);
        var beforeNote = text[..text.IndexOf("\n> **SpecLint", StringComparison.Ordinal)];
        Assert.EndsWith(" |\n", beforeNote, StringComparison.Ordinal);
    }

    [Fact]
    public void A_cut_inside_a_code_fence_closes_the_fence()
    {
        var big = "```text\n" + string.Concat(Enumerable.Repeat("µµµµµµµµµµ\n", 120_000));

        new JobSummary(_path).Append(big);

        var text = Strict.GetString(File.ReadAllBytes(_path));
        Assert.True(new FileInfo(_path).Length <= JobSummary.MaxBytesPerStep);
        Assert.Equal(2, text.Split('\n').Count(l => l.StartsWith("```", StringComparison.Ordinal)));
    }

    [Fact]
    public void A_single_huge_line_is_cut_between_characters()
    {
        var big = new string('Ω', 700_000);

        new JobSummary(_path).Append(big);

        var text = Strict.GetString(File.ReadAllBytes(_path));
        Assert.StartsWith("ΩΩΩ", text, StringComparison.Ordinal);
        Assert.True(new FileInfo(_path).Length <= JobSummary.MaxBytesPerStep);
    }

    [Fact]
    public void A_full_file_gets_nothing_more()
    {
        File.WriteAllBytes(_path, new byte[JobSummary.MaxBytesPerStep]);

        var result = new JobSummary(_path).Append("more");

        Assert.Equal(0, result.BytesWritten);
        Assert.Equal(JobSummary.MaxBytesPerStep, new FileInfo(_path).Length);
    }
}
