namespace SpecLint.Core.Units;

/// <summary>The IEC 60062 tolerance letters SpecLint knows (references.md §3.5, from memory).</summary>
public static class ToleranceLetterCodes
{
    private static readonly ToleranceLetterCode[] Codes =
    [
        new('W', 0.05, 0.05, null),
        new('B', 0.1, 0.1, 0.1e-12),
        new('C', 0.25, 0.25, 0.25e-12),
        new('D', 0.5, 0.5, 0.5e-12),
        new('F', 1, 1, 1e-12),
        new('G', 2, 2, 2e-12),
        new('J', 5, 5, null),
        new('K', 10, 10, null),
        new('M', 20, 20, null),
        new('N', 30, 30, null),
        new('Z', 20, 80, null),
    ];

    /// <summary>The letters, for messages.</summary>
    public static string KnownLetters => string.Join(' ', Codes.Select(c => c.Letter));

    /// <summary>The code for a letter, or null.</summary>
    public static ToleranceLetterCode? Find(char letter) => Array.Find(Codes, c => c.Letter == letter);
}
