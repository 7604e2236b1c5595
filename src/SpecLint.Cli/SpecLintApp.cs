using System.CommandLine;
using SpecLint.Cli.Commands;
using SpecLint.Rules.Engine;

namespace SpecLint.Cli;

/// <summary>The command tree. Commands are thin: they parse options, call the libraries and pick an exit code.</summary>
public static class SpecLintApp
{
    /// <summary>Runs the tool with <paramref name="args"/>, writing to the given streams; returns the exit code.</summary>
    public static int Run(string[] args, TextWriter output, TextWriter error)
    {
        var root = new RootCommand("SpecLint: design-rule checks for transimpedance front-end specs. A design aid: verify on the bench.")
        {
            CheckCommand.Create(),
            DemoCommand.Create(),
            SchemaCommand.Create(),
            RulesCommand.Create(),
            WhyCommand.Create(),
            NewRuleCommand.Create(),
            TestRulesCommand.Create(),
        };

        var problem = UsageCheck.Problem(root, args);
        if (problem is not null)
        {
            error.WriteLine($"speclint: {problem}");
            error.WriteLine("Run 'speclint --help' for usage.");
            return ExitCodes.UnusableInput;
        }

        var parse = root.Parse(args);
        var config = new InvocationConfiguration { Output = output, Error = error, EnableDefaultExceptionHandler = false };
        if (parse.Errors.Count > 0)
        {
            foreach (var e in parse.Errors)
            {
                error.WriteLine($"speclint: {e.Message}");
            }

            error.WriteLine("Run 'speclint --help' for usage.");
            return ExitCodes.UnusableInput;
        }

        try
        {
            return parse.Invoke(config);
        }
        catch (Exception e) when (e is not OutOfMemoryException)
        {
            error.WriteLine($"speclint: internal error: {e.GetType().Name}: {e.Message}");
            error.WriteLine("This is a bug in SpecLint; please report it with the spec that triggered it.");
            return ExitCodes.InternalError;
        }
    }
}
