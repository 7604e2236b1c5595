namespace SpecLint.Rules.Checking;

/// <summary>Did-you-mean suggestions by edit distance.</summary>
public static class Suggest
{
    /// <summary>The closest candidate within a third of the word's length (at least 2 edits), or null.</summary>
    public static string? Closest(string word, IEnumerable<string> candidates)
    {
        ArgumentNullException.ThrowIfNull(word);
        var best = candidates.Select(c => (c, d: Distance(c, word))).OrderBy(x => x.d).ThenBy(x => x.c, StringComparer.Ordinal).FirstOrDefault();
        return best.c is not null && best.d <= Math.Max(2, word.Length / 3) ? best.c : null;
    }

    /// <summary>Levenshtein distance.</summary>
    public static int Distance(string a, string b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        var prev = new int[b.Length + 1];
        var cur = new int[b.Length + 1];
        for (var j = 0; j <= b.Length; j++)
        {
            prev[j] = j;
        }

        for (var i = 1; i <= a.Length; i++)
        {
            cur[0] = i;
            for (var j = 1; j <= b.Length; j++)
            {
                cur[j] = Math.Min(Math.Min(prev[j] + 1, cur[j - 1] + 1), prev[j - 1] + (a[i - 1] == b[j - 1] ? 0 : 1));
            }

            (prev, cur) = (cur, prev);
        }

        return prev[b.Length];
    }
}
