using System.Diagnostics;
using System.Reflection;
using SpecLint.HouseRules.Compiling;

namespace SpecLint.HouseRules.Guarding;

/// <summary>The host's hold on the budget class compiled into a house-rule assembly: arm it before a rule runs, read whether it tripped after.</summary>
internal sealed class BudgetHandle
{
    private readonly Func<long, long> _enter;
    private readonly Func<long, bool> _exit;

    private BudgetHandle(Func<long, long> enter, Func<long, bool> exit)
    {
        _enter = enter;
        _exit = exit;
    }

    /// <summary>The budget of a loaded house-rule assembly.</summary>
    public static BudgetHandle For(Assembly assembly)
    {
        var type = assembly.GetType(BudgetRuntime.TypeName, throwOnError: true)!;
        const BindingFlags flags = BindingFlags.Public | BindingFlags.Static;
        return new BudgetHandle(
            type.GetMethod("Enter", flags)!.CreateDelegate<Func<long, long>>(),
            type.GetMethod("Exit", flags)!.CreateDelegate<Func<long, bool>>());
    }

    /// <summary>Runs <paramref name="action"/> with a deadline <paramref name="limit"/> from now; tells whether the budget tripped and how long it took.</summary>
    public (bool Tripped, TimeSpan Elapsed) Run(TimeSpan limit, Action action)
    {
        var start = Stopwatch.GetTimestamp();
        var previous = _enter(start + (long)(limit.TotalSeconds * Stopwatch.Frequency));
        var tripped = false;
        try
        {
            action();
        }
        finally
        {
            tripped = _exit(previous);
        }

        return (tripped, Stopwatch.GetElapsedTime(start));
    }
}
