using System.CommandLine;
using SpecLint.Core.Spec.Schema;
using SpecLint.Rules.Engine;

namespace SpecLint.Cli.Commands;

/// <summary>
/// <c>speclint why &lt;id&gt;</c>: prints a rule's page, the reasoning a reviewer would give for a finding.
/// The pages come from a function of the rule id, so pages that are not built in (house rules) plug in the
/// same way.
/// </summary>
internal static class WhyCommand
{
    /// <summary>The verb.</summary>
    public const string Name = "why";

    /// <summary>
    /// The command over the built-in pages and the pages of the repository's house rules (compiled only when
    /// the id is not a built-in rule's).
    /// </summary>
    public static Command Create()
    {
        var withHouseRules = new Lazy<RuleCatalog>(() => HouseRuleSources.ForWorkingFolder().Catalog);
        return Create(
            id => RuleCatalog.BuiltIn.Find(id) is not null ? RuleDocs.Page(id) : withHouseRules.Value.Page(id),
            () => withHouseRules.Value.Rules.Select(r => r.Descriptor.Id));
    }

    /// <summary>The command over any page source: <paramref name="pageOf"/> returns a rule's Markdown page, or null.</summary>
    public static Command Create(Func<string, string?> pageOf, Func<IEnumerable<string>> knownIds)
    {
        ArgumentNullException.ThrowIfNull(pageOf);
        ArgumentNullException.ThrowIfNull(knownIds);
        var id = new Argument<string>("id") { Description = "A rule id, as 'speclint rules' lists them" };
        var command = new Command(Name, "Print a rule's page: the condition it checks, the risk on the bench, a flagged and a revised design, its settings and sources") { id };
        command.SetAction(parse =>
        {
            var wanted = parse.GetValue(id)!;
            var page = pageOf(wanted);
            if (page is null)
            {
                var ids = knownIds().ToList();
                var close = EditDistance.Closest(wanted, ids);
                var hint = close is null ? "" : $" Did you mean '{close}'?";
                parse.InvocationConfiguration.Error.WriteLine($"speclint: no rule '{wanted}'.{hint} Known ids: {string.Join(", ", ids)}");
                return ExitCodes.UnusableInput;
            }

            parse.InvocationConfiguration.Output.Write(page);
            return 0;
        });
        return command;
    }
}
