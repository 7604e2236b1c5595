using System.Collections.Immutable;
using SpecLint.Core.Spec;

namespace SpecLint.Rules.Engine;

/// <summary>What the repository configuration says about one rule: its severity (or off) and option values as written.</summary>
/// <param name="Off">True when configuration turns the rule off.</param>
/// <param name="Severity">A severity replacing the default, or null.</param>
/// <param name="Options">Option values as written (quantity grammar), by key.</param>
/// <param name="OptionPositions">Where each option sits in the configuration file, for error messages.</param>
/// <param name="File">The configuration file the values came from, or null for built-in defaults.</param>
internal sealed record RuleConfiguration(
    bool Off,
    Severity? Severity,
    ImmutableDictionary<string, string> Options,
    ImmutableDictionary<string, SourcePosition> OptionPositions,
    string? File)
{
    /// <summary>No configuration: defaults throughout.</summary>
    public static RuleConfiguration Default { get; } =
        new(false, null, ImmutableDictionary<string, string>.Empty, ImmutableDictionary<string, SourcePosition>.Empty, null);
}
