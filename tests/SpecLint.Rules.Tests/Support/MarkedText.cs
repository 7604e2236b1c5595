namespace SpecLint.Rules.Tests.Support;

/// <summary>
/// Text with <c>[|…|]</c> markers around the spans a finding must point at. The markers are stripped; each
/// marker's position is the 1-based (line, column) of the first character inside it, which is where
/// <c>RuleContext.Report</c> puts a finding: the first character of a scalar value, or, for a block map such
/// as <c>feedback:</c>, the first character of its key.
/// </summary>
/// <param name="Text">The text without markers.</param>
/// <param name="Marks">Marker positions in order of appearance.</param>
internal sealed record MarkedText(string Text, IReadOnlyList<(int Line, int Column)> Marks)
{
    public const string Open = "[|";
    public const string Close = "|]";

    public static MarkedText Parse(string marked)
    {
        ArgumentNullException.ThrowIfNull(marked);
        var text = new System.Text.StringBuilder();
        var marks = new List<(int, int)>();
        int line = 1, column = 1;
        var open = false;
        for (var i = 0; i < marked.Length; i++)
        {
            if (string.CompareOrdinal(marked, i, Open, 0, 2) == 0)
            {
                Assert.False(open, "nested [| markers");
                marks.Add((line, column));
                open = true;
                i++;
                continue;
            }

            if (open && string.CompareOrdinal(marked, i, Close, 0, 2) == 0)
            {
                open = false;
                i++;
                continue;
            }

            var c = marked[i];
            text.Append(c);
            if (c == '\n')
            {
                line++;
                column = 1;
            }
            else
            {
                column++;
            }
        }

        Assert.False(open, "a [| marker is not closed");
        return new MarkedText(text.ToString(), marks);
    }

    /// <summary>The single marker; fails when there is not exactly one.</summary>
    public (int Line, int Column) Mark => Assert.Single(Marks);
}
