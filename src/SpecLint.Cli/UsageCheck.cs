using System.CommandLine;
using SpecLint.Cli.Commands;
using SpecLint.Core.Spec.Schema;

namespace SpecLint.Cli;

/// <summary>
/// Looks at the raw arguments before parsing, so that a mistyped command or option is reported with a
/// did-you-mean instead of being taken for a spec path (<c>check --formt json</c> must not look for a file
/// called <c>--formt</c>). Arguments after <c>--</c> are paths whatever they look like.
/// </summary>
internal static class UsageCheck
{
    /// <summary>Verbs people bring from other tools, with the SpecLint command that does the job.</summary>
    private static readonly Dictionary<string, string> Moved = new(StringComparer.OrdinalIgnoreCase)
    {
        ["explain"] = $"'explain' is not a SpecLint command. A rule's page is 'speclint {WhyCommand.Name} <id>' (for example 'speclint {WhyCommand.Name} phase-margin'); 'speclint rules' lists the ids.",
    };

    /// <summary>The problem with <paramref name="args"/> as a message, or null when the words are all known.</summary>
    public static string? Problem(RootCommand root, IReadOnlyList<string> args)
    {
        ArgumentNullException.ThrowIfNull(root);
        ArgumentNullException.ThrowIfNull(args);
        if (args.Count == 0)
        {
            return null;
        }

        var first = args[0];
        if (Moved.TryGetValue(first, out var moved))
        {
            return moved;
        }

        var command = root.Subcommands.FirstOrDefault(c => c.Name == first || c.Aliases.Contains(first));
        if (command is null)
        {
            if (first.StartsWith('-'))
            {
                var name = first.Split('=', 2)[0];
                return root.Options.Any(o => o.Name == name || o.Aliases.Contains(name)) ? null : UnknownOption(name, root, root);
            }

            var close = Suggest(first, root.Subcommands.Where(c => !c.Hidden).Select(c => c.Name));
            return $"unknown command '{first}'.{(close is null ? "" : $" Did you mean '{close}'?")} Commands: {string.Join(", ", root.Subcommands.Where(c => !c.Hidden).Select(c => c.Name))}.";
        }

        for (var i = 1; i < args.Count; i++)
        {
            var token = args[i];
            if (token == "--")
            {
                break;
            }

            if (!token.StartsWith('-') || token == "-")
            {
                continue;
            }

            var name = token.Split('=', 2)[0];
            var option = Options(command, root).FirstOrDefault(o => o.Name == name || o.Aliases.Contains(name));
            if (option is null)
            {
                return UnknownOption(name, command, root);
            }

            // The next word is this option's value, even when it starts with '-'.
            if (!token.Contains('=', StringComparison.Ordinal) && option.Arity.MaximumNumberOfValues > 0 && option.ValueType != typeof(bool))
            {
                i++;
            }
        }

        return null;
    }

    private static string UnknownOption(string name, Command command, RootCommand root)
    {
        var names = Options(command, root).Where(o => !o.Hidden).Select(o => o.Name).ToList();
        var close = Suggest(name, names);
        var where = command is RootCommand ? "speclint" : $"'{command.Name}'";
        return $"unknown option '{name}' for {where}.{(close is null ? "" : $" Did you mean '{close}'?")} Options: {string.Join(", ", names)}. A path that starts with '-' goes after '--'.";
    }

    /// <summary>The one word that starts with what was typed (a truncated option), else the closest slip, else null.</summary>
    private static string? Suggest(string typed, IEnumerable<string> words)
    {
        var list = words.ToList();
        var longer = list.Where(w => w.StartsWith(typed, StringComparison.OrdinalIgnoreCase) && typed.TrimStart('-').Length >= 3).ToList();
        return longer.Count == 1 ? longer[0] : EditDistance.Closest(typed, list);
    }

    private static IEnumerable<Option> Options(Command command, RootCommand root) =>
        command == root ? root.Options : command.Options.Concat(root.Options.Where(o => o.Recursive));
}
