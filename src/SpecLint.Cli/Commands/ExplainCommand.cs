using System.CommandLine;
using SpecLint.Rules.Engine;

namespace SpecLint.Cli.Commands;

/// <summary><c>speclint explain &lt;id&gt;</c>: prints a rule's page.</summary>
internal static class ExplainCommand
{
    public static Command Create()
    {
        var id = new Argument<string>("id") { Description = "A rule id, as 'speclint rules' lists them" };
        var command = new Command("explain", "Print a rule's page: what it flags, why, an example, what to do instead") { id };
        command.SetAction(parse =>
        {
            var wanted = parse.GetValue(id)!;
            var catalog = RuleCatalog.BuiltIn.Find(wanted) is null ? HouseRuleSources.ForWorkingFolder().Catalog : RuleCatalog.BuiltIn;
            var page = catalog.Page(wanted);
            if (page is null)
            {
                var why = catalog.Find(wanted) is null ? $"no rule '{wanted}'" : $"house rule '{wanted}' has no page; add {wanted}.md beside its class";
                parse.InvocationConfiguration.Error.WriteLine($"speclint: {why}. Known ids: {string.Join(", ", catalog.Rules.Select(r => r.Descriptor.Id))}");
                return ExitCodes.UnusableInput;
            }

            parse.InvocationConfiguration.Output.Write(page);
            return 0;
        });
        return command;
    }
}
