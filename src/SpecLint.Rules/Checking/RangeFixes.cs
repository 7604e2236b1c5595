using SpecLint.Core.Spec;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Checking;

/// <summary>
/// A fix found at one position of an adjustable Rf must hold over the whole range: each rule's fix is re-checked at
/// every position the search picks for the changed design, and only one that clears the rule everywhere is offered.
/// </summary>
internal static class RangeFixes
{
    private const string CfPointer = "/feedback/capacitance";

    /// <summary>
    /// The findings with every fix replaced by one that clears its rule over the whole range (tried among the fixes
    /// the positions proposed), or removed with a note when none does.
    /// </summary>
    public static List<Finding> Verify(TiaSpec channel, List<Finding> merged, IReadOnlyList<Finding> all, Func<TiaSpec, IReadOnlyList<Finding>> check)
    {
        var result = new List<Finding>(merged.Count);
        foreach (var f in merged)
        {
            if (f.Fix is null)
            {
                result.Add(f);
                continue;
            }

            // Only a value every position shares can be rewritten for the whole range.
            if (f.Fix.Path != CfPointer)
            {
                result.Add(f with { Fix = null });
                continue;
            }

            var candidates = all
                .Where(x => x.RuleId == f.RuleId && x.Pointer == f.Pointer && x.Fix is not null)
                .Select(x => x.Fix!)
                .Prepend(f.Fix)
                .DistinctBy(x => (x.Path, x.Value))
                .ToList();
            var holds = candidates.FirstOrDefault(fix => Clears(channel, fix, f.RuleId, check));
            result.Add(holds switch
            {
                null => f with { Fix = null, Message = f.Message + " That value does not hold over the whole adjustment range, and no value tried does." },
                _ when holds == f.Fix => f,
                _ => f with { Fix = holds, Message = f.Message + $" Over the whole adjustment range it takes {holds.Value}." },
            });
        }

        return result;
    }

    private static bool Clears(TiaSpec channel, FixSuggestion fix, string ruleId, Func<TiaSpec, IReadOnlyList<Finding>> check)
    {
        if (fix.Path != CfPointer)
        {
            return false;
        }

        ParsedQuantity parsed;
        try
        {
            parsed = QuantityParser.Parse(fix.Value, Dimension.Capacitance);
        }
        catch (QuantityParseException)
        {
            return false;
        }

        var candidate = channel with { Feedback = channel.Feedback with { Capacitance = Spread<Capacitance>.From(parsed) } };
        try
        {
            return GainViews.All(candidate).All(view => !check(view).Any(x => x.RuleId == ruleId));
        }
        catch (Exception e) when (Core.Analysis.AnalysisFailedException.IsNumericalFailure(e))
        {
            return false;
        }
    }
}
