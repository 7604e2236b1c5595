using System.Collections.Immutable;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Checking;

/// <summary>The house rules of one configuration, ready to run, plus the problems found while building them.</summary>
/// <param name="Rules">The rules, each guarded against running too long or throwing.</param>
/// <param name="Problems">Compile errors and warnings, forbidden APIs and layout problems, at their .cs positions.</param>
/// <param name="Pages">Each rule's page (<c>&lt;id&gt;.md</c> beside its class), by id, where one exists.</param>
/// <param name="Sources">The .cs file that declares each rule, by id.</param>
internal sealed record HouseRuleSet(
    ImmutableArray<IRule> Rules,
    ImmutableArray<Finding> Problems,
    ImmutableDictionary<string, string> Pages,
    ImmutableDictionary<string, string> Sources)
{
    /// <summary>No house rules and no problems.</summary>
    public static HouseRuleSet Empty { get; } = new([], [], ImmutableDictionary<string, string>.Empty, ImmutableDictionary<string, string>.Empty);
}
