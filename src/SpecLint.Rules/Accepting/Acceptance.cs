using System.Collections.Immutable;
using SpecLint.Rules.Changes;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Accepting;

/// <summary>
/// The accepted-findings file applied to a run: which findings it covers, and which of its entries match nothing
/// although their spec was checked (stale: the finding was fixed, so the entry can go).
/// </summary>
/// <param name="File">The file as given.</param>
/// <param name="Entries">Its entries.</param>
/// <param name="Covered">The run's findings an entry covers (unwaived spec findings only).</param>
/// <param name="Stale">Entries whose spec was checked and that match none of its findings.</param>
internal sealed record Acceptance(string File, ImmutableArray<AcceptedEntry> Entries, IReadOnlySet<Finding> Covered, ImmutableArray<AcceptedEntry> Stale)
{
    /// <summary>
    /// The id a stale entry is reported under (docs/engine-findings.md). Not one of <see cref="RuleIds.EngineIds"/>:
    /// it is about the accepted-findings file, never fails a run, and nothing can waive or configure it.
    /// </summary>
    public const string StaleId = "accepted-stale";

    /// <summary>
    /// Each stale entry as a note at its line of the accepted-findings file, for outputs that show findings
    /// (the terminal, workflow annotations). They stay out of the run's findings so they never change its exit code.
    /// </summary>
    public IEnumerable<Finding> StaleNotes => Stale.Select(e => new Finding(StaleId, Severity.Note, File, "", Math.Max(1, e.Line), 1,
        $"'{e.Key.Rule}' at {(e.Key.Pointer.Length == 0 ? "/" : e.Key.Pointer)} of {e.Key.Spec} no longer occurs; remove the entry"));

    /// <summary>True when an entry covers <paramref name="finding"/>.</summary>
    public bool Covers(Finding finding) => Covered.Contains(finding);

    /// <summary>
    /// <paramref name="finding"/> as outputs that know only waivers show an accepted finding (SARIF suppressions):
    /// waived, with the accepted-findings file as the reason.
    /// </summary>
    public static Finding AsSuppressed(Finding finding, string file)
    {
        ArgumentNullException.ThrowIfNull(finding);
        return finding with { Waived = true, WaiverReason = $"accepted in {file}" };
    }

    /// <summary>The entry that covers <paramref name="finding"/> of spec <paramref name="specName"/>, or null.</summary>
    public AcceptedEntry? EntryFor(string specName, Finding finding) =>
        Entries.FirstOrDefault(e => e.Key == FindingKey.Of(specName, finding));

    /// <summary>Matches <paramref name="entries"/> against the outcomes of a run.</summary>
    public static Acceptance Apply(string file, ImmutableArray<AcceptedEntry> entries, IEnumerable<SpecOutcome> specs)
    {
        ArgumentNullException.ThrowIfNull(specs);
        var byKey = entries.Select(e => e.Key).ToHashSet();
        var covered = new HashSet<Finding>();
        var used = new HashSet<FindingKey>();
        var checkedNames = new HashSet<string>(StringComparer.Ordinal);
        foreach (var spec in specs.Where(s => s.Spec is not null))
        {
            checkedNames.Add(spec.Name);
            foreach (var f in spec.Findings.Where(f => !f.Waived))
            {
                var key = FindingKey.Of(spec.Name, f);
                if (byKey.Contains(key))
                {
                    covered.Add(f);
                    used.Add(key);
                }
            }
        }

        var stale = entries.Where(e => checkedNames.Contains(e.Key.Spec) && !used.Contains(e.Key)).ToImmutableArray();
        return new Acceptance(file, entries, covered, stale);
    }

    /// <summary>Entries for every unwaived finding of loaded specs in <paramref name="specs"/>, dated <paramref name="today"/>.</summary>
    public static IEnumerable<AcceptedEntry> Record(IEnumerable<SpecOutcome> specs, string? reason, DateOnly today)
    {
        ArgumentNullException.ThrowIfNull(specs);
        return specs.Where(s => s.Spec is not null && !s.IsUnusable)
            .SelectMany(s => s.Findings.Where(f => !f.Waived).Select(f => new AcceptedEntry(FindingKey.Of(s.Name, f), reason, today)));
    }
}
