namespace SpecLint.Core.Spec;

/// <summary>Source positions of every node of a spec, keyed by RFC 6901 JSON Pointer ("" is the root).</summary>
/// <remarks>
/// A run keeps every spec (and every gain setting's view) until its output is written, so the map is two sorted
/// arrays searched by halves, and its pointers are shared between specs (<see cref="PointerPool"/>): a hashed or
/// frozen dictionary with its own copy of each pointer took several times the memory for the few lookups a spec needs.
/// </remarks>
public sealed class SourceMap
{
    private readonly string[] _keys;
    private readonly SourcePosition[] _values;

    /// <summary>Creates a map from pointer → position pairs.</summary>
    public SourceMap(IReadOnlyDictionary<string, SourcePosition> positions)
    {
        ArgumentNullException.ThrowIfNull(positions);
        _keys = new string[positions.Count];
        _values = new SourcePosition[positions.Count];
        var i = 0;
        foreach (var (key, value) in positions)
        {
            _keys[i] = PointerPool.Share(key);
            _values[i] = value;
            i++;
        }

        Array.Sort(_keys, _values, StringComparer.Ordinal);
    }

    /// <summary>An empty map (every lookup gives the start of the file).</summary>
    public static SourceMap Empty { get; } = new(new Dictionary<string, SourcePosition>());

    /// <summary>
    /// The same map, where each view key also locates: a key under <c>View</c> is found where the same key under
    /// <c>File</c> is written (a gain setting's <c>/feedback/resistance</c> at <c>/feedback/settings/1/resistance</c>).
    /// </summary>
    internal SourceMap WithAliases(IEnumerable<(string View, string File)> aliases)
    {
        var positions = new Dictionary<string, SourcePosition>(_keys.Length, StringComparer.Ordinal);
        for (var i = 0; i < _keys.Length; i++)
        {
            positions[_keys[i]] = _values[i];
        }

        foreach (var (view, file) in aliases)
        {
            for (var i = 0; i < _keys.Length; i++)
            {
                var (key, pos) = (_keys[i], _values[i]);
                if (key == file || (view != "/feedback" && key.StartsWith(file + "/", StringComparison.Ordinal)))
                {
                    positions[view + key[file.Length..]] = pos;
                }
            }
        }

        return new SourceMap(positions);
    }

    /// <summary>Whether the pointer names a node that was written in the file.</summary>
    public bool Contains(string pointer) => Array.BinarySearch(_keys, pointer, StringComparer.Ordinal) >= 0;

    /// <summary>
    /// The position of the node, or of its nearest written ancestor when the key was left out (a finding
    /// about a missing Cf points at the <c>feedback</c> block).
    /// </summary>
    public SourcePosition Locate(string pointer)
    {
        var p = pointer;
        while (true)
        {
            var at = Array.BinarySearch(_keys, p, StringComparer.Ordinal);
            if (at >= 0)
            {
                return _values[at];
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
