using System.Collections.Immutable;
using System.Text.Json.Nodes;

namespace SpecLint.Core.Spec.Yaml;

/// <summary>A YAML document read as a JSON tree, with the source position of every node.</summary>
internal sealed class YamlTree
{
    internal YamlTree(JsonNode? root, bool hasRoot, IReadOnlyDictionary<string, SourcePosition> positions,
        IReadOnlyDictionary<string, string> scalarText, ImmutableArray<YamlProblem> problems)
    {
        Root = root;
        HasRoot = hasRoot;
        Positions = positions;
        ScalarText = scalarText;
        Problems = problems;
    }

    /// <summary>True when the text holds no document at all (empty, or only comments); <see cref="Problems"/> then says so.</summary>
    public bool IsEmpty => !HasRoot && Problems.Length == 1 && Problems[0].Message.StartsWith(YamlTreeReader.EmptyMessage, StringComparison.Ordinal);

    /// <summary>The document as JSON; null for an unusable file or a document that is only <c>null</c>.</summary>
    public JsonNode? Root { get; }

    /// <summary>Whether a document was read to the end; false when a fatal problem stopped reading.</summary>
    public bool HasRoot { get; }

    /// <summary>The position of every node by RFC 6901 JSON Pointer ("" is the root).</summary>
    public IReadOnlyDictionary<string, SourcePosition> Positions { get; }

    /// <summary>
    /// The text of every scalar as written (without quotes), by pointer. Quantity parsing reads this rather
    /// than the resolved JSON value so that <c>1e-12</c> or <c>2.20</c> reach the unit grammar untouched.
    /// </summary>
    public IReadOnlyDictionary<string, string> ScalarText { get; }

    /// <summary>Problems found while reading; empty for a clean file.</summary>
    public ImmutableArray<YamlProblem> Problems { get; }

    /// <summary>A source map over <see cref="Positions"/>.</summary>
    public SourceMap ToSourceMap() => new(Positions);
}
