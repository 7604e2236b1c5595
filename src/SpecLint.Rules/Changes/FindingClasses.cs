using System.Collections.Immutable;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Changes;

/// <summary>A changed spec's findings sorted by what the change did to them.</summary>
/// <param name="New">On the head only.</param>
/// <param name="Resolved">At the base only (these carry the base's file and line).</param>
/// <param name="Unchanged">On both (the head's copy).</param>
internal sealed record FindingClasses(ImmutableArray<Finding> New, ImmutableArray<Finding> Resolved, ImmutableArray<Finding> Unchanged)
{
    /// <summary>
    /// Pairs base and head findings by <see cref="FindingKey"/>. Identities can repeat (one rule reporting twice
    /// at one key), so they are matched as multisets: the surplus on the head is new, on the base resolved.
    /// </summary>
    public static FindingClasses Classify(string? baseName, IEnumerable<Finding> baseFindings, string headName, IEnumerable<Finding> headFindings)
    {
        ArgumentNullException.ThrowIfNull(baseFindings);
        ArgumentNullException.ThrowIfNull(headFindings);
        var pending = new Dictionary<FindingKey, Queue<Finding>>();
        foreach (var f in baseFindings)
        {
            var key = FindingKey.Of(baseName ?? "", f);
            if (!pending.TryGetValue(key, out var queue))
            {
                pending[key] = queue = new Queue<Finding>();
            }

            queue.Enqueue(f);
        }

        var added = ImmutableArray.CreateBuilder<Finding>();
        var unchanged = ImmutableArray.CreateBuilder<Finding>();
        foreach (var f in headFindings)
        {
            if (baseName is not null && pending.TryGetValue(FindingKey.Of(headName, f), out var queue) && queue.Count > 0)
            {
                queue.Dequeue();
                unchanged.Add(f);
            }
            else
            {
                added.Add(f);
            }
        }

        var resolved = pending.Values.SelectMany(q => q).ToImmutableArray();
        return new FindingClasses(added.ToImmutable(), resolved, unchanged.ToImmutable());
    }

    /// <summary>No findings in any class.</summary>
    public static FindingClasses None { get; } = new([], [], []);
}
