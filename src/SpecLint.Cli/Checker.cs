using SpecLint.Rules.Checking;

namespace SpecLint.Cli;

/// <summary>Runs a check with the analysis pieces the tool ships.</summary>
internal static class Checker
{
    public static CheckRun Run(CheckOptions options) => CheckRunner.Run(options);
}
