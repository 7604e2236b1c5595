using System.CommandLine;
using SpecLint.Rules.Engine;

namespace SpecLint.Cli.Commands;

/// <summary><c>speclint rules</c>: lists the rules with their default severity and options.</summary>
internal static class RulesCommand
{
    public static Command Create()
    {
        var noHouseRules = new Option<bool>("--no-house-rules") { Description = "List the built-in rules only, without compiling the repository's house rules" };
        var command = new Command("rules", "List the rules (built-in, and the repository's house rules), their default severity and options") { noHouseRules };
        command.SetAction(parse =>
        {
            var output = parse.InvocationConfiguration.Output;
            var (catalog, problems, _) = HouseRuleSources.ForWorkingFolder(houseRules: !parse.GetValue(noHouseRules));
            foreach (var p in problems)
            {
                parse.InvocationConfiguration.Error.WriteLine(p.ToString());
            }

            var rules = catalog.Rules;
            var width = rules.Max(r => r.Descriptor.Id.Length);
            foreach (var rule in rules)
            {
                var d = rule.Descriptor;
                var house = catalog.IsHouseRule(d.Id) ? $"  [house rule: {catalog.HouseRuleSource(d.Id)}]" : "";
                output.WriteLine($"{d.Id.PadRight(width)}  {d.DefaultSeverity.Name(),-7}  {d.Title}{house}");
                foreach (var o in d.Options)
                {
                    output.WriteLine($"{new string(' ', width)}    {o.Key} = {o.Default}: {o.Description}");
                }
            }

            output.WriteLine();
            output.WriteLine($"'speclint {WhyCommand.Name} <id>' prints a rule's page. Configure rules in .speclint.yaml under 'rules:'.");
            return problems.Any(p => p.Severity == Severity.Error) ? ExitCodes.UnusableInput : ExitCodes.Clean;
        });
        return command;
    }
}
