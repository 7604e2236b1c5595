using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Changes;

/// <summary>
/// A finding's identity across versions of a spec: rule, spec name and the JSON Pointer of the key it is about.
/// Never the line or the message, so moving lines or a changed figure does not make a finding new.
/// </summary>
/// <param name="Rule">The rule id.</param>
/// <param name="Spec">The spec's name.</param>
/// <param name="Pointer">The key's JSON Pointer ("" for the whole spec).</param>
/// <param name="Setting">The gain setting, or null for a single-gain spec and for findings every setting shares.</param>
internal sealed partial record FindingKey(string Rule, string Spec, string Pointer, string? Setting = null)
{
    // An adjustable Rf's position is named "Rf 3.39 kΩ (lowest phase margin)": the value moves with any change to the
    // design, so only what the position is (the part in brackets) belongs to the identity.
    [System.Text.RegularExpressions.GeneratedRegex(@"^Rf .+ \((?<why>[^()]+)\)$", System.Text.RegularExpressions.RegexOptions.CultureInvariant)]
    private static partial System.Text.RegularExpressions.Regex PositionRegex();

    /// <summary>The identity of <paramref name="finding"/> in the spec named <paramref name="specName"/>.</summary>
    public static FindingKey Of(string specName, Finding finding)
    {
        ArgumentNullException.ThrowIfNull(finding);
        return new FindingKey(finding.RuleId, specName, finding.Pointer, SettingIdentity(finding.Setting));
    }

    /// <summary>The part of a setting's name that stays when the design changes.</summary>
    public static string? SettingIdentity(string? setting) =>
        setting is not null && PositionRegex().Match(setting) is { Success: true } m ? m.Groups["why"].Value : setting;

    /// <summary>Ordinal order: spec, rule, pointer.</summary>
    public static int Compare(FindingKey a, FindingKey b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        var c = string.CompareOrdinal(a.Spec, b.Spec);
        c = c != 0 ? c : string.CompareOrdinal(a.Rule, b.Rule);
        c = c != 0 ? c : string.CompareOrdinal(a.Pointer, b.Pointer);
        return c != 0 ? c : string.CompareOrdinal(a.Setting, b.Setting);
    }
}
