using System.CommandLine;
using SpecLint.Rules.Engine;

namespace SpecLint.Cli.Commands;

/// <summary><c>speclint rules</c>: lists the rules with their default severity and options.</summary>
internal static class RulesCommand
{
    public static Command Create()
    {
        var command = new Command("rules", "List the built-in rules, their default severity and options");
        command.SetAction(parse =>
        {
            var output = parse.InvocationConfiguration.Output;
            var rules = RuleCatalog.BuiltIn.Rules;
            var width = rules.Max(r => r.Descriptor.Id.Length);
            foreach (var rule in rules)
            {
                var d = rule.Descriptor;
                output.WriteLine($"{d.Id.PadRight(width)}  {d.DefaultSeverity.Name(),-7}  {d.Title}");
                foreach (var o in d.Options)
                {
                    output.WriteLine($"{new string(' ', width)}    {o.Key} = {o.Default}: {o.Description}");
                }
            }

            output.WriteLine();
            output.WriteLine($"'speclint {WhyCommand.Name} <id>' prints a rule's page. Configure rules in .speclint.yaml under 'rules:'.");
            return 0;
        });
        return command;
    }
}
