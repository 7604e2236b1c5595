using System.Text;

namespace SpecLint.Core.Spec.Schema.Quick;

/// <summary>
/// Text lengths the quick check is sure of. JSON Schema counts characters, and libraries count them as code
/// points or as text elements; both are at most the UTF-16 length and at least 1 for a non-empty string, and for
/// ASCII text all counts agree. Outside that, the answer is "not sure".
/// </summary>
internal static class QuickText
{
    public static bool CertainlyAtMost(string text, int max) => text.Length <= max;

    public static bool CertainlyAtLeast(string text, int min) =>
        min <= 0 || (min == 1 && text.Length > 0) || (Ascii.IsValid(text) && text.Length >= min);
}
