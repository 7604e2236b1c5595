using System.Collections.Immutable;
using System.Reflection;

namespace SpecLint.Rules.Engine;

/// <summary>
/// The rules a run uses, discovered by reflection: every public, non-abstract <see cref="IRule"/> with a
/// parameterless constructor in the given assemblies. No hand-kept list, so a rule cannot be forgotten.
/// </summary>
public sealed class RuleCatalog
{
    private RuleCatalog(ImmutableArray<IRule> rules)
    {
        Rules = rules;
    }

    /// <summary>The rules, ordered by id so that output is stable.</summary>
    public ImmutableArray<IRule> Rules { get; }

    /// <summary>The built-in rules compiled from <c>rules/</c>.</summary>
    public static RuleCatalog BuiltIn { get; } = Discover(typeof(RuleCatalog).Assembly);

    /// <summary>Finds the rules in <paramref name="assemblies"/>; throws when two rules share an id.</summary>
    public static RuleCatalog Discover(params Assembly[] assemblies)
    {
        var rules = assemblies
            .SelectMany(a => a.GetExportedTypes())
            .Where(t => t is { IsClass: true, IsAbstract: false } && typeof(IRule).IsAssignableFrom(t) && t.GetConstructor(Type.EmptyTypes) is not null)
            .Select(t => (IRule)Activator.CreateInstance(t)!)
            .OrderBy(r => r.Descriptor.Id, StringComparer.Ordinal)
            .ToImmutableArray();
        var duplicate = rules.GroupBy(r => r.Descriptor.Id, StringComparer.Ordinal).FirstOrDefault(g => g.Count() > 1);
        if (duplicate is not null)
        {
            throw new InvalidOperationException($"two rules share the id '{duplicate.Key}': {string.Join(", ", duplicate.Select(r => r.GetType().FullName))}");
        }

        return new RuleCatalog(rules);
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

        return new RuleCatalog(all);
    }

    /// <summary>The rule with this id, or null.</summary>
    public IRule? Find(string id) => Rules.FirstOrDefault(r => r.Descriptor.Id == id);

    /// <summary>Every id a waiver or configuration may name: the rules plus the engine's own ids.</summary>
    public IEnumerable<string> KnownIds => Rules.Select(r => r.Descriptor.Id).Concat(RuleIds.EngineIds);
}
