using System.Text;

namespace SpecLint.Core.Files;

/// <summary>
/// Writes a file so that readers only ever see the old content or the complete new content: the bytes go to
/// a temporary file in the same folder (same filesystem, so the rename is atomic), are flushed to disk, and
/// the temporary file is renamed over the target. An interrupted run leaves the old file (and at worst a
/// stray <c>.*.tmp</c> beside it); two runs writing the same target leave one complete result.
/// </summary>
internal static class AtomicFile
{
    private static readonly UTF8Encoding Utf8 = new(encoderShouldEmitUTF8Identifier: false);

    /// <summary>Writes UTF-8 text (no byte order mark); creates the folder if needed. Throws <see cref="OutputException"/> on any failure.</summary>
    public static void WriteAllText(string path, string text) =>
        WriteAllBytes(path, Utf8.GetBytes(text ?? throw new ArgumentNullException(nameof(text))));

    /// <summary>Writes bytes; creates the folder if needed. Throws <see cref="OutputException"/> on any failure.</summary>
    public static void WriteAllBytes(string path, ReadOnlySpan<byte> bytes)
    {
        ArgumentNullException.ThrowIfNull(path);
        var full = OutputPath(path);
        var folder = Path.GetDirectoryName(full)!;
        switch (FileKinds.Of(full))
        {
            case FileKind.Directory:
                throw new OutputException(path, "it is a folder; give a file name");
            case FileKind.Special:
                throw new OutputException(path, "it is not a regular file (a device, named pipe or socket); give the path of a file");
        }

        CreateFolder(path, folder);
        var temp = Path.Combine(folder, "." + Path.GetFileName(full) + "." + Guid.NewGuid().ToString("N")[..12] + ".tmp");
        try
        {
            using (var stream = new FileStream(temp, FileMode.CreateNew, FileAccess.Write, FileShare.None, 64 * 1024))
            {
                stream.Write(bytes);
                stream.Flush(flushToDisk: true);
            }

            File.Move(temp, full, overwrite: true);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException)
        {
            TryDelete(temp);
            throw new OutputException(path, Reason(e));
        }
    }

    /// <summary>Creates a folder for output, or throws <see cref="OutputException"/> saying why it cannot be.</summary>
    public static void CreateFolder(string shownPath, string folder)
    {
        ArgumentNullException.ThrowIfNull(folder);
        try
        {
            if (FileKinds.Of(folder) is FileKind.Regular or FileKind.Special)
            {
                throw new OutputException(shownPath, $"'{folder}' is a file where a folder is needed");
            }

            Directory.CreateDirectory(folder);
        }
        catch (Exception e) when (e is not OutputException && e is IOException or UnauthorizedAccessException or NotSupportedException or ArgumentException)
        {
            throw new OutputException(shownPath, Reason(e));
        }
    }

    /// <summary>The full path of an output, or <see cref="OutputException"/> for a path that cannot name a file.</summary>
    public static string OutputPath(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (string.IsNullOrWhiteSpace(path))
        {
            throw new OutputException(path, "the path is empty");
        }

        try
        {
            var full = Path.GetFullPath(path);
            if (Path.GetFileName(full).Length == 0)
            {
                throw new OutputException(path, "the path names a folder, not a file");
            }

            return full;
        }
        catch (Exception e) when (e is ArgumentException or NotSupportedException or PathTooLongException)
        {
            throw new OutputException(path, Reason(e));
        }
    }

    private static string Reason(Exception e) => e switch
    {
        UnauthorizedAccessException => "permission denied (" + e.Message.TrimEnd('.') + ")",
        _ => e.Message.TrimEnd('.'),
    };

    private static void TryDelete(string temp)
    {
        try
        {
            File.Delete(temp);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // Best effort: a stray temporary file is harmless, the target is untouched.
        }
    }
}
