using SpecLint.Core.Spec;
using SpecLint.Core.Spec.Model;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Checking;

/// <summary>
/// Findings of a channel checked once per gain setting: each is moved onto the file's keys and named with its
/// setting, and one that every setting reports alike is kept once, for the channel.
/// </summary>
internal static class SettingFindings
{
    // Which of an adjustable Rf's searched positions shows each built-in rule's worst case.
    private static readonly Dictionary<string, string> WorstPositionOf = new(StringComparer.Ordinal)
    {
        ["phase-margin"] = "lowest phase margin",
        ["capacitor-tolerance"] = "lowest phase margin",
        ["min-stable-gain"] = "lowest phase margin",
        ["peaking"] = "most peaking",
        ["bandwidth"] = "least bandwidth",
        ["output-headroom"] = "highest",
        ["thermal-vs-shot-noise"] = "lowest",
        ["noise-floor"] = "lowest",
    };

    /// <summary>The finding on the file's keys, named with the view's setting.</summary>
    public static Finding Remap(TiaSpec view, Finding f, bool adjustable)
    {
        var pointer = GainViews.ToFilePointer(view, f.Pointer);
        var fix = f.Fix;
        if (fix is not null)
        {
            var path = GainViews.ToFilePointer(view, fix.Path);
            // A potentiometer's range is not one value a fix could rewrite.
            fix = adjustable && path.StartsWith("/feedback/resistance", StringComparison.Ordinal) ? null : fix with { Path = path };
        }

        return f with { Pointer = pointer, Fix = fix, Setting = view.Setting };
    }

    /// <summary>
    /// All settings' findings: one every setting reports alike (same rule, key, place and words) is kept once
    /// without a setting; for an adjustable Rf, a rule that fails at several positions is reported once, at the
    /// position that shows its worst case.
    /// </summary>
    public static List<Finding> Merge(IReadOnlyList<(string Setting, IReadOnlyList<Finding> Findings)> settings, bool adjustable)
    {
        var count = settings.Count;
        var seen = new Dictionary<(string, string, int, int, string), int>();
        foreach (var (_, findings) in settings)
        {
            foreach (var key in findings.Select(Key).Distinct())
            {
                seen[key] = seen.GetValueOrDefault(key) + 1;
            }
        }

        var result = new List<Finding>();
        var shared = new HashSet<(string, string, int, int, string)>();
        foreach (var (_, findings) in settings)
        {
            foreach (var f in findings)
            {
                var key = Key(f);
                if (seen[key] == count)
                {
                    if (shared.Add(key))
                    {
                        result.Add(f with { Setting = null });
                    }
                }
                else
                {
                    result.Add(f);
                }
            }
        }

        return adjustable ? WorstPositions(result) : result;
    }

    private static List<Finding> WorstPositions(List<Finding> findings)
    {
        var result = new List<Finding>();
        foreach (var group in findings.GroupBy(f => (f.RuleId, f.Pointer, f.Setting is null)))
        {
            if (group.Key.Item3 || group.Count() == 1)
            {
                result.AddRange(group);
                continue;
            }

            // A rule whose worst position is not known (a plausibility check, a house rule) keeps every position's finding.
            var wanted = WorstPositionOf.GetValueOrDefault(group.Key.RuleId);
            if (wanted is null)
            {
                result.AddRange(group);
                continue;
            }

            var pick = group.FirstOrDefault(f => f.Setting!.EndsWith("(" + wanted + ")", StringComparison.Ordinal)
                    || f.Setting.Contains("(" + wanted + ",", StringComparison.Ordinal) || f.Setting.Contains(", " + wanted, StringComparison.Ordinal))
                ?? group.First();
            result.Add(pick);
        }

        return result;
    }

    private static (string, string, int, int, string) Key(Finding f) => (f.RuleId, f.Pointer, f.Line, f.Column, f.Message);
}
