using CsCheck;
using SpecLint.Reporting.Annotations;
using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Tests.Annotations;

public sealed class GitHubAnnotationsTests
{
    private static Finding At(string rule, Severity severity, int line, string message = "phase margin 31° is below the floor of 45°", string file = "hw/rx/ch2.tia.yaml") =>
        new(rule, severity, file, "/feedback/capacitance", line, 15, message);

    [Fact]
    public void An_error_becomes_one_error_command_with_file_line_column_and_title()
    {
        Assert.Equal(
            "::error file=hw/rx/ch2.tia.yaml,line=31,col=15,title=SpecLint phase-margin::phase margin 31° is below the floor of 45°",
            GitHubAnnotations.Format(At("phase-margin", Severity.Error, 31)));
    }

    [Theory]
    [InlineData(Severity.Warning, "::warning ")]
    [InlineData(Severity.Note, "::notice ")]
    public void Warnings_and_notes_use_their_own_commands(Severity severity, string prefix) =>
        Assert.StartsWith(prefix, GitHubAnnotations.Format(At("peaking", severity, 3)), StringComparison.Ordinal);

    [Fact]
    public void The_message_escapes_percent_and_line_ends_so_it_cannot_inject_a_command()
    {
        var line = GitHubAnnotations.Format(At("x", Severity.Error, 1, "100% sure\r\n::error file=evil::pwned\nnext, a: b"))!;

        // Line breaks in a finding are already visible escapes (issue 14), so the command stays on one line.
        Assert.EndsWith("::100%25 sure\\r\\n::error file=evil::pwned\\nnext, a: b", line, StringComparison.Ordinal);
        Assert.DoesNotContain('\n', line);
        Assert.DoesNotContain('\r', line);
    }

    [Fact]
    public void Properties_also_escape_colons_and_commas()
    {
        var line = GitHubAnnotations.Format(At("odd,rule:id", Severity.Error, 1, file: "C:\\specs\\a,b%c.tia.yaml"))!;

        Assert.Contains("file=C%3A/specs/a%2Cb%25c.tia.yaml,line=1", line, StringComparison.Ordinal);
        Assert.Contains("title=SpecLint odd%2Crule%3Aid::", line, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("", "")]
    [InlineData("%", "%25")]
    [InlineData("%0A", "%250A")]
    [InlineData("a\rb\nc", "a%0Db%0Ac")]
    [InlineData("∠T −180° 10 nV/√Hz", "∠T −180° 10 nV/√Hz")]
    public void Data_escaping_matches_the_toolkit(string raw, string escaped) => Assert.Equal(escaped, GitHubAnnotations.EscapeData(raw));

    [Fact]
    public void Escaping_any_text_round_trips_and_leaves_no_separators()
    {
        Gen.String.Sample(s =>
        {
            var data = GitHubAnnotations.EscapeData(s);
            var property = GitHubAnnotations.EscapeProperty(s);
            return Unescape(data) == s && Unescape(property) == s
                && !data.Contains('\n', StringComparison.Ordinal) && !data.Contains('\r', StringComparison.Ordinal)
                && !property.Contains(':', StringComparison.Ordinal) && !property.Contains(',', StringComparison.Ordinal);
        });
    }

    [Fact]
    public void Waived_findings_are_not_annotated_but_counted()
    {
        var writer = new StringWriter();
        var counts = GitHubAnnotations.Write(writer, [At("peaking", Severity.Warning, 4) with { Waived = true, WaiverReason = "prototype" }, At("phase-margin", Severity.Error, 3)]);

        Assert.Equal(new AnnotationCounts(1, 0, 0, 1), counts);
        Assert.Single(writer.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.Null(GitHubAnnotations.Format(At("peaking", Severity.Warning, 4) with { Waived = true }));
    }

    [Fact]
    public void All_lines_are_printed_errors_first_and_a_note_follows_past_the_limit()
    {
        var findings = Enumerable.Range(1, 12).Select(i => At("peaking", Severity.Warning, i))
            .Concat(Enumerable.Range(1, 11).Select(i => At("phase-margin", Severity.Error, 40 - i)))
            .Append(At("standard-values", Severity.Note, 1))
            .ToList();
        var writer = new StringWriter();

        var counts = GitHubAnnotations.Write(writer, findings);

        var lines = writer.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.True(counts.OverGitHubLimit);
        Assert.Equal(25, lines.Length);
        Assert.All(lines.Take(11), l => Assert.StartsWith("::error ", l, StringComparison.Ordinal));
        Assert.Contains("line=29,", lines[0], StringComparison.Ordinal);
        Assert.All(lines.Skip(11).Take(12), l => Assert.StartsWith("::warning ", l, StringComparison.Ordinal));
        Assert.StartsWith("::notice ", lines[23], StringComparison.Ordinal);
        Assert.StartsWith("SpecLint: 11 errors and 12 warnings annotated", lines[24], StringComparison.Ordinal);
    }

    [Fact]
    public void Absolute_paths_inside_the_repository_are_made_relative()
    {
        var root = Path.Combine(Path.GetTempPath(), "repo");
        var line = GitHubAnnotations.Format(At("x", Severity.Error, 1, file: Path.Combine(root, "hw", "a.tia.yaml")), root)!;

        Assert.Contains("file=hw/a.tia.yaml,", line, StringComparison.Ordinal);
    }

    [Fact]
    public void A_suggested_fix_is_named_in_the_message()
    {
        var line = GitHubAnnotations.Format(At("phase-margin", Severity.Error, 1) with { Fix = new FixSuggestion("/feedback/capacitance", "3.3 pF") })!;

        Assert.EndsWith("(suggested: /feedback/capacitance = 3.3 pF)", line, StringComparison.Ordinal);
    }

    private static string Unescape(string s) => s
        .Replace("%2C", ",", StringComparison.Ordinal).Replace("%3A", ":", StringComparison.Ordinal)
        .Replace("%0A", "\n", StringComparison.Ordinal).Replace("%0D", "\r", StringComparison.Ordinal)
        .Replace("%25", "%", StringComparison.Ordinal);
}
