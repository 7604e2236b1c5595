using System.Globalization;
using System.Text.RegularExpressions;
using SpecLint.Core.Spec;

namespace SpecLint.Core.Tests.Spec;

/// <summary>
/// One file per broken spec under Spec/Malformed; its first lines say what must be reported
/// (<c># expect: line:col key.path: message fragment</c>). Adding a case is adding a file.
/// </summary>
public sealed partial class MalformedCorpusTests
{
    [GeneratedRegex(@"^# expect: (?<line>\d+):(?<col>\d+) (?<text>.+)$", RegexOptions.CultureInvariant)]
    private static partial Regex ExpectRegex();

    public static TheoryData<string> Cases()
    {
        var data = new TheoryData<string>();
        foreach (var f in Directory.GetFiles(TestPaths.Output("Spec", "Malformed"), "*.yaml").Order(StringComparer.Ordinal))
        {
            data.Add(Path.GetFileName(f));
        }

        return data;
    }

    [Fact]
    public void Corpus_has_at_least_forty_cases()
    {
        Assert.True(Cases().Count >= 40, $"only {Cases().Count} malformed cases");
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void Reports_exactly_the_expected_problem(string file)
    {
        var path = TestPaths.Output("Spec", "Malformed", file);
        var expectations = File.ReadLines(path)
            .TakeWhile(l => l.StartsWith("# expect:", StringComparison.Ordinal))
            .Select(l => ExpectRegex().Match(l))
            .ToList();
        Assert.NotEmpty(expectations);
        Assert.All(expectations, m => Assert.True(m.Success, "malformed # expect line"));

        var result = SpecLoader.LoadFile(path, file);

        Assert.False(result.IsValid);
        Assert.Null(result.Spec);
        var shown = string.Join(Environment.NewLine, result.Diagnostics);
        Assert.True(expectations.Count == result.Diagnostics.Length, $"expected {expectations.Count} problem(s), got:{Environment.NewLine}{shown}");
        foreach (var m in expectations)
        {
            var line = int.Parse(m.Groups["line"].Value, CultureInfo.InvariantCulture);
            var col = int.Parse(m.Groups["col"].Value, CultureInfo.InvariantCulture);
            var text = m.Groups["text"].Value;
            Assert.True(
                result.Diagnostics.Any(d => d.Line == line && d.Column == col && $"{d.KeyPath}: {d.Message}".Contains(text, StringComparison.Ordinal)),
                $"no problem at {line}:{col} containing \"{text}\"; got:{Environment.NewLine}{shown}");
        }

        Assert.All(result.Diagnostics, d => Assert.Equal("spec-invalid", d.RuleId));
    }
}
