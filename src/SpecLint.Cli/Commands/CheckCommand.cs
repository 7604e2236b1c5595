using System.Collections.Immutable;
using System.CommandLine;
using System.Globalization;
using SpecLint.Rules.Accepting;
using SpecLint.Rules.Changes;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Cli.Commands;

/// <summary><c>speclint check [paths]</c>: validates specs, analyses them, runs the rules, writes the outputs.</summary>
internal static class CheckCommand
{
    public static Command Create()
    {
        var paths = new Argument<string[]>("paths") { Description = "Spec files or folders (default: the repository, per .speclint.yaml)", Arity = ArgumentArity.ZeroOrMore };
        var format = new Option<string>("--format") { Description = "Terminal output: text, json (metrics and findings for scripts, format version 1) or github (workflow annotations)", DefaultValueFactory = _ => DefaultFormat() };
        // Any case is accepted (JSON, Json, json): the value names a format, not a file.
        string[] formats = ["text", "json", "github"];
        format.CustomParser = result => result.Tokens.Count == 0 ? DefaultFormat() : result.Tokens[0].Value.ToLowerInvariant();
        format.Validators.Add(result =>
        {
            if (result.Tokens.Count > 0 && !formats.Contains(result.Tokens[0].Value.ToLowerInvariant()))
            {
                result.AddError($"--format must be one of {string.Join(", ", formats)}, not '{result.Tokens[0].Value}'");
            }
        });
        format.CompletionSources.Add(formats);
        var report = new Option<string?>("--report") { Description = "Write a Markdown review report to this file (SVG plots in a folder beside it)" };
        var html = new Option<string?>("--html") { Description = "Write the report as one standalone HTML page with the plots inline" };
        var sarif = new Option<string?>("--sarif") { Description = "Write SARIF 2.1.0 for code scanning to this file" };
        var failOn = new Option<string?>("--fail-on") { Description = "Lowest severity that fails the run: error, warning or note (overrides fail-on in .speclint.yaml)" };
        failOn.AcceptOnlyFromAmong("error", "warning", "note");
        var config = new Option<string?>("--config") { Description = "Use this configuration file instead of the nearest .speclint.yaml" };
        var asOf = new Option<string?>("--as-of") { Description = "Judge waiver expiry dates as of this day (YYYY-MM-DD; default today)" };
        var nominal = new Option<bool>("--nominal-only") { Description = "Skip tolerance corners and Monte Carlo" };
        var quiet = new Option<bool>("--quiet") { Description = "No progress on stderr" };
        var noHouseRules = new Option<bool>("--no-house-rules") { Description = "Do not compile or run the repository's house rules (for pull requests from untrusted forks)" };
        var against = new Option<string?>("--against") { Description = "Compare with the merge base of this git ref (e.g. origin/main): check the specs changed since then, with metric deltas and findings new, resolved or unchanged" };
        var gate = new Option<string>("--gate") { Description = "With --against: 'all' (default) fails on any finding in the changed specs, 'new' only on findings the change introduced", DefaultValueFactory = _ => "all" };
        gate.AcceptOnlyFromAmong("all", "new");
        var shard = new Option<string?>("--shard") { Description = "Check only shard i of n (i/n, e.g. 2/4; stable by path hash); combine the JSON outputs with 'speclint merge'" };
        var accepted = new Option<string?>("--accepted") { Description = "A file written by 'speclint accept': its findings are reported as accepted and do not fail the run; entries that match nothing are listed" };
        var command = new Command("check", "Check spec files: schema, analysis, rules. Exit 0 pass, 1 findings at the fail level, 2 unusable input")
        {
            paths, format, report, html, sarif, failOn, config, asOf, nominal, quiet, noHouseRules, against, gate, accepted, shard,
        };
        command.SetAction(parse =>
        {
            var error = parse.InvocationConfiguration.Error;
            var output = parse.InvocationConfiguration.Output;
            if (!TryDate(parse.GetValue(asOf), out var today))
            {
                error.WriteLine($"speclint: --as-of: '{parse.GetValue(asOf)}' is not a date; write e.g. 2027-03-31");
                return ExitCodes.UnusableInput;
            }

            var configPath = parse.GetValue(config);
            if (configPath is not null && !File.Exists(configPath))
            {
                error.WriteLine($"speclint: --config: no such file '{configPath}'");
                return ExitCodes.UnusableInput;
            }

            var inputs = parse.GetValue(paths) ?? [];
            var request = new OutputRequest(parse.GetValue(format)!, parse.GetValue(report), parse.GetValue(html), parse.GetValue(sarif));
            foreach (var (name, target, extension) in new[] { ("--report", request.ReportPath, ".md"), ("--html", request.HtmlPath, ".html"), ("--sarif", request.SarifPath, ".sarif") })
            {
                if (target is not null && !OutputGuard.IsSafeTarget(target, inputs, extension, out var why))
                {
                    error.WriteLine($"speclint: {name}: {why}");
                    return ExitCodes.UnusableInput;
                }
            }

            SeverityNames.TryParse(parse.GetValue(failOn), out var fail);
            var options = new CheckOptions
            {
                Paths = inputs,
                ConfigPath = configPath,
                Today = today,
                FailOn = parse.GetValue(failOn) is null ? null : fail,
                Tolerances = !parse.GetValue(nominal),
                Progress = Progress.For(error, parse.GetValue(quiet)),
                HouseRules = parse.GetValue(noHouseRules) ? null : HouseRuleSources.Create(),
            };
            if (parse.GetValue(gate) == "new" && parse.GetValue(against) is null)
            {
                error.WriteLine("speclint: --gate new needs --against <ref>: only a comparison with a base tells which findings are new");
                return ExitCodes.UnusableInput;
            }

            Shard? part = null;
            if (parse.GetValue(shard) is { } shardText && (part = Shard.Parse(shardText, out var shardError)) is null)
            {
                error.WriteLine($"speclint: {shardError}");
                return ExitCodes.UnusableInput;
            }

            if (part is not null)
            {
                options = options with { Select = part.Contains };
                request = request with { ShardData = true };
            }

            ImmutableArray<AcceptedEntry>? acceptedEntries = null;
            if (parse.GetValue(accepted) is { } acceptedPath)
            {
                if (!File.Exists(acceptedPath))
                {
                    error.WriteLine($"speclint: --accepted: no such file '{acceptedPath}'; write one with 'speclint accept {acceptedPath}'");
                    return ExitCodes.UnusableInput;
                }

                acceptedEntries = AcceptedFile.Read(acceptedPath, acceptedPath, out var why);
                if (acceptedEntries is null)
                {
                    error.WriteLine($"speclint: {why}");
                    return ExitCodes.UnusableInput;
                }
            }

            CheckRun run;
            if (parse.GetValue(against) is { } reference)
            {
                var changes = GitChanges.Read(Directory.GetCurrentDirectory(), reference, out var why);
                if (changes is null)
                {
                    error.WriteLine($"speclint: {why}");
                    return ExitCodes.UnusableInput;
                }

                run = ChangeCheck.Run(options, changes, parse.GetValue(gate) == "new" ? Gate.New : Gate.All);
            }
            else
            {
                run = CheckRunner.Run(options);
            }

            if (acceptedEntries is { } entries)
            {
                run = run with { Acceptance = Acceptance.Apply(parse.GetValue(accepted)!, entries, run.Specs) };
            }

            return Outputs.Write(run, request, output, error);
        });
        return command;
    }

    private static string DefaultFormat() =>
        string.Equals(Environment.GetEnvironmentVariable("GITHUB_ACTIONS"), "true", StringComparison.OrdinalIgnoreCase) ? "github" : "text";

    private static bool TryDate(string? text, out DateOnly date)
    {
        if (text is null)
        {
            date = DateOnly.FromDateTime(DateTime.UtcNow);
            return true;
        }

        return DateOnly.TryParseExact(text, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out date);
    }
}
