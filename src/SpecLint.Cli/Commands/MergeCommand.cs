using System.CommandLine;
using System.Text.Json.Nodes;
using SpecLint.Reporting;
using SpecLint.Reporting.Json;
using SpecLint.Reporting.Model;
using SpecLint.Rules.Engine;

namespace SpecLint.Cli.Commands;

/// <summary>
/// <c>speclint merge SHARD.json…</c>: combines the JSON outputs of <c>check --shard i/n</c> into the JSON one
/// unsharded run writes (on stdout), optionally with the Markdown and HTML reports and SARIF that run writes;
/// exits with the code the unsharded run would have.
/// </summary>
internal static class MergeCommand
{
    public const string Name = "merge";

    public static Command Create()
    {
        var files = new Argument<string[]>("files") { Description = "The JSON outputs of the shards ('check --shard i/n --format json')", Arity = ArgumentArity.OneOrMore };
        var report = new Option<string?>("--report") { Description = "Also write the Markdown review report of all shards to this file (SVG plots in a folder beside it)" };
        var html = new Option<string?>("--html") { Description = "Also write the report of all shards as one standalone HTML page" };
        var sarif = new Option<string?>("--sarif") { Description = "Also write SARIF 2.1.0 for the merged findings to this file" };
        var command = new Command(Name, "Combine the JSON outputs of sharded checks into one JSON (and report and SARIF); run it where the shards ran") { files, report, html, sarif };
        command.SetAction(parse =>
        {
            var error = parse.InvocationConfiguration.Error;
            var names = parse.GetValue(files) ?? [];
            var targets = new[] { ("--report", parse.GetValue(report), ".md"), ("--html", parse.GetValue(html), ".html"), ("--sarif", parse.GetValue(sarif), ".sarif") };
            foreach (var (option, target, extension) in targets)
            {
                if (target is not null && !OutputGuard.IsSafeTarget(target, names, extension, out var why))
                {
                    error.WriteLine($"speclint: {option}: {why}");
                    return ExitCodes.UnusableInput;
                }
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

            var failed = false;
            var reports = parse.GetValue(report) is not null || parse.GetValue(html) is not null;
            var parts = new List<ReportData>();
            foreach (var (name, bytes) in shards)
            {
                // JsonMerge has parsed every document already, so each is an object here. The reports need every
                // shard's report data; SARIF only takes the house rules from it (a plain check's JSON has none).
                var root = JsonNode.Parse(bytes)!.AsObject();
                if (!reports && root[ReportDataJson.Member] is null)
                {
                    continue;
                }

                if (ReportDataJson.Read(name, root, out var why) is not { } part)
                {
                    error.WriteLine($"speclint: {why}");
                    return ExitCodes.UnusableInput;
                }

                parts.Add(part);
            }

            var data = parts.Count > 0 ? ReportDataMerge.Merge(parts) : null;
            const string Title = ReportTitle.Default;
            if (data is not null && parse.GetValue(report) is { } md)
            {
                failed |= !Outputs.TryWrite("--report", () => Outputs.WriteMarkdown(data, md, Title), error);
            }

            if (data is not null && parse.GetValue(html) is { } page)
            {
                failed |= !Outputs.TryWrite("--html", () => Outputs.WriteHtml(data, page, Title), error);
            }

            if (parse.GetValue(sarif) is { } sarifPath)
            {
                failed |= !Outputs.TryWrite("--sarif", () => Outputs.WriteSarif(JsonMerge.Findings(merged), data?.HouseRules ?? [], sarifPath), error);
            }

            parse.InvocationConfiguration.Output.Write(merged);
            return failed ? ExitCodes.UnusableInput : JsonMerge.ExitCode(merged);
        });
        return command;
    }
}
