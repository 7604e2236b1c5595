using System.Collections.Immutable;
using System.Globalization;

namespace SpecLint.Analyzers;

/// <summary>
/// The analyzers work out each fix as replacement text for one span (the diagnostic's location, or its
/// first additional location) and pass it in the diagnostic's properties, so one code fix provider
/// applies them all and the analyzer assembly needs no Workspaces reference.
/// </summary>
public static class Fixes
{
    /// <summary>Property key of the i-th replacement text.</summary>
    public static string TextKey(int i) => "fix" + i.ToString(CultureInfo.InvariantCulture);

    /// <summary>Property key of the i-th code action title.</summary>
    public static string TitleKey(int i) => "title" + i.ToString(CultureInfo.InvariantCulture);

    internal static ImmutableDictionary<string, string?> Of(params (string Title, string Text)[] fixes)
    {
        var b = ImmutableDictionary.CreateBuilder<string, string?>();
        for (var i = 0; i < fixes.Length; i++)
        {
            b[TextKey(i)] = fixes[i].Text;
            b[TitleKey(i)] = fixes[i].Title;
        }

        return b.ToImmutable();
    }
}
