using System.Globalization;
using SpecLint.Core.Spec.Model;

namespace SpecLint.Rules.Engine;

/// <summary>
/// Applies a spec's waivers to its findings. A live waiver marks the findings of its rule as waived; an
/// expired one is itself an error and waives nothing (so the gate closes again on the expiry day); a live
/// waiver that matches nothing is a warning, because it would silently hide the next regression.
/// </summary>
internal static class WaiverApplication
{
    /// <summary>Returns the findings with waivers applied, plus findings about the waivers themselves.</summary>
    public static IReadOnlyList<Finding> Apply(TiaSpec spec, IReadOnlyList<Finding> findings, DateOnly today, IEnumerable<string> knownIds)
    {
        ArgumentNullException.ThrowIfNull(spec);
        var result = findings.ToList();
        var known = knownIds.ToHashSet(StringComparer.Ordinal);
        foreach (var waiver in spec.Waivers)
        {
            if (waiver.Expires < today)
            {
                var at = spec.Locations.Locate(waiver.Pointer + "/expires");
                result.Add(new Finding(
                    RuleIds.WaiverExpired, Severity.Error, spec.File, waiver.Pointer + "/expires", at.Line, at.Column,
                    $"the waiver of '{waiver.Rule}' expired on {waiver.Expires.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture)}; fix the design, or renew the waiver with a new date and reason"));
                continue;
            }

            var matched = false;
            for (var i = 0; i < result.Count; i++)
            {
                if (result[i].RuleId == waiver.Rule && !result[i].Waived && (waiver.Setting is null || result[i].Setting == waiver.Setting) && result[i].RuleId != RuleIds.WaiverExpired && !RuleIds.HouseRuleIds.Contains(result[i].RuleId))
                {
                    result[i] = result[i] with { Waived = true, WaiverReason = waiver.Reason };
                    matched = true;
                }
            }

            if (!matched)
            {
                var at = spec.Locations.Locate(waiver.Pointer + "/rule");
                var why = known.Contains(waiver.Rule)
                    ? $"the waiver of '{waiver.Rule}' matches no finding; remove it so it cannot hide a future problem"
                    : $"the waiver names '{waiver.Rule}', which is not a rule{DidYouMean(waiver.Rule, known)}; run 'speclint rules' for the ids";
                result.Add(new Finding(RuleIds.WaiverUnmatched, Severity.Warning, spec.File, waiver.Pointer + "/rule", at.Line, at.Column, why));
            }
        }

        return result;
    }

    private static string DidYouMean(string id, IEnumerable<string> known) =>
        Core.Spec.Schema.EditDistance.Closest(id, known) is { } s ? $" (did you mean '{s}'?)" : "";
}
