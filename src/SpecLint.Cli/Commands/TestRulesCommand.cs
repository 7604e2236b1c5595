using System.CommandLine;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Cli.Commands;

/// <summary>
/// <c>speclint test-rules</c>: runs every house rule on the case specs beside it
/// (<c>&lt;folder&gt;/&lt;id&gt;/cases/*.tia.yaml</c>) and compares its findings with the lines marked
/// <c># expect: &lt;id&gt;</c>, so a team can gate its own rules in CI.
/// </summary>
internal static class TestRulesCommand
{
    public static Command Create()
    {
        var config = new Option<string?>("--config") { Description = "Use this configuration file instead of the nearest .speclint.yaml" };
        var command = new Command("test-rules", "Run each house rule on its cases/*.tia.yaml and compare with the '# expect: <id>' marks. Exit 0 all pass, 1 a case failed, 2 unusable rules") { config };
        command.SetAction(parse =>
        {
            var output = parse.InvocationConfiguration.Output;
            var error = parse.InvocationConfiguration.Error;
            var configPath = parse.GetValue(config);
            if (configPath is not null && !File.Exists(configPath))
            {
                error.WriteLine($"speclint: --config: no such file '{configPath}'");
                return ExitCodes.UnusableInput;
            }

            var (catalog, problems, repoConfig) = HouseRuleSources.ForWorkingFolder(configPath);
            foreach (var p in problems)
            {
                error.WriteLine(p.ToString());
            }

            if (repoConfig is null)
            {
                error.WriteLine("speclint: no .speclint.yaml here or above; house rules are found from it (speclint new-rule <id> creates one)");
                return ExitCodes.UnusableInput;
            }

            var houseIds = catalog.Rules.Select(r => r.Descriptor.Id).Where(catalog.IsHouseRule).ToList();
            if (houseIds.Count == 0)
            {
                error.WriteLine("speclint: no house rule compiled; nothing to test");
                return ExitCodes.UnusableInput;
            }

            var result = RuleCaseRunner.Run(catalog, repoConfig, houseIds);
            foreach (var line in result.Lines)
            {
                output.WriteLine(line);
            }

            output.WriteLine($"{result.Passed} case(s) passed, {result.Failed} failed, for {houseIds.Count} house rule(s).");
            return problems.Any(p => p.Severity == Severity.Error) ? ExitCodes.UnusableInput
                : result.Failed > 0 ? ExitCodes.FindingsAtFailLevel
                : ExitCodes.Clean;
        });
        return command;
    }
}
