using SpecLint.Core.Files;
using SpecLint.Core.Spec.Schema;
using SpecLint.Core.Spec.Yaml;
using SpecLint.Core.Units;

namespace SpecLint.Core.Spec;

/// <summary>
/// Loads spec files: bytes → size and UTF-8 check → YAML tree with positions → schema → units → physics sanity
/// → <see cref="Model.TiaSpec"/>. Every problem in the file is collected and reported at its line and column;
/// nothing here throws for bad input.
/// </summary>
internal static class SpecLoader
{
    /// <summary>Reads and loads a spec file; <paramref name="displayPath"/> is the path messages show (default: <paramref name="path"/>).</summary>
    public static SpecLoadResult LoadFile(string path, string? displayPath = null)
    {
        ArgumentNullException.ThrowIfNull(path);
        var shown = displayPath ?? path;
        byte[] bytes;
        try
        {
            var info = new FileInfo(path);
            if (FileKinds.Of(path) == FileKind.Regular && info.Length > YamlTreeReader.MaxFileBytes)
            {
                // Checked before reading so a huge file is never pulled into memory.
                return new SpecLoadResult(null, [new SpecDiagnostic(shown, 1, 1, SpecDiagnostic.SpecInvalid, "", YamlTreeReader.TooLargeMessage(info.Length))]) { Unreadable = true };
            }

            if (!BoundedFileReader.TryRead(path, YamlTreeReader.MaxFileBytes, out bytes, out var why))
            {
                return new SpecLoadResult(null, [new SpecDiagnostic(shown, 1, 1, SpecDiagnostic.SpecInvalid, "", why)]) { Unreadable = true };
            }
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException or ArgumentException)
        {
            return new SpecLoadResult(null, [new SpecDiagnostic(shown, 1, 1, SpecDiagnostic.SpecInvalid, "", $"cannot read the file: {e.Message}")]) { Unreadable = true };
        }

        return LoadBytes(bytes, shown);
    }

    /// <summary>Loads a spec from raw file bytes (UTF-8, with or without a byte order mark).</summary>
    public static SpecLoadResult LoadBytes(ReadOnlySpan<byte> bytes, string displayPath) =>
        Load(YamlTreeReader.Read(bytes), displayPath);

    /// <summary>Loads a spec from text already in memory.</summary>
    public static SpecLoadResult LoadText(string text, string displayPath)
    {
        ArgumentNullException.ThrowIfNull(text);
        return Load(YamlTreeReader.Read(text), displayPath);
    }

    private static SpecLoadResult Load(YamlTree tree, string displayPath)
    {
        ArgumentNullException.ThrowIfNull(displayPath);
        var sink = new DiagnosticSink(displayPath, SpecDiagnostic.SpecInvalid, tree);
        sink.AddYaml(tree.Problems);
        if (!tree.HasRoot)
        {
            return new SpecLoadResult(null, sink.ToImmutable());
        }

        sink.AddSchema(SpecSchema.Validate(tree.Root), v => Reword(v, tree));
        var spec = new SpecModelReader(tree, sink).Read(displayPath);
        return new SpecLoadResult(spec, sink.ToImmutable());
    }

    /// <summary>
    /// The schema's quantity pattern is only a rough first check for editors; where it fails, the unit parser
    /// knows exactly what is wrong, so its message replaces the schema's.
    /// </summary>
    private static string? Reword(SchemaViolation v, YamlTree tree)
    {
        // The {min, typ, max} map is shared by every quantity key, so its example must come from the key's dimension.
        if (v.Keyword == "required" && JsonPointerText.Split(v.Pointer)[^1] is "min" or "typ" or "max"
            && QuantityKeys.DimensionOf(v.Pointer) is { } mapDimension)
        {
            var name = JsonPointerText.Split(v.Pointer)[^1];
            return $"missing required key \"{name}\", e.g. \"{name}: {UnitTable.Example(mapDimension)}\"";
        }

        if (v.Keyword != "pattern" || QuantityKeys.DimensionOf(v.Pointer) is not { } dimension
            || !tree.ScalarText.TryGetValue(v.Pointer, out var text))
        {
            return v.Message;
        }

        return QuantityParser.TryParse(text, dimension, out _, out var error) ? null : error;
    }
}
