using System.Buffers;
using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;
using SpecLint.Core.Text;
using YamlDotNet.Core;
using YamlDotNet.Core.Events;

namespace SpecLint.Core.Spec.Yaml;

/// <summary>
/// Reads one YAML document into a <see cref="JsonNode"/> tree over YamlDotNet's parser events, keeping the
/// source position of every node. Hardened for untrusted files: size, depth and node caps, no aliases, no
/// merge keys, no duplicate keys, one document, strict UTF-8. It never throws for bad input.
/// </summary>
/// <remarks>
/// Aliases are refused rather than expanded: a spec has no use for them, and refusing makes alias bombs a
/// one-line error. Depth is checked on every start event, before any recursion, so a file of a million
/// <c>[</c> stops at the 65th.
/// </remarks>
internal static partial class YamlTreeReader
{
    /// <summary>Largest file accepted, checked before parsing (1 MiB).</summary>
    public const int MaxFileBytes = 1024 * 1024;

    /// <summary>Deepest nesting of maps and lists accepted.</summary>
    public const int MaxDepth = 64;

    /// <summary>Most nodes (maps, lists and scalars) accepted in one file.</summary>
    public const int MaxNodes = 100_000;

    internal const string EmptyMessage = "the file is empty";

    private static readonly UTF8Encoding StrictUtf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true);

    [GeneratedRegex(@"^\(Line: \d+, Col: \d+, Idx: \d+\) - \(Line: \d+, Col: \d+, Idx: \d+\): ", RegexOptions.CultureInvariant)]
    private static partial Regex MarkPrefixRegex();

    /// <summary>Reads raw file bytes: checks the size, strips a UTF-8 byte order mark, refuses invalid UTF-8.</summary>
    public static YamlTree Read(ReadOnlySpan<byte> bytes)
    {
        if (bytes.Length > MaxFileBytes)
        {
            return Fail(1, 1, TooLargeMessage(bytes.Length));
        }

        if (bytes.StartsWith((ReadOnlySpan<byte>)[0xEF, 0xBB, 0xBF]))
        {
            bytes = bytes[3..];
        }

        if (FindInvalidUtf8(bytes) is { } bad)
        {
            var (line, column) = LineAndColumn(bytes[..bad]);
            return Fail(line, column, $"byte 0x{bytes[bad]:X2} is not valid UTF-8; save the file as UTF-8 (without a legacy code page such as Latin-1)");
        }

        return Read(StrictUtf8.GetString(bytes));
    }

    /// <summary>Reads YAML text (already decoded).</summary>
    public static YamlTree Read(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (text.Length > 0 && text[0] == '\uFEFF')
        {
            text = text[1..];
        }

        // The byte cap also bounds text handed over directly (a UTF-16 char is at least one UTF-8 byte).
        if (text.Length > MaxFileBytes)
        {
            return Fail(1, 1, $"the file is over {MaxFileBytes.ToString(CultureInfo.InvariantCulture)} bytes (1 MiB); split it into one file per channel");
        }

        if (TextScreen.FindDisallowed(text) is { } bad)
        {
            return Fail(bad.Line, bad.Column, bad.Message);
        }

        var state = new ReaderState(new Parser(new StringReader(text)), text);
        return state.Run();
    }

    /// <summary>The message for a file over <see cref="MaxFileBytes"/>, also used before reading a file from disk.</summary>
    internal static string TooLargeMessage(long length) =>
        $"the file is {length.ToString(CultureInfo.InvariantCulture)} bytes; files are limited to {MaxFileBytes.ToString(CultureInfo.InvariantCulture)} bytes (1 MiB), split it into one file per channel";

    private static YamlTree Fail(int line, int column, string message) =>
        new(null, false, new Dictionary<string, SourcePosition>(), new Dictionary<string, string>(), [new YamlProblem(line, column, "", message)]);

    private static int? FindInvalidUtf8(ReadOnlySpan<byte> bytes)
    {
        var i = 0;
        while (i < bytes.Length)
        {
            var status = Rune.DecodeFromUtf8(bytes[i..], out _, out var consumed);
            if (status != OperationStatus.Done)
            {
                return i;
            }

            i += consumed;
        }

        return null;
    }

    private static (int Line, int Column) LineAndColumn(ReadOnlySpan<byte> before)
    {
        var line = 1;
        var lineStart = 0;
        for (var i = 0; i < before.Length; i++)
        {
            if (before[i] == (byte)'\n')
            {
                line++;
                lineStart = i + 1;
            }
        }

        // Columns count characters as the YAML parser does, not bytes, so "µ" before the bad byte counts once.
        var column = StrictUtf8.GetCharCount(before[lineStart..]) + 1;
        return (line, column);
    }

    internal static string CleanMessage(YamlException e)
    {
        var message = MarkPrefixRegex().Replace(e.Message, "");
        if (message.Length > 0)
        {
            message = char.ToLowerInvariant(message[0]) + message[1..];
        }

        return "YAML syntax: " + message.TrimEnd('.');
    }

    /// <summary>Thrown inside the reader to stop at a problem that leaves no usable tree.</summary>
    private sealed class FatalProblem(Mark mark, string pointer, string message) : Exception(message)
    {
        public Mark Mark { get; } = mark;

        public string Pointer { get; } = pointer;
    }

    private static (int Line, int Column)? FindIndentTab(string text)
    {
        var lines = text.Split('\n');
        for (var i = 0; i < lines.Length; i++)
        {
            var indent = lines[i].Length - lines[i].TrimStart(' ', '\t').Length;
            var tab = lines[i].IndexOf('\t', 0, indent);
            if (tab >= 0 && indent < lines[i].TrimEnd('\r').Length)
            {
                return (i + 1, tab + 1);
            }
        }

        return null;
    }

    private sealed class ReaderState(Parser parser, string text)
    {
        private readonly Dictionary<string, SourcePosition> _positions = new(StringComparer.Ordinal);
        private readonly Dictionary<string, string> _scalarText = new(StringComparer.Ordinal);
        private readonly List<YamlProblem> _problems = [];
        private int _nodes;

        public YamlTree Run()
        {
            try
            {
                Expect<StreamStart>();
                if (!parser.MoveNext() || parser.Current is StreamEnd)
                {
                    throw new FatalProblem(Mark.Empty, "", EmptyMessage + "; a spec starts with \"spec: 1\"");
                }

                if (parser.Current is not DocumentStart)
                {
                    throw new FatalProblem(parser.Current!.Start, "", "YAML syntax: expected a document");
                }

                parser.MoveNext();
                var root = ReadNode("", 0, null);
                parser.MoveNext();
                if (parser.Current is not DocumentEnd)
                {
                    throw new FatalProblem(parser.Current?.Start ?? Mark.Empty, "", "YAML syntax: expected the end of the document");
                }

                parser.MoveNext();
                if (parser.Current is DocumentStart second)
                {
                    throw new FatalProblem(second.Start, "", "the file holds more than one YAML document (a second \"---\"); put each channel in its own file");
                }

                return new YamlTree(root, true, _positions, _scalarText, Clamped());
            }
            catch (FatalProblem f)
            {
                _problems.Add(new YamlProblem(Line(f.Mark), Column(f.Mark), f.Pointer, f.Message));
            }
            catch (YamlException e)
            {
                // YamlDotNet marks a tab in indentation at the start of the enclosing mapping (often 1:1), so the
                // tab itself is looked up in the text; everything else is reported at the exception's Start.
                var (line, column) = e.Message.Contains("tab", StringComparison.Ordinal) && FindIndentTab(text) is { } tab
                    ? tab
                    : (Line(e.Start), Column(e.Start));
                _problems.Add(new YamlProblem(line, column, "", CleanMessage(e)));
            }
            catch (InvalidOperationException)
            {
                // YamlDotNet 18.1.0's scanner throws this (not a YamlException) when the text ends inside an
                // unclosed flow collection, e.g. "{ a: 1". The last event read is the best position we have.
                var last = parser.Current?.End ?? Mark.Empty;
                _problems.Add(new YamlProblem(Line(last), Column(last), "",
                    "YAML syntax: the file ends inside a { } or [ ]; a closing bracket is missing"));
            }

            return new YamlTree(null, false, _positions, _scalarText, Clamped());
        }

        /// <summary>
        /// The parser places an error at the end of the input one line past the last line break; a position
        /// outside the file helps no one (an editor cannot jump there), so it is moved to the end of the last line.
        /// </summary>
        private ImmutableArray<YamlProblem> Clamped()
        {
            var lines = text.Split(["\r\n", "\n", "\r"], StringSplitOptions.None);
            var lastLine = lines.Length;
            while (lastLine > 1 && lines[lastLine - 1].Length == 0)
            {
                lastLine--;
            }

            return [.. _problems.Select(p =>
            {
                var line = Math.Min(p.Line, lastLine);
                var column = Math.Min(p.Column, lines[line - 1].Length + 1);
                return p.Line == line && p.Column == column ? p : p with { Line = line, Column = column };
            })];
        }

        private static int Line(Mark m) => (int)Math.Max(1, m.Line);

        private static int Column(Mark m) => (int)Math.Max(1, m.Column);

        private void Expect<T>()
            where T : ParsingEvent
        {
            if (!parser.MoveNext() || parser.Current is not T)
            {
                throw new FatalProblem(parser.Current?.Start ?? Mark.Empty, "", $"YAML syntax: expected {typeof(T).Name}");
            }
        }

        private void Count(ParsingEvent ev, string pointer)
        {
            if (++_nodes > MaxNodes)
            {
                throw new FatalProblem(ev.Start, pointer, $"the file has more than {MaxNodes.ToString(CultureInfo.InvariantCulture)} values; a spec file describes one channel");
            }
        }

        private JsonNode? ReadNode(string pointer, int depth, Mark? keyMark)
        {
            var ev = parser.Current ?? throw new FatalProblem(Mark.Empty, pointer, "YAML syntax: unexpected end of file");
            Count(ev, pointer);
            switch (ev)
            {
                case AnchorAlias alias:
                    throw new FatalProblem(alias.Start, pointer, $"aliases (*{alias.Value}) are not supported in spec files; write the value out in full");
                case Scalar s:
                    return ReadScalar(s, pointer, keyMark);
                case MappingStart ms:
                    return ReadMapping(ms, pointer, depth + 1, keyMark);
                case SequenceStart ss:
                    return ReadSequence(ss, pointer, depth + 1, keyMark);
                default:
                    throw new FatalProblem(ev.Start, pointer, "YAML syntax: unexpected " + ev.GetType().Name);
            }
        }

        private void CheckDepth(ParsingEvent ev, string pointer, int depth)
        {
            if (depth > MaxDepth)
            {
                throw new FatalProblem(ev.Start, pointer, $"maps and lists are nested more than {MaxDepth.ToString(CultureInfo.InvariantCulture)} deep; a spec needs only a few levels");
            }
        }

        private void CheckTag(string pointer, Mark start, YamlDotNet.Core.TagName tag, bool scalar)
        {
            if (tag.IsEmpty || tag.IsNonSpecific)
            {
                return;
            }

            // Every tag is refused, !!str included: a spec types its values by key, and a tag the reader
            // ignored (on a key, say) would make the file mean something other than what it shows.
            var what = scalar ? "" : " on a map or list";
            _problems.Add(new YamlProblem(Line(start), Column(start), pointer, $"the YAML tag \"{TextSafety.ForTerminal(tag.Value)}\"{what} is not supported in spec files; remove it (quote a value to keep it as text)"));
        }

        private void Record(string pointer, Mark start, Mark end, Mark? keyMark)
        {
            _positions[pointer] = new SourcePosition(Line(start), Column(start), Line(end), Column(end),
                keyMark is { } k ? Line(k) : 0, keyMark is { } k2 ? Column(k2) : 0);
        }

        private JsonNode? ReadScalar(Scalar s, string pointer, Mark? keyMark)
        {
            Record(pointer, s.Start, s.End, keyMark);
            _scalarText[pointer] = s.Value;
            CheckTag(pointer, s.Start, s.Tag, scalar: true);
            if (s.Style != ScalarStyle.Plain || (!s.Tag.IsEmpty && !s.Tag.IsNonSpecific))
            {
                return JsonValue.Create(s.Value);
            }

            if (!YamlScalarResolver.TryResolvePlain(s.Value, out var value, out var error))
            {
                _problems.Add(new YamlProblem(Line(s.Start), Column(s.Start), pointer, error!));
                return null;
            }

            return value;
        }

        private JsonObject ReadMapping(MappingStart ms, string pointer, int depth, Mark? keyMark)
        {
            CheckDepth(ms, pointer, depth);
            CheckTag(pointer, ms.Start, ms.Tag, scalar: false);
            var obj = new JsonObject();
            while (parser.MoveNext() && parser.Current is not MappingEnd)
            {
                if (parser.Current is not Scalar key)
                {
                    var what = parser.Current is AnchorAlias ? "an alias" : "a map or a list";
                    throw new FatalProblem(parser.Current!.Start, pointer, $"a key must be plain text, not {what}");
                }

                Count(key, pointer);
                CheckTag(JsonPointerText.Append(pointer, key.Value), key.Start, key.Tag, scalar: true);
                parser.MoveNext();
                var childPointer = JsonPointerText.Append(pointer, key.Value);
                if (key.Value == "<<" && key.Style == ScalarStyle.Plain)
                {
                    _problems.Add(new YamlProblem(Line(key.Start), Column(key.Start), pointer, "merge keys (<<) are not supported in spec files; write the keys out in full"));
                    Skip(depth);
                    continue;
                }

                if (obj.ContainsKey(key.Value))
                {
                    var first = _positions.TryGetValue(childPointer, out var p) ? p.KeyLine : 0;
                    _problems.Add(new YamlProblem(Line(key.Start), Column(key.Start), childPointer,
                        $"duplicate key \"{key.Value}\" (first written on line {first.ToString(CultureInfo.InvariantCulture)}); keep one of them"));
                    Skip(depth);
                    continue;
                }

                obj[key.Value] = ReadNode(childPointer, depth, key.Start);
            }

            Record(pointer, ms.Start, parser.Current?.End ?? ms.End, keyMark);
            return obj;
        }

        private JsonArray ReadSequence(SequenceStart ss, string pointer, int depth, Mark? keyMark)
        {
            CheckDepth(ss, pointer, depth);
            CheckTag(pointer, ss.Start, ss.Tag, scalar: false);
            var array = new JsonArray();
            var index = 0;
            while (parser.MoveNext() && parser.Current is not SequenceEnd)
            {
                array.Add(ReadNode(JsonPointerText.Append(pointer, index++), depth, null));
            }

            Record(pointer, ss.Start, parser.Current?.End ?? ss.End, keyMark);
            return array;
        }

        /// <summary>Consumes the current node without building it (the value of a refused key); iterative, so depth costs no stack.</summary>
        private void Skip(int depth)
        {
            var open = 0;
            do
            {
                var ev = parser.Current ?? throw new FatalProblem(Mark.Empty, "", "YAML syntax: unexpected end of file");
                Count(ev, "");
                if (ev is MappingStart or SequenceStart)
                {
                    open++;
                    CheckDepth(ev, "", depth + open);
                }
                else if (ev is MappingEnd or SequenceEnd)
                {
                    open--;
                }

                if (open == 0)
                {
                    return;
                }
            }
            while (parser.MoveNext());
        }
    }
}
