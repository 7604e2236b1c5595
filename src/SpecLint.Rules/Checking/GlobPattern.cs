using System.Text;
using System.Text.RegularExpressions;

namespace SpecLint.Rules.Checking;

/// <summary>
/// A file glob as written in <c>include</c>: <c>**</c> matches any number of folders, <c>*</c> any run of
/// characters within one name, <c>?</c> one character. Paths are matched with forward slashes, relative
/// to the folder that holds the configuration.
/// </summary>
internal sealed class GlobPattern
{
    private readonly Regex _regex;

    /// <summary>Compiles a glob.</summary>
    public GlobPattern(string pattern)
    {
        ArgumentNullException.ThrowIfNull(pattern);
        Pattern = pattern;
        // The non-backtracking engine matches in time linear in the path, whatever the pattern: a glob of many
        // "**/" segments would otherwise backtrack for minutes on a deep path that almost matches.
        _regex = new Regex("^" + Translate(pattern.Replace('\\', '/').TrimStart('/')) + "$", RegexOptions.CultureInvariant | RegexOptions.NonBacktracking);
    }

    /// <summary>The glob as written.</summary>
    public string Pattern { get; }

    /// <summary>Whether a relative path (either slash) matches.</summary>
    public bool IsMatch(string relativePath) => _regex.IsMatch(relativePath.Replace('\\', '/'));

    private static string Translate(string glob)
    {
        var sb = new StringBuilder();
        for (var i = 0; i < glob.Length; i++)
        {
            var c = glob[i];
            if (c == '*' && i + 1 < glob.Length && glob[i + 1] == '*')
            {
                // "**/" matches zero or more whole folders; a trailing "**" matches anything.
                if (i + 2 < glob.Length && glob[i + 2] == '/')
                {
                    sb.Append("(?:[^/]+/)*");
                    i += 2;
                }
                else
                {
                    sb.Append(".*");
                    i += 1;
                }
            }
            else if (c == '*')
            {
                sb.Append("[^/]*");
            }
            else if (c == '?')
            {
                sb.Append("[^/]");
            }
            else
            {
                sb.Append(Regex.Escape(c.ToString()));
            }
        }

        return sb.ToString();
    }
}
