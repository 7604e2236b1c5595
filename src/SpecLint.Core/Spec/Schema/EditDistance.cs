namespace SpecLint.Core.Spec.Schema;

/// <summary>Levenshtein distance, for did-you-mean hints on misspelt keys and values.</summary>
internal static class EditDistance
{
    /// <summary>The number of single-character edits that turn <paramref name="a"/> into <paramref name="b"/>.</summary>
    public static int Between(string a, string b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        var previous = new int[b.Length + 1];
        var current = new int[b.Length + 1];
        for (var j = 0; j <= b.Length; j++)
        {
            previous[j] = j;
        }

        for (var i = 1; i <= a.Length; i++)
        {
            current[0] = i;
            for (var j = 1; j <= b.Length; j++)
            {
                var cost = a[i - 1] == b[j - 1] ? 0 : 1;
                current[j] = Math.Min(Math.Min(current[j - 1] + 1, previous[j] + 1), previous[j - 1] + cost);
            }

            (previous, current) = (current, previous);
        }

        return previous[b.Length];
    }

    /// <summary>
    /// The candidate closest to <paramref name="text"/> when it is close enough to be a slip (at most a third of
    /// the word, and at least 2 edits allowed), compared without regard to case; otherwise null.
    /// </summary>
    public static string? Closest(string text, IEnumerable<string> candidates)
    {
        ArgumentNullException.ThrowIfNull(text);
        string? best = null;
        var bestDistance = int.MaxValue;
        foreach (var c in candidates)
        {
            var d = Between(text.ToLowerInvariant(), c.ToLowerInvariant());
            if (d < bestDistance)
            {
                best = c;
                bestDistance = d;
            }
        }

        return best is not null && bestDistance <= Math.Max(2, text.Length / 3) ? best : null;
    }
}
