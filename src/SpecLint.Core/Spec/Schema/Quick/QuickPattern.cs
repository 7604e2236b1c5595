using System.Text.RegularExpressions;

namespace SpecLint.Core.Spec.Schema.Quick;

/// <summary>
/// A schema pattern for the quick check. Regular-expression dialects disagree on what <c>\s</c>, <c>\d</c> and
/// <c>\w</c> match outside ASCII, so text with such a character, where the pattern uses the class, is not judged
/// (with <c>\w</c> or <c>\b</c>, no text outside ASCII is).
/// </summary>
internal sealed class QuickPattern
{
    private readonly Regex _regex;
    private readonly bool _space;
    private readonly bool _digit;
    private readonly bool _word;

    public QuickPattern(string pattern)
    {
        _regex = new Regex(pattern, RegexOptions.CultureInvariant);
        _space = pattern.Contains("\\s", StringComparison.Ordinal) || pattern.Contains("\\S", StringComparison.Ordinal);
        _digit = pattern.Contains("\\d", StringComparison.Ordinal) || pattern.Contains("\\D", StringComparison.Ordinal);
        _word = pattern.Contains("\\w", StringComparison.Ordinal) || pattern.Contains("\\W", StringComparison.Ordinal)
            || pattern.Contains("\\b", StringComparison.Ordinal) || pattern.Contains("\\B", StringComparison.Ordinal);
    }

    public bool CertainlyMatches(string text)
    {
        foreach (var c in text)
        {
            if (c > 0x7F && (_word || (_space && char.IsWhiteSpace(c)) || (_digit && char.IsDigit(c))))
            {
                return false;
            }
        }

        return _regex.IsMatch(text);
    }
}
