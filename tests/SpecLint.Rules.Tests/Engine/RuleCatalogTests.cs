using System.Reflection;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Tests.Engine;

public sealed class RuleCatalogTests
{
    // references.md §D7: the built-in rule ids are a contract.
    private static readonly string[] ContractIds =
    [
        "bandwidth", "capacitor-tolerance", "feedback-capacitor-size", "high-voltage", "min-stable-gain", "noise-floor",
        "output-headroom", "peaking", "phase-margin", "plausible-values", "slew-rate", "standard-values", "thermal-vs-shot-noise",
    ];

    [Fact]
    public void Discovers_the_thirteen_built_in_rules_with_the_contract_ids()
    {
        Assert.Equal(ContractIds, RuleCatalog.BuiltIn.Rules.Select(r => r.Descriptor.Id));
    }

    [Fact]
    public void The_hand_kept_list_holds_every_rule_class_once()
    {
        // BuiltInRules spares the start-up a scan of every exported type; reflection here keeps it complete.
        var discovered = RuleCatalog.Discover(typeof(RuleCatalog).Assembly).Rules.Select(r => r.GetType()).ToList();
        var listed = BuiltInRules.Create().Select(r => r.GetType()).ToList();

        Assert.Equal(listed.Count, listed.Distinct().Count());
        Assert.Equal(discovered.OrderBy(t => t.FullName, StringComparer.Ordinal), listed.OrderBy(t => t.FullName, StringComparer.Ordinal));
    }

    [Fact]
    public void Every_rule_is_public_and_sealed()
    {
        Assert.All(RuleCatalog.BuiltIn.Rules, r => Assert.True(r.GetType().IsPublic && r.GetType().IsSealed, r.GetType().Name));
    }

    [Fact]
    public void Ids_are_unique_and_do_not_collide_with_engine_ids()
    {
        var ids = RuleCatalog.BuiltIn.KnownIds.ToList();

        Assert.Equal(ids.Count, ids.Distinct(StringComparer.Ordinal).Count());
    }

    [Fact]
    public void Refuses_a_second_rule_with_an_existing_id()
    {
        Assert.Throws<InvalidOperationException>(() => RuleCatalog.BuiltIn.With([RuleCatalog.BuiltIn.Rules[0]]));
    }

    [Fact]
    public void Every_option_default_parses_in_its_dimension()
    {
        Assert.All(RuleCatalog.BuiltIn.Rules.SelectMany(r => r.Descriptor.Options), o => Assert.True(double.IsFinite(o.DefaultSi), o.Key));
    }

    [Fact]
    public void Every_rule_has_a_test_class_named_after_it()
    {
        // STYLE "One rule": one class, one page, one test class.
        var testClasses = Assembly.GetExecutingAssembly().GetTypes().Select(t => t.Name).ToHashSet(StringComparer.Ordinal);

        Assert.All(RuleCatalog.BuiltIn.Rules, r => Assert.Contains(r.GetType().Name + "Tests", testClasses));
    }
}
