using System.Globalization;
using SpecLint.Core.Spec.Model;

namespace SpecLint.Rules.Engine;

/// <summary>
/// Applies a spec's waivers to its findings. A live waiver marks the findings of its rule as waived; an
/// expired one is itself an error and waives nothing (so the gate closes again on the expiry day); a live
/// waiver that matches nothing is a warning, because it would silently hide the next regression.
/// </summary>
public static class WaiverApplication
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
                if (result[i].RuleId == waiver.Rule && !result[i].Waived && result[i].RuleId != RuleIds.WaiverExpired)
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

    private static string DidYouMean(string id, IEnumerable<string> known)
    {
        var best = known.Select(k => (k, d: EditDistance(k, id))).OrderBy(x => x.d).ThenBy(x => x.k, StringComparer.Ordinal).FirstOrDefault();
        return best.k is not null && best.d <= Math.Max(2, id.Length / 3) ? $" (did you mean '{best.k}'?)" : "";
    }

    private static int EditDistance(string a, string b)
    {
        var d = new int[a.Length + 1, b.Length + 1];
        for (var i = 0; i <= a.Length; i++)
        {
            d[i, 0] = i;
        }

        for (var j = 0; j <= b.Length; j++)
        {
            d[0, j] = j;
        }

        for (var i = 1; i <= a.Length; i++)
        {
            for (var j = 1; j <= b.Length; j++)
            {
                d[i, j] = Math.Min(Math.Min(d[i - 1, j] + 1, d[i, j - 1] + 1), d[i - 1, j - 1] + (a[i - 1] == b[j - 1] ? 0 : 1));
            }
        }

        return d[a.Length, b.Length];
    }
}
