namespace SpecLint.HouseRules.Compiling;

/// <summary>
/// The small class compiled into every house-rule assembly that the instrumented code calls. It lives in the
/// rules' own assembly (so nothing of SpecLint's is exposed for it) and is reached by the host through
/// <c>BudgetHandle</c>. Thread-static state: each check runs a rule on one thread.
/// </summary>
internal static class BudgetRuntime
{
    public const string TypeName = "SpecLintHouseRuleBudget";

    public const string TickCall = "global::" + TypeName + ".Tick();";

    public const string FileName = "<speclint-budget>.cs";

    public const string Source = """
        internal static class SpecLintHouseRuleBudget
        {
            [global::System.ThreadStatic] private static long s_deadline;
            [global::System.ThreadStatic] private static bool s_tripped;

            // Called at every method entry and loop iteration of a house rule.
            public static void Tick()
            {
                // A runaway recursion must end as an exception, never as a stack overflow that kills the process.
                global::System.Runtime.CompilerServices.RuntimeHelpers.EnsureSufficientExecutionStack();
                if (s_tripped || (s_deadline != 0 && global::System.Diagnostics.Stopwatch.GetTimestamp() > s_deadline))
                {
                    s_tripped = true;
                    throw new global::System.OperationCanceledException("the house rule ran past its time budget");
                }
            }

            public static long Enter(long deadline)
            {
                var previous = s_deadline;
                s_deadline = deadline;
                s_tripped = false;
                return previous;
            }

            public static bool Exit(long previous)
            {
                var tripped = s_tripped;
                s_deadline = previous;
                s_tripped = false;
                return tripped;
            }
        }
        """;
}
