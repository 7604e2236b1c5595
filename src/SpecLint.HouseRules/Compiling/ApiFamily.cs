namespace SpecLint.HouseRules.Compiling;

/// <summary>Why an API is refused in a house rule, in the words the finding uses.</summary>
internal static class ApiFamily
{
    public const string Files = "file access";
    public const string Network = "network access";
    public const string Processes = "processes and diagnostics";
    public const string Environment = "the environment";
    public const string Console = "the console";
    public const string Reflection = "reflection";
    public const string Threading = "threading";
    public const string Unsafe = "unsafe code";
    public const string Native = "native code (P/Invoke)";
    public const string Dynamic = "dynamic";
    public const string AssemblyLoading = "assembly loading";
    public const string Nondeterminism = "clocks and unseeded randomness (results must repeat exactly)";
    public const string Finalizers = "finalizers (they run on another thread, outside the budget)";
    public const string NotAllowed = "outside the allow-list";
}
