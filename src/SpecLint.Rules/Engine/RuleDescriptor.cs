using System.Collections.Immutable;

namespace SpecLint.Rules.Engine;

/// <summary>What a rule is: its id (what users type in waivers and configuration), title, default severity and options.</summary>
/// <param name="Id">A readable slug naming what is checked, e.g. "phase-margin".</param>
/// <param name="Title">A one-line summary for listings and SARIF.</param>
/// <param name="DefaultSeverity">Severity when configuration says nothing.</param>
/// <param name="Options">The thresholds it reads from configuration.</param>
public sealed record RuleDescriptor(string Id, string Title, Severity DefaultSeverity, ImmutableArray<RuleOption> Options)
{
    /// <summary>A descriptor with no options.</summary>
    public RuleDescriptor(string id, string title, Severity defaultSeverity)
        : this(id, title, defaultSeverity, [])
    {
    }
}
