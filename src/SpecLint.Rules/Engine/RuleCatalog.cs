using System.Collections.Immutable;
using System.Reflection;
using SpecLint.Rules.Checking;

namespace SpecLint.Rules.Engine;

/// <summary>
/// The rules a run uses: the built-in rules of <see cref="BuiltInRules"/>, plus house rules.
/// </summary>
internal sealed class RuleCatalog
{
    private readonly ImmutableDictionary<string, string> _housePages;
    private readonly ImmutableDictionary<string, string> _houseSources;

    private RuleCatalog(ImmutableArray<IRule> rules, ImmutableDictionary<string, string>? housePages = null, ImmutableDictionary<string, string>? houseSources = null)
    {
        Rules = rules;
        _housePages = housePages ?? ImmutableDictionary<string, string>.Empty;
        _houseSources = houseSources ?? ImmutableDictionary<string, string>.Empty;
    }

    /// <summary>True when <paramref name="id"/> is a house rule (compiled from the repository) rather than a built-in rule.</summary>
    public bool IsHouseRule(string id) => _houseSources.ContainsKey(id);

    /// <summary>The .cs file that declares a house rule, or null for a built-in rule.</summary>
    public string? HouseRuleSource(string id) => _houseSources.GetValueOrDefault(id);

    /// <summary>The Markdown page of a rule: a house rule's <c>&lt;id&gt;.md</c>, or the built-in page; null when there is none.</summary>
    public string? Page(string id) => _housePages.TryGetValue(id, out var page) ? page : IsHouseRule(id) ? null : RuleDocs.Page(id);

    /// <summary>
    /// This catalog plus a set of house rules. A house rule whose id is already taken is left out here; the
    /// house-rule loader reports the collision at the class.
    /// </summary>
    public RuleCatalog With(HouseRuleSet houseRules)
    {
        ArgumentNullException.ThrowIfNull(houseRules);
        var taken = Rules.Select(r => r.Descriptor.Id).ToHashSet(StringComparer.Ordinal);
        var added = houseRules.Rules.Where(r => taken.Add(r.Descriptor.Id)).ToList();
        if (added.Count == 0)
        {
            return this;
        }

        var all = Rules.AddRange(added).OrderBy(r => r.Descriptor.Id, StringComparer.Ordinal).ToImmutableArray();
        var ids = added.Select(r => r.Descriptor.Id).ToHashSet(StringComparer.Ordinal);
        return new RuleCatalog(
            all,
            _housePages.SetItems(houseRules.Pages.Where(p => ids.Contains(p.Key))),
            _houseSources.SetItems(houseRules.Sources.Where(p => ids.Contains(p.Key))));
    }

    /// <summary>The rules, ordered by id so that output is stable.</summary>
    public ImmutableArray<IRule> Rules { get; }

    /// <summary>The built-in rules compiled from <c>rules/</c>.</summary>
    public static RuleCatalog BuiltIn { get; } = Of(BuiltInRules.Create());

    /// <summary>
    /// Finds the rules in <paramref name="assemblies"/> by reflection: every public, non-abstract <see cref="IRule"/>
    /// with a parameterless constructor. Slow at start-up; tests use it to hold <see cref="BuiltInRules"/> to the classes.
    /// </summary>
    public static RuleCatalog Discover(params Assembly[] assemblies) =>
        Of(assemblies
            .SelectMany(a => a.GetExportedTypes())
            .Where(t => t is { IsClass: true, IsAbstract: false } && typeof(IRule).IsAssignableFrom(t) && t.GetConstructor(Type.EmptyTypes) is not null)
            .Select(t => (IRule)Activator.CreateInstance(t)!));

    /// <summary>A catalog of <paramref name="rules"/>, ordered by id; throws when two rules share an id.</summary>
    private static RuleCatalog Of(IEnumerable<IRule> rules)
    {
        var sorted = rules.OrderBy(r => r.Descriptor.Id, StringComparer.Ordinal).ToImmutableArray();
        var duplicate = sorted.GroupBy(r => r.Descriptor.Id, StringComparer.Ordinal).FirstOrDefault(g => g.Count() > 1);
        if (duplicate is not null)
        {
            throw new InvalidOperationException($"two rules share the id '{duplicate.Key}': {string.Join(", ", duplicate.Select(r => r.GetType().FullName))}");
        }

        return new RuleCatalog(sorted);
    }

    /// <summary>This catalog plus more rules (house rules); ids must stay unique.</summary>
    public RuleCatalog With(IEnumerable<IRule> more)
    {
        var all = Rules.AddRange(more).OrderBy(r => r.Descriptor.Id, StringComparer.Ordinal).ToImmutableArray();
        var duplicate = all.GroupBy(r => r.Descriptor.Id, StringComparer.Ordinal).FirstOrDefault(g => g.Count() > 1);
        if (duplicate is not null)
        {
            throw new InvalidOperationException($"two rules share the id '{duplicate.Key}'");
        }

        return new RuleCatalog(all, _housePages, _houseSources);
    }

    /// <summary>The rule with this id, or null.</summary>
    public IRule? Find(string id) => Rules.FirstOrDefault(r => r.Descriptor.Id == id);

    /// <summary>Every id a waiver or configuration may name: the rules plus the engine's own ids.</summary>
    public IEnumerable<string> KnownIds => Rules.Select(r => r.Descriptor.Id).Concat(RuleIds.EngineIds);
}
