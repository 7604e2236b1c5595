using SpecLint.Cli;

return SpecLintApp.Run(args, Console.Out, Console.Error);
