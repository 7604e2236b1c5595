using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Changes;

/// <summary>
/// A finding's identity across versions of a spec: rule, spec name and the JSON Pointer of the key it is about.
/// Never the line or the message, so moving lines or a changed figure does not make a finding new.
/// </summary>
/// <param name="Rule">The rule id.</param>
/// <param name="Spec">The spec's name.</param>
/// <param name="Pointer">The key's JSON Pointer ("" for the whole spec).</param>
internal sealed record FindingKey(string Rule, string Spec, string Pointer)
{
    /// <summary>The identity of <paramref name="finding"/> in the spec named <paramref name="specName"/>.</summary>
    public static FindingKey Of(string specName, Finding finding)
    {
        ArgumentNullException.ThrowIfNull(finding);
        return new FindingKey(finding.RuleId, specName, finding.Pointer);
    }

    /// <summary>Ordinal order: spec, rule, pointer.</summary>
    public static int Compare(FindingKey a, FindingKey b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        var c = string.CompareOrdinal(a.Spec, b.Spec);
        c = c != 0 ? c : string.CompareOrdinal(a.Rule, b.Rule);
        return c != 0 ? c : string.CompareOrdinal(a.Pointer, b.Pointer);
    }
}
