using System.Diagnostics;
using System.Reflection;
using System.Text;

namespace SpecLint.HouseRules.Guarding;

/// <summary>Turns an exception thrown by a house rule into words and a source line.</summary>
internal static class RuleFailure
{
    /// <summary>The innermost frame in the house-rule assembly that has a line, as (relative path, line, column), or null.</summary>
    public static (string Path, int Line, int Column)? Locate(Exception e, Assembly rules)
    {
        foreach (var ex in Chain(e))
        {
            foreach (var frame in new StackTrace(ex, fNeedFileInfo: true).GetFrames())
            {
                // The budget's own frames are SpecLint's instrumentation, not the author's code.
                if (frame.GetMethod()?.Module.Assembly == rules && frame.GetFileName() is { Length: > 0 } file && frame.GetFileLineNumber() > 0
                    && !file.EndsWith(Compiling.BudgetRuntime.FileName, StringComparison.Ordinal))
                {
                    return (file.Replace('\\', '/'), frame.GetFileLineNumber(), Math.Max(1, frame.GetFileColumnNumber()));
                }
            }
        }

        return null;
    }

    /// <summary>"InvalidOperationException: the message", control characters shown as escapes and the length capped.</summary>
    public static string Describe(Exception e)
    {
        var inner = e is TargetInvocationException { InnerException: { } i } ? i : e;
        return inner.GetType().Name + ": " + Clean(inner.Message, 300);
    }

    /// <summary>A one-line form of text a rule produced: control characters escaped, length capped.</summary>
    public static string Clean(string text, int max)
    {
        var sb = new StringBuilder();
        foreach (var c in text)
        {
            if (sb.Length >= max)
            {
                sb.Append('…');
                break;
            }

            sb.Append(char.IsControl(c) || c is '\u2028' or '\u2029' ? $"\\u{(int)c:x4}" : c.ToString());
        }

        return sb.ToString();
    }

    private static IEnumerable<Exception> Chain(Exception e)
    {
        // The innermost exception holds the frame of the throw.
        var list = new List<Exception>();
        for (var x = e; x is not null; x = x.InnerException)
        {
            list.Add(x);
        }

        list.Reverse();
        return list;
    }
}
