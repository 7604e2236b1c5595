using System.Collections.Immutable;
using SpecLint.Core.Spec.Schema;
using SpecLint.Core.Spec.Yaml;

namespace SpecLint.Core.Spec;

/// <summary>
/// Collects the problems of one file at their source positions and remembers which keys already failed, so a
/// key that failed the schema is not also reported by the unit parser (no cascades).
/// </summary>
internal sealed class DiagnosticSink(string file, string ruleId, YamlTree tree)
{
    private readonly List<SpecDiagnostic> _items = [];
    private readonly HashSet<string> _failed = new(StringComparer.Ordinal);

    public int Count => _items.Count;

    /// <summary>Whether the node or anything under it already has a problem.</summary>
    public bool HasFailedWithin(string pointer) =>
        _failed.Any(p => p == pointer || p.StartsWith(pointer + "/", StringComparison.Ordinal));

    /// <summary>Whether the node or one of its ancestors already has a problem.</summary>
    public bool HasFailed(string pointer)
    {
        var p = pointer;
        while (true)
        {
            if (_failed.Contains(p))
            {
                return true;
            }

            if (p.Length == 0)
            {
                return false;
            }

            p = JsonPointerText.Parent(p);
        }
    }

    public void AtValue(string pointer, string message) => Add(pointer, Position(pointer, atKey: false), message);

    public void AtKey(string pointer, string message) => Add(pointer, Position(pointer, atKey: true), message);

    public void AtLine(int line, int column, string pointer, string message)
    {
        _failed.Add(pointer);
        _items.Add(new SpecDiagnostic(file, line, column, ruleId, pointer, message));
    }

    public void AddYaml(IEnumerable<YamlProblem> problems)
    {
        foreach (var p in problems)
        {
            AtLine(p.Line, p.Column, p.Pointer, p.Message);
        }
    }

    /// <summary>Adds schema violations; <paramref name="rewrite"/> may replace a message (null drops the violation).</summary>
    public void AddSchema(IEnumerable<SchemaViolation> violations, Func<SchemaViolation, string?>? rewrite = null)
    {
        foreach (var v in violations)
        {
            // A node the YAML reader already complained about (e.g. ".inf" read as empty) needs no second message.
            if (v.Location != ViolationLocation.Parent && _failed.Contains(v.Pointer))
            {
                continue;
            }

            var message = rewrite is null ? v.Message : rewrite(v);
            if (message is null)
            {
                continue;
            }

            switch (v.Location)
            {
                case ViolationLocation.Key:
                    AtKey(v.Pointer, message);
                    break;
                case ViolationLocation.Parent:
                    // Reported on the parent (a missing key has no position) without marking the parent failed,
                    // so its other keys are still checked.
                    var parent = JsonPointerText.Parent(v.Pointer);
                    var at = Position(parent, atKey: true);
                    _items.Add(new SpecDiagnostic(file, at.Line, at.Column, ruleId, parent, message));
                    _failed.Add(v.Pointer);
                    break;
                default:
                    AtValue(v.Pointer, message);
                    break;
            }
        }
    }

    public ImmutableArray<SpecDiagnostic> ToImmutable() =>
        [.. _items.OrderBy(d => d.Line).ThenBy(d => d.Column)];

    private void Add(string pointer, (int Line, int Column) at, string message)
    {
        _failed.Add(pointer);
        _items.Add(new SpecDiagnostic(file, at.Line, at.Column, ruleId, pointer, message));
    }

    private (int Line, int Column) Position(string pointer, bool atKey)
    {
        var map = tree.Positions;
        var p = pointer;
        while (true)
        {
            if (map.TryGetValue(p, out var pos))
            {
                return atKey && pos.KeyLine > 0 ? (pos.KeyLine, pos.KeyColumn) : (pos.Line, pos.Column);
            }

            if (p.Length == 0)
            {
                return (1, 1);
            }

            p = JsonPointerText.Parent(p);
            atKey = true;
        }
    }
}
