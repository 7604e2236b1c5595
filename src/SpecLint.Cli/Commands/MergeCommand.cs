using System.CommandLine;
using SpecLint.Reporting.Json;
using SpecLint.Rules.Engine;

namespace SpecLint.Cli.Commands;

/// <summary>
/// <c>speclint merge SHARD.json…</c>: combines the JSON outputs of <c>check --shard i/n</c> into the JSON one
/// unsharded run writes (on stdout), optionally with SARIF; exits with the code the unsharded run would have.
/// </summary>
internal static class MergeCommand
{
    public const string Name = "merge";

    public static Command Create()
    {
        var files = new Argument<string[]>("files") { Description = "The JSON outputs of the shards ('check --shard i/n --format json')", Arity = ArgumentArity.OneOrMore };
        var sarif = new Option<string?>("--sarif") { Description = "Also write SARIF 2.1.0 for the merged findings to this file" };
        var command = new Command(Name, "Combine the JSON outputs of sharded checks into one JSON (and SARIF)") { files, sarif };
        command.SetAction(parse =>
        {
            var error = parse.InvocationConfiguration.Error;
            var names = parse.GetValue(files) ?? [];
            var sarifPath = parse.GetValue(sarif);
            if (sarifPath is not null && !OutputGuard.IsSafeTarget(sarifPath, names, ".sarif", out var why))
            {
                error.WriteLine($"speclint: --sarif: {why}");
                return ExitCodes.UnusableInput;
            }

            var shards = new List<(string, byte[])>();
            foreach (var name in names)
            {
                try
                {
                    shards.Add((name, File.ReadAllBytes(name)));
                }
                catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException or ArgumentException)
                {
                    error.WriteLine($"speclint: {name}: cannot read the file: {e.Message}");
                    return ExitCodes.UnusableInput;
                }
            }

            if (JsonMerge.Merge(shards, out var problem) is not { } merged)
            {
                error.WriteLine($"speclint: {problem}");
                return ExitCodes.UnusableInput;
            }

            parse.InvocationConfiguration.Output.Write(merged);
            if (sarifPath is not null)
            {
                Outputs.WriteSarif(JsonMerge.Findings(merged), sarifPath);
            }

            return JsonMerge.ExitCode(merged);
        });
        return command;
    }
}
