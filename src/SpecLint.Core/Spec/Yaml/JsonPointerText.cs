using System.Text;

namespace SpecLint.Core.Spec.Yaml;

/// <summary>RFC 6901 JSON Pointer text helpers and the dotted key path messages show.</summary>
internal static class JsonPointerText
{
    /// <summary>Appends one reference token, escaping '~' and '/' as RFC 6901 requires.</summary>
    public static string Append(string pointer, string token)
    {
        ArgumentNullException.ThrowIfNull(token);
        return pointer + "/" + token.Replace("~", "~0", StringComparison.Ordinal).Replace("/", "~1", StringComparison.Ordinal);
    }

    /// <summary>Appends an array index.</summary>
    public static string Append(string pointer, int index) => pointer + "/" + index.ToString(System.Globalization.CultureInfo.InvariantCulture);

    /// <summary>The unescaped reference tokens of a pointer.</summary>
    public static IReadOnlyList<string> Split(string pointer)
    {
        ArgumentNullException.ThrowIfNull(pointer);
        if (pointer.Length == 0)
        {
            return [];
        }

        return pointer[1..].Split('/').Select(t => t.Replace("~1", "/", StringComparison.Ordinal).Replace("~0", "~", StringComparison.Ordinal)).ToArray();
    }

    /// <summary>The parent pointer ("" for a top-level key and for the root).</summary>
    public static string Parent(string pointer)
    {
        ArgumentNullException.ThrowIfNull(pointer);
        var slash = pointer.LastIndexOf('/');
        return slash <= 0 ? "" : pointer[..slash];
    }

    /// <summary>
    /// The key path people read: <c>/feedback/capacitance</c> → <c>feedback.capacitance</c>,
    /// <c>/waivers/0/rule</c> → <c>waivers[0].rule</c>, the root → <c>(file)</c>.
    /// </summary>
    public static string ToKeyPath(string pointer)
    {
        var tokens = Split(pointer);
        if (tokens.Count == 0)
        {
            return "(file)";
        }

        var sb = new StringBuilder();
        foreach (var t in tokens)
        {
            if (t.Length > 0 && t.All(char.IsAsciiDigit) && sb.Length > 0)
            {
                sb.Append('[').Append(t).Append(']');
            }
            else
            {
                if (sb.Length > 0)
                {
                    sb.Append('.');
                }

                sb.Append(t);
            }
        }

        return sb.ToString();
    }
}
