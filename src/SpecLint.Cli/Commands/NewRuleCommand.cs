using System.CommandLine;
using System.Text.RegularExpressions;
using SpecLint.Cli.Scaffold;
using SpecLint.Core.Config;
using SpecLint.Core.Files;
using SpecLint.Rules.Engine;

namespace SpecLint.Cli.Commands;

/// <summary>
/// <c>speclint new-rule &lt;id&gt;</c>: scaffolds a house rule (class, page, a flagged and a clean case) in the
/// repository's house-rules folder. It never overwrites: an existing folder for the id is an error.
/// </summary>
internal static partial class NewRuleCommand
{
    [GeneratedRegex("^[a-z][a-z0-9]*(-[a-z0-9]+)*$", RegexOptions.CultureInvariant)]
    private static partial Regex Slug();

    public static Command Create()
    {
        var id = new Argument<string>("id") { Description = "The new rule's id: a lower-case slug that names what is checked, e.g. guard-ring-note" };
        var folder = new Option<string?>("--folder") { Description = "House-rules folder to write into (default: the first folder in house-rules of .speclint.yaml, or house-rules/)" };
        var command = new Command("new-rule", "Create a house rule: its C# class, its page and two cases that 'speclint test-rules' runs") { id, folder };
        command.SetAction(parse =>
        {
            var output = parse.InvocationConfiguration.Output;
            var error = parse.InvocationConfiguration.Error;
            var wanted = parse.GetValue(id)!;
            if (!Slug().IsMatch(wanted) || wanted.Length > 60)
            {
                error.WriteLine($"speclint: new-rule: '{wanted}' is not a rule id; use lower-case words joined by '-', e.g. guard-ring-note");
                return ExitCodes.UnusableInput;
            }

            if (RuleCatalog.BuiltIn.KnownIds.Contains(wanted, StringComparer.Ordinal))
            {
                error.WriteLine($"speclint: new-rule: '{wanted}' is already a SpecLint id; choose one of your own");
                return ExitCodes.UnusableInput;
            }

            var configPath = RepoConfigLoader.FindFor(Path.Combine(Directory.GetCurrentDirectory(), "_"));
            var root = configPath is null ? Directory.GetCurrentDirectory() : Path.GetDirectoryName(configPath)!;
            var target = parse.GetValue(folder) is { } f ? Path.GetFullPath(f) : Path.Combine(root, DefaultFolder(configPath));
            var ruleFolder = Path.Combine(target, wanted);
            if (Directory.Exists(ruleFolder) || File.Exists(ruleFolder))
            {
                error.WriteLine($"speclint: new-rule: {Shown(ruleFolder)} already exists; nothing was written");
                return ExitCodes.UnusableInput;
            }

            try
            {
                Directory.CreateDirectory(Path.Combine(ruleFolder, "cases"));
                var classFile = Path.Combine(ruleFolder, RuleScaffold.PascalName(wanted) + "Rule.cs");
                AtomicFile.WriteAllText(classFile, RuleScaffold.ClassFile(wanted));
                AtomicFile.WriteAllText(Path.Combine(ruleFolder, wanted + ".md"), RuleScaffold.Page(wanted));
                AtomicFile.WriteAllText(Path.Combine(ruleFolder, "cases", "flagged.tia.yaml"), RuleScaffold.Case(wanted, flagged: true));
                AtomicFile.WriteAllText(Path.Combine(ruleFolder, "cases", "clean.tia.yaml"), RuleScaffold.Case(wanted, flagged: false));
                if (configPath is null)
                {
                    var config = Path.Combine(root, RepoConfig.FileName);
                    AtomicFile.WriteAllText(config, $"# Repository configuration for SpecLint.\nhouse-rules: [{Path.GetRelativePath(root, target).Replace('\\', '/')}/]\n");
                    output.WriteLine($"wrote {Shown(config)} (house rules are found from it)");
                }

                output.WriteLine($"wrote {Shown(classFile)}, its page {wanted}.md and cases/flagged.tia.yaml, cases/clean.tia.yaml");
                output.WriteLine($"Next: edit the class and the page, then run 'speclint test-rules'.");
                return ExitCodes.Clean;
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException or OutputException)
            {
                error.WriteLine($"speclint: new-rule: cannot write {Shown(ruleFolder)}: {e.Message}");
                return ExitCodes.UnusableInput;
            }
        });
        return command;
    }

    private static string DefaultFolder(string? configPath)
    {
        if (configPath is not null && RepoConfigLoader.Load(configPath).Config.HouseRules.FirstOrDefault(p => p.IndexOfAny(['*', '?', '[']) < 0) is { } first)
        {
            return first;
        }

        return RepoConfig.DefaultHouseRuleFolder;
    }

    private static string Shown(string path) => Path.GetRelativePath(Directory.GetCurrentDirectory(), path).Replace('\\', '/');
}
