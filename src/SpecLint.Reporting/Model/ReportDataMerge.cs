using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Model;

/// <summary>
/// Combines the report data of the shards of one run into the data the unsharded run has: specs and changes in
/// file order, run problems once each, the configuration files and house rules any shard read, the highest exit
/// code. The caller has checked that the shards belong together (see <see cref="Json.JsonMerge"/>).
/// </summary>
internal static class ReportDataMerge
{
    public static ReportData Merge(IReadOnlyList<ReportData> shards)
    {
        ArgumentNullException.ThrowIfNull(shards);
        var first = shards[0];
        var houseRules = new List<ReportHouseRule>();
        foreach (var rule in shards.SelectMany(s => s.HouseRules))
        {
            if (!houseRules.Any(h => h.Id == rule.Id))
            {
                houseRules.Add(rule);
            }
        }

        var changes = first.Changes is { } c
            ? c with
            {
                Specs = [.. shards.SelectMany(s => s.Changes?.Specs ?? []).OrderBy(s => s.File, StringComparer.Ordinal)],

                // Each shard meets the bases of its own specs only; the unsharded run orders them by position.
                BaseNotes = [.. shards.SelectMany(s => s.Changes?.BaseNotes ?? []).Distinct()
                    .OrderBy(n => n.File, StringComparer.Ordinal).ThenBy(n => n.Line).ThenBy(n => n.Column).ThenBy(n => n.Message, StringComparer.Ordinal)],
            }
            : null;
        return new ReportData(
            [.. shards.SelectMany(s => s.Specs).OrderBy(s => s.File, StringComparer.Ordinal)],
            [.. shards.SelectMany(s => s.RunProblems).Distinct()],
            first.FailOn,
            [.. shards.SelectMany(s => s.ConfigFiles).Distinct(StringComparer.Ordinal).Order(StringComparer.Ordinal)],
            [.. houseRules],
            shards.Max(s => s.ExitCode),
            changes);
    }
}
