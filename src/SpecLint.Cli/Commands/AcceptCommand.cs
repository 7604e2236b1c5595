using System.Collections.Immutable;
using System.CommandLine;
using SpecLint.Rules.Accepting;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Cli.Commands;

/// <summary>
/// <c>speclint accept [--reason TEXT] FILE [paths]</c>: records today's findings in an accepted-findings file the
/// team commits, so that adopting SpecLint on an existing repository does not fail every pull request. Entries
/// already in the file are kept as they are.
/// </summary>
internal static class AcceptCommand
{
    public const string Name = "accept";

    public static Command Create()
    {
        var file = new Argument<string>("file") { Description = "The accepted-findings file to create or extend (JSON; commit it)" };
        var paths = new Argument<string[]>("paths") { Description = "Spec files or folders (default: the repository, per .speclint.yaml)", Arity = ArgumentArity.ZeroOrMore };
        var reason = new Option<string?>("--reason") { Description = "Why these findings are accepted; stored with each new entry" };
        var config = new Option<string?>("--config") { Description = "Use this configuration file instead of the nearest .speclint.yaml" };
        var nominal = new Option<bool>("--nominal-only") { Description = "Skip tolerance corners and Monte Carlo (findings that need them are not recorded)" };
        var quiet = new Option<bool>("--quiet") { Description = "No progress on stderr" };
        var noHouseRules = new Option<bool>("--no-house-rules") { Description = "Do not compile or run the repository's house rules" };
        var command = new Command(Name, "Record today's findings as accepted, for 'check --accepted FILE'")
        {
            file, paths, reason, config, nominal, quiet, noHouseRules,
        };
        command.SetAction(parse =>
        {
            var error = parse.InvocationConfiguration.Error;
            var output = parse.InvocationConfiguration.Output;
            var target = parse.GetValue(file)!;
            var inputs = parse.GetValue(paths) ?? [];
            if (!OutputGuard.IsSafeTarget(target, inputs, ".json", out var unsafeWhy))
            {
                error.WriteLine($"speclint: {Name}: {unsafeWhy}");
                return ExitCodes.UnusableInput;
            }

            var configPath = parse.GetValue(config);
            if (configPath is not null && !File.Exists(configPath))
            {
                error.WriteLine($"speclint: --config: no such file '{configPath}'");
                return ExitCodes.UnusableInput;
            }

            ImmutableArray<AcceptedEntry> existing = [];
            if (File.Exists(target))
            {
                if (AcceptedFile.Read(target, target, out var why) is not { } read)
                {
                    error.WriteLine($"speclint: {why}; the file was left as it is");
                    return ExitCodes.UnusableInput;
                }

                existing = read;
            }

            var today = DateOnly.FromDateTime(DateTime.UtcNow);
            var run = CheckRunner.Run(new CheckOptions
            {
                Paths = inputs,
                ConfigPath = configPath,
                Today = today,
                Tolerances = !parse.GetValue(nominal),
                Progress = Progress.For(error, parse.GetValue(quiet)),
                HouseRules = parse.GetValue(noHouseRules) ? null : HouseRuleSources.Create(),
            });
            if (run.ExitCode == ExitCodes.UnusableInput)
            {
                foreach (var f in run.AllFindings.Where(f => f.Severity == Severity.Error && !f.Waived && (RuleIds.HouseRuleIds.Contains(f.RuleId) || f.RuleId is RuleIds.SpecInvalid or RuleIds.ConfigInvalid or RuleIds.NoSpecs)))
                {
                    error.WriteLine(f.ToString());
                }

                error.WriteLine($"speclint: {Name}: some input could not be used; fix it first. '{target}' was not written");
                return ExitCodes.UnusableInput;
            }

            var known = existing.Select(e => e.Key).ToHashSet();
            var added = Acceptance.Record(run.Specs, parse.GetValue(reason), today).Where(e => known.Add(e.Key)).ToList();
            Outputs.WriteText(target, AcceptedFile.Write(existing.Concat(added)));
            output.WriteLine($"{target}: {added.Count} finding{(added.Count == 1 ? "" : "s")} accepted, {existing.Length} already there. Commit it and run 'speclint check --accepted {target}'.");
            return ExitCodes.Clean;
        });
        return command;
    }
}
