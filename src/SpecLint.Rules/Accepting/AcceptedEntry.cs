using SpecLint.Rules.Changes;

namespace SpecLint.Rules.Accepting;

/// <summary>One accepted finding: its identity, why it was accepted and when.</summary>
/// <param name="Key">Rule, spec name and key pointer.</param>
/// <param name="Reason">Why the team lives with it, or null.</param>
/// <param name="Date">The day it was recorded.</param>
/// <param name="Line">Its line in the accepted-findings file (0 for an entry not read from a file).</param>
internal sealed record AcceptedEntry(FindingKey Key, string? Reason, DateOnly Date, int Line = 0);
