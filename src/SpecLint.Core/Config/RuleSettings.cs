using System.Collections.Immutable;
using SpecLint.Core.Spec;

namespace SpecLint.Core.Config;

/// <summary>The settings of one rule under <c>rules:</c>.</summary>
/// <param name="RuleId">The rule id as written.</param>
/// <param name="Severity">The severity override, or null to keep the rule's default.</param>
/// <param name="Options">The rule's own options (everything but <c>severity</c>), by key.</param>
/// <param name="Position">Where the rule's entry sits (its key), for messages such as an unknown rule id.</param>
internal sealed record RuleSettings(string RuleId, ConfigSeverity? Severity, ImmutableDictionary<string, RuleOption> Options, SourcePosition Position)
{
    /// <summary>True when the configuration turns the rule off.</summary>
    public bool IsOff => Severity == ConfigSeverity.Off;

    /// <summary>
    /// When not empty, the rule runs only on specs that carry at least one of these tags (<c>tags: [medical]</c>
    /// under the rule's entry); empty means every spec.
    /// </summary>
    public ImmutableArray<string> Tags { get; init; } = [];
}
