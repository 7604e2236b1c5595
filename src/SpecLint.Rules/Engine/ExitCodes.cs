namespace SpecLint.Rules.Engine;

/// <summary>Process exit codes (references.md §D5).</summary>
internal static class ExitCodes
{
    /// <summary>Nothing at or above the fail level.</summary>
    public const int Clean = 0;

    /// <summary>At least one unwaived finding at or above the fail level.</summary>
    public const int FindingsAtFailLevel = 1;

    /// <summary>Unusable input or invocation: a spec or configuration that cannot be read, a bad option.</summary>
    public const int UnusableInput = 2;

    /// <summary>A bug in SpecLint or a rule (an exception escaped); reported with a request to file an issue.</summary>
    public const int InternalError = 3;
}
