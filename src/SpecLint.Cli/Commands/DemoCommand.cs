using System.CommandLine;
using System.Reflection;
using System.Text;
using SpecLint.Core.Files;
using SpecLint.Core.Text;
using SpecLint.Reporting.Terminal;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Cli.Commands;

/// <summary>
/// <c>speclint demo</c>: checks the built-in example channels of an invented instrument and writes a report
/// into one folder it names. It writes nothing else, and never into a folder it did not create.
/// </summary>
internal static class DemoCommand
{
    private const string Marker = ".speclint-demo";

    public static Command Create()
    {
        var outDir = new Option<string>("--out") { Description = "Folder for the demo specs and report (created; must be new or an earlier demo folder)", DefaultValueFactory = _ => "speclint-demo" };
        var command = new Command("demo", "Check the built-in demo specs and write a Markdown report") { outDir };
        command.SetAction(parse =>
        {
            var output = parse.InvocationConfiguration.Output;
            var error = parse.InvocationConfiguration.Error;
            var folder = parse.GetValue(outDir)!;
            if (Directory.Exists(folder) && Directory.EnumerateFileSystemEntries(folder).Any() && !File.Exists(Path.Combine(folder, Marker)))
            {
                error.WriteLine($"speclint: '{folder}' exists and was not made by 'speclint demo'; nothing was written. Choose another folder with --out.");
                return ExitCodes.UnusableInput;
            }

            if (FileKinds.Of(folder) is FileKind.Regular or FileKind.Special)
            {
                error.WriteLine($"speclint: '{TextSafety.ForTerminal(folder)}' exists and is a file, not a folder; nothing was written. Choose another folder with --out.");
                return ExitCodes.UnusableInput;
            }

            var specs = Path.Combine(folder, "specs");
            var report = Path.Combine(folder, "report.md");
            const string title = "SpecLint demo: the Saltmarsh Tern buoy's front ends";
            CheckRun run;
            try
            {
                AtomicFile.CreateFolder(folder, specs);
                AtomicFile.WriteAllText(Path.Combine(folder, Marker), "made by 'speclint demo'; safe to delete\n");
                foreach (var (name, text) in DemoSpecs())
                {
                    AtomicFile.WriteAllText(Path.Combine(specs, name), text);
                }

                var ruleFolder = Path.Combine(folder, "house-rules", DemoHouseRuleId);
                AtomicFile.CreateFolder(folder, ruleFolder);
                foreach (var (name, text) in Resources("SpecLint.Cli.DemoHouseRule."))
                {
                    AtomicFile.WriteAllText(Path.Combine(ruleFolder, name), text);
                }

                AtomicFile.WriteAllText(Path.Combine(folder, ".speclint.yaml"), DemoConfig);
                run = CheckRunner.Run(new CheckOptions { Paths = [specs], HouseRules = HouseRuleSources.Create() });
                Outputs.WriteMarkdown(run, report, title);
                Outputs.WriteHtml(run, Path.Combine(folder, "report.html"), title);
            }
            catch (OutputException e)
            {
                error.WriteLine($"speclint: demo: {TextSafety.ForTerminal(e.Message)}");
                return ExitCodes.UnusableInput;
            }

            TerminalReport.Write(run, output, color: false);
            output.WriteLine();
            output.WriteLine($"Demo report: {report} (plots in {Path.Combine(folder, "report-plots")}; one-page HTML: {Path.Combine(folder, "report.html")})");
            output.WriteLine("These channels are invented examples; some are clean and some carry deliberate design mistakes.");
            output.WriteLine($"'{DemoHouseRuleId}' is a house rule: a C# class in {Path.Combine(folder, "house-rules", DemoHouseRuleId)}, compiled and run at check time like the built-in rules.");
            output.WriteLine($"'speclint check {specs}' gives the same findings with the exit code CI would see ({run.ExitCode}).");
            return ExitCodes.Clean;
        });
        return command;
    }

    private const string DemoHouseRuleId = "build-spread";

    // The buoy team's configuration: one house rule of its own, with a tighter setting than its default.
    private const string DemoConfig = """
        # The demo team's SpecLint configuration: its own rule in house-rules/ (a C# class and its page),
        # compiled and run by 'speclint check' beside the built-in rules.
        house-rules: [house-rules/]
        rules:
          build-spread: { max-drop: 6 deg }

        """;

    /// <summary>The embedded demo specs, by file name, in a stable order.</summary>
    public static IEnumerable<(string Name, string Text)> DemoSpecs() => Resources("SpecLint.Cli.Demo.");

    private static IEnumerable<(string Name, string Text)> Resources(string prefix)
    {
        var asm = Assembly.GetExecutingAssembly();
        foreach (var resource in asm.GetManifestResourceNames().Where(n => n.StartsWith(prefix, StringComparison.Ordinal)).Order(StringComparer.Ordinal))
        {
            using var stream = asm.GetManifestResourceStream(resource)!;
            using var reader = new StreamReader(stream, Encoding.UTF8);
            yield return (resource[prefix.Length..], reader.ReadToEnd());
        }
    }
}
