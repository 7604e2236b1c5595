using SpecLint.Cli;

// A regular expression in a house rule runs inside the base library, where the house-rule budget cannot tick:
// a default match timeout (read once, before any Regex exists) turns a runaway pattern into an exception that
// is reported as house-rule-failed. SpecLint's own patterns are linear and far from it.
AppContext.SetData("REGEX_DEFAULT_MATCH_TIMEOUT", TimeSpan.FromSeconds(5));

return SpecLintApp.Run(args, Console.Out, Console.Error);
