using System.Collections.Frozen;

namespace SpecLint.Core.Spec;

/// <summary>Source positions of every node of a spec, keyed by RFC 6901 JSON Pointer ("" is the root).</summary>
public sealed class SourceMap
{
    private readonly FrozenDictionary<string, SourcePosition> _positions;

    /// <summary>Creates a map from pointer → position pairs.</summary>
    public SourceMap(IReadOnlyDictionary<string, SourcePosition> positions)
    {
        _positions = positions.ToFrozenDictionary(StringComparer.Ordinal);
    }

    /// <summary>An empty map (every lookup gives the start of the file).</summary>
    public static SourceMap Empty { get; } = new(new Dictionary<string, SourcePosition>());

    /// <summary>
    /// The same map, where each view key also locates: a key under <c>View</c> is found where the same key under
    /// <c>File</c> is written (a gain setting's <c>/feedback/resistance</c> at <c>/feedback/settings/1/resistance</c>).
    /// </summary>
    internal SourceMap WithAliases(IEnumerable<(string View, string File)> aliases)
    {
        var positions = new Dictionary<string, SourcePosition>(_positions, StringComparer.Ordinal);
        foreach (var (view, file) in aliases)
        {
            foreach (var (key, pos) in _positions)
            {
                if (key == file || (view != "/feedback" && key.StartsWith(file + "/", StringComparison.Ordinal)))
                {
                    positions[view + key[file.Length..]] = pos;
                }
            }
        }

        return new SourceMap(positions);
    }

    /// <summary>Whether the pointer names a node that was written in the file.</summary>
    public bool Contains(string pointer) => _positions.ContainsKey(pointer);

    /// <summary>
    /// The position of the node, or of its nearest written ancestor when the key was left out (a finding
    /// about a missing Cf points at the <c>feedback</c> block).
    /// </summary>
    public SourcePosition Locate(string pointer)
    {
        var p = pointer;
        while (true)
        {
            if (_positions.TryGetValue(p, out var pos))
            {
                return pos;
            }

            if (p.Length == 0)
            {
                return SourcePosition.FileStart;
            }

            var slash = p.LastIndexOf('/');
            p = slash <= 0 ? "" : p[..slash];
        }
    }

    /// <summary>
    /// The position a message about this key should point at: the key itself when the value is a block
    /// (so the editor lands on "feedback:"), otherwise the value.
    /// </summary>
    public SourcePosition LocateKeyOrValue(string pointer)
    {
        var at = Locate(pointer);
        return at.KeyLine > 0 && at.KeyLine != at.Line
            ? at with { Line = at.KeyLine, Column = at.KeyColumn }
            : at;
    }
}
