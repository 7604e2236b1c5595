using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using SpecLint.Rules.Changes;

namespace SpecLint.Rules.Accepting;

/// <summary>
/// The accepted-findings file a team commits (<c>speclint accept</c> writes it, <c>check --accepted</c> reads it):
/// JSON, one entry per finding identity, ordinal by spec, rule and pointer so a diff of it reads well.
/// </summary>
internal static class AcceptedFile
{
    /// <summary>The format version written in the file.</summary>
    public const int Version = 1;

    private static readonly string[] Keys = ["rule", "spec", "pointer", "setting", "reason", "date"];

    /// <summary>Reads <paramref name="path"/>; on a problem returns null with a <c>file:line:col: message</c> error.</summary>
    public static ImmutableArray<AcceptedEntry>? Read(string path, string displayPath, out string? error)
    {
        ArgumentNullException.ThrowIfNull(path);
        byte[] bytes;
        try
        {
            bytes = File.ReadAllBytes(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException or ArgumentException)
        {
            error = $"{displayPath}: cannot read the accepted-findings file: {e.Message}";
            return null;
        }

        return Parse(bytes, displayPath, out error);
    }

    /// <summary>Parses the file's bytes; see <see cref="Read"/>.</summary>
    public static ImmutableArray<AcceptedEntry>? Parse(byte[] bytes, string displayPath, out string? error)
    {
        ArgumentNullException.ThrowIfNull(bytes);
        var reader = new Utf8JsonReader(bytes, new JsonReaderOptions { CommentHandling = JsonCommentHandling.Skip });
        var entries = ImmutableArray.CreateBuilder<AcceptedEntry>();
        string? Fail(long offset, string message)
        {
            var (line, column) = Position(bytes, offset);
            return string.Create(CultureInfo.InvariantCulture, $"{displayPath}:{line}:{column}: {message}");
        }

        try
        {
            if (!reader.Read() || reader.TokenType != JsonTokenType.StartObject)
            {
                error = Fail(reader.TokenStartIndex, "expected a JSON object { \"version\": 1, \"accepted\": [...] }");
                return null;
            }

            var sawAccepted = false;
            while (reader.Read() && reader.TokenType == JsonTokenType.PropertyName)
            {
                var name = reader.GetString();
                var at = reader.TokenStartIndex;
                reader.Read();
                if (name == "version")
                {
                    if (reader.TokenType != JsonTokenType.Number || !reader.TryGetInt32(out var v) || v != Version)
                    {
                        error = Fail(reader.TokenStartIndex, $"\"version\" must be {Version}");
                        return null;
                    }
                }
                else if (name == "accepted")
                {
                    sawAccepted = true;
                    if (reader.TokenType != JsonTokenType.StartArray)
                    {
                        error = Fail(reader.TokenStartIndex, "\"accepted\" must be a list of entries");
                        return null;
                    }

                    while (reader.Read() && reader.TokenType != JsonTokenType.EndArray)
                    {
                        if (ReadEntry(ref reader, bytes, out var entry, out var problemAt, out var problem))
                        {
                            entries.Add(entry!);
                        }
                        else
                        {
                            error = Fail(problemAt, problem!);
                            return null;
                        }
                    }
                }
                else
                {
                    error = Fail(at, $"unknown key \"{name}\"; the file has \"version\" and \"accepted\"");
                    return null;
                }
            }

            if (!sawAccepted)
            {
                error = Fail(0, "missing \"accepted\": the list of accepted findings");
                return null;
            }
        }
        catch (JsonException e)
        {
            error = $"{displayPath}:{(e.LineNumber ?? 0) + 1}:{(e.BytePositionInLine ?? 0) + 1}: not valid JSON: {e.Message.Split(" LineNumber", 2)[0]}";
            return null;
        }

        error = null;
        return entries.ToImmutable();
    }

    private static bool ReadEntry(ref Utf8JsonReader reader, byte[] bytes, out AcceptedEntry? entry, out long problemAt, out string? problem)
    {
        entry = null;
        problemAt = reader.TokenStartIndex;
        if (reader.TokenType != JsonTokenType.StartObject)
        {
            problem = "each accepted entry is an object with \"rule\", \"spec\", \"pointer\", \"reason\" and \"date\"";
            return false;
        }

        var start = reader.TokenStartIndex;
        var values = new Dictionary<string, string?>(StringComparer.Ordinal);
        while (reader.Read() && reader.TokenType == JsonTokenType.PropertyName)
        {
            var name = reader.GetString()!;
            var at = reader.TokenStartIndex;
            reader.Read();
            if (!Keys.Contains(name, StringComparer.Ordinal))
            {
                problemAt = at;
                problem = $"unknown key \"{name}\" in an accepted entry; the keys are {string.Join(", ", Keys)}";
                return false;
            }

            if (reader.TokenType is not (JsonTokenType.String or JsonTokenType.Null))
            {
                problemAt = reader.TokenStartIndex;
                problem = $"\"{name}\" must be a string";
                reader.Skip();
                return false;
            }

            values[name] = reader.TokenType == JsonTokenType.Null ? null : reader.GetString();
        }

        foreach (var required in new[] { "rule", "spec", "pointer", "date" })
        {
            if (values.GetValueOrDefault(required) is null)
            {
                problemAt = start;
                problem = $"an accepted entry lacks \"{required}\"";
                return false;
            }
        }

        if (!DateOnly.TryParseExact(values["date"], "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out var date))
        {
            problemAt = start;
            problem = $"\"date\": '{values["date"]}' is not a date; write e.g. 2027-03-31";
            return false;
        }

        entry = new AcceptedEntry(
            new FindingKey(values["rule"]!, values["spec"]!, values["pointer"]!, values.GetValueOrDefault("setting")),
            values.GetValueOrDefault("reason"),
            date,
            Position(bytes, start).Line);
        problem = null;
        return true;
    }

    /// <summary>The file text for <paramref name="entries"/>, ordinal by spec, rule and pointer, one entry per identity.</summary>
    public static string Write(IEnumerable<AcceptedEntry> entries)
    {
        ArgumentNullException.ThrowIfNull(entries);
        using var buffer = new MemoryStream();
        using (var w = new Utf8JsonWriter(buffer, new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping }))
        {
            w.WriteStartObject();
            w.WriteNumber("version", Version);
            w.WriteStartArray("accepted");
            foreach (var e in entries.DistinctBy(e => e.Key).Order(Comparer<AcceptedEntry>.Create((a, b) => FindingKey.Compare(a.Key, b.Key))))
            {
                w.WriteStartObject();
                w.WriteString("rule", e.Key.Rule);
                w.WriteString("spec", e.Key.Spec);
                w.WriteString("pointer", e.Key.Pointer);
                if (e.Key.Setting is not null)
                {
                    w.WriteString("setting", e.Key.Setting);
                }

                if (e.Reason is null)
                {
                    w.WriteNull("reason");
                }
                else
                {
                    w.WriteString("reason", e.Reason);
                }

                w.WriteString("date", e.Date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture));
                w.WriteEndObject();
            }

            w.WriteEndArray();
            w.WriteEndObject();
        }

        return Encoding.UTF8.GetString(buffer.ToArray()) + "\n";
    }

    private static (int Line, int Column) Position(byte[] bytes, long offset)
    {
        var line = 1;
        var column = 1;
        for (var i = 0; i < offset && i < bytes.Length; i++)
        {
            if (bytes[i] == (byte)'\n')
            {
                line++;
                column = 1;
            }
            else if ((bytes[i] & 0xC0) != 0x80)
            {
                column++;
            }
        }

        return (line, column);
    }
}
