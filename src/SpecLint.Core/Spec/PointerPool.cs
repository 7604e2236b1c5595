using System.Collections.Concurrent;

namespace SpecLint.Core.Spec;

/// <summary>
/// One shared copy of each JSON Pointer that source maps hold: every spec of a repository has the same few hundred
/// pointers, and a run keeps thousands of specs. Bounded, so a file with endless distinct keys cannot make the pool
/// grow without limit; past the bound a pointer simply keeps its own copy.
/// </summary>
internal static class PointerPool
{
    private const int MaxEntries = 20_000;
    private static readonly ConcurrentDictionary<string, string> Pool = new(StringComparer.Ordinal);

    /// <summary>The shared instance equal to <paramref name="pointer"/> (the argument itself when it is the first, or the pool is full).</summary>
    public static string Share(string pointer)
    {
        if (Pool.TryGetValue(pointer, out var shared))
        {
            return shared;
        }

        return Pool.Count < MaxEntries ? Pool.GetOrAdd(pointer, pointer) : pointer;
    }
}
