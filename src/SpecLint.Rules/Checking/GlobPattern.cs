namespace SpecLint.Rules.Checking;

/// <summary>
/// A file glob as written in <c>include</c>: <c>**</c> matches any number of folders, <c>*</c> any run of
/// characters within one name, <c>?</c> one character. Paths are matched with forward slashes, relative
/// to the folder that holds the configuration.
/// </summary>
/// <remarks>
/// Matched by stepping the set of live positions in the pattern through the path once, so the time is linear in
/// the path whatever the pattern (a glob of many <c>**/</c> segments cannot backtrack for minutes on a deep path
/// that almost matches), and no regular-expression engine is built at start-up.
/// </remarks>
internal sealed class GlobPattern
{
    private readonly Token[] _tokens;

    /// <summary>Compiles a glob.</summary>
    public GlobPattern(string pattern)
    {
        ArgumentNullException.ThrowIfNull(pattern);
        Pattern = pattern;
        _tokens = Parse(pattern.Replace('\\', '/').TrimStart('/'));
    }

    private enum Kind
    {
        /// <summary>One given character.</summary>
        Literal,

        /// <summary><c>?</c>: one character other than '/'.</summary>
        One,

        /// <summary><c>*</c>: any run of characters other than '/'.</summary>
        Name,

        /// <summary><c>**/</c>: zero or more whole folders ("name/").</summary>
        Folders,

        /// <summary><c>**</c> not followed by '/': anything.</summary>
        Anything,
    }

    /// <summary>The glob as written.</summary>
    public string Pattern { get; }

    /// <summary>Whether a relative path (either slash) matches.</summary>
    public bool IsMatch(string relativePath)
    {
        ArgumentNullException.ThrowIfNull(relativePath);

        // State 2k: at the start of token k. State 2k + 1: inside a folder name of a "**/" token k. State 2n: done.
        var n = _tokens.Length;
        var live = new bool[(2 * n) + 1];
        var next = new bool[(2 * n) + 1];
        Close(live, 0);
        foreach (var raw in relativePath)
        {
            var c = raw == '\\' ? '/' : raw;
            Array.Clear(next);
            var any = false;
            for (var k = 0; k < n; k++)
            {
                var t = _tokens[k];
                if (live[2 * k])
                {
                    switch (t.Kind)
                    {
                        case Kind.Literal when t.Char == c:
                        case Kind.One when c != '/':
                            any |= Close(next, 2 * (k + 1));
                            break;
                        case Kind.Name when c != '/':
                        case Kind.Anything:
                            any |= Close(next, 2 * k);
                            break;
                        case Kind.Folders when c != '/':
                            any |= Close(next, (2 * k) + 1);
                            break;
                    }
                }

                if (live[(2 * k) + 1])
                {
                    any |= Close(next, c == '/' ? 2 * k : (2 * k) + 1);
                }
            }

            if (!any)
            {
                return false;
            }

            (live, next) = (next, live);
        }

        return live[2 * n];
    }

    /// <summary>Marks <paramref name="state"/> live with every state reachable from it without reading a character.</summary>
    private bool Close(bool[] states, int state)
    {
        while (true)
        {
            states[state] = true;
            var k = state / 2;
            if (state % 2 == 1 || k == _tokens.Length || _tokens[k].Kind is Kind.Literal or Kind.One)
            {
                return true;
            }

            // '*', '**' and '**/' may match nothing: the next token starts here too.
            state = 2 * (k + 1);
        }
    }

    private static Token[] Parse(string glob)
    {
        var tokens = new List<Token>();
        for (var i = 0; i < glob.Length; i++)
        {
            var c = glob[i];
            if (c == '*' && i + 1 < glob.Length && glob[i + 1] == '*')
            {
                if (i + 2 < glob.Length && glob[i + 2] == '/')
                {
                    tokens.Add(new Token(Kind.Folders, '\0'));
                    i += 2;
                }
                else
                {
                    tokens.Add(new Token(Kind.Anything, '\0'));
                    i += 1;
                }
            }
            else
            {
                tokens.Add(c switch
                {
                    '*' => new Token(Kind.Name, '\0'),
                    '?' => new Token(Kind.One, '\0'),
                    _ => new Token(Kind.Literal, c),
                });
            }
        }

        return [.. tokens];
    }

    private readonly record struct Token(Kind Kind, char Char);
}
