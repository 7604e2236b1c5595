namespace SpecLint.HouseRules.Tests;

/// <summary>Source text with one <c>[|…|]</c> span: the text without the marks and the 1-based line and column where the span starts.</summary>
internal readonly record struct Marked(string Text, int Line, int Column)
{
    public static Marked Parse(string marked)
    {
        var start = marked.IndexOf("[|", StringComparison.Ordinal);
        Assert.True(start >= 0, "the source has no [| mark");
        var text = marked.Remove(start, 2);
        var end = text.IndexOf("|]", StringComparison.Ordinal);
        text = text.Remove(end, 2);
        var before = text[..start];
        var line = before.Count(c => c == '\n') + 1;
        var column = start - (before.LastIndexOf('\n') + 1) + 1;
        return new Marked(text, line, column);
    }
}
