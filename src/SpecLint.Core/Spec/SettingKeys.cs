using System.Text.RegularExpressions;

namespace SpecLint.Core.Spec;

/// <summary>
/// The keys of one entry of <c>feedback.settings</c> mirror the channel's own: <c>resistance</c> is
/// <c>/feedback/resistance</c>, <c>input/current/min</c> is <c>/input/current/min</c>, <c>requirements/…</c> is
/// <c>/requirements/…</c>. Limits, examples and checks are looked up under the channel key.
/// </summary>
internal static partial class SettingKeys
{
    [GeneratedRegex(@"^/feedback/settings/\d+(?<rest>/.*)?$", RegexOptions.CultureInvariant)]
    private static partial Regex SettingEntryRegex();

    /// <summary>The channel key a setting's key mirrors; other pointers unchanged.</summary>
    public static string ChannelPointer(string pointer)
    {
        var m = SettingEntryRegex().Match(pointer);
        if (!m.Success)
        {
            return pointer;
        }

        var rest = m.Groups["rest"].Value;
        return rest.StartsWith("/input/", StringComparison.Ordinal) || rest.StartsWith("/requirements", StringComparison.Ordinal)
            ? rest
            : "/feedback" + rest;
    }
}
