using System.Globalization;

namespace SpecLint.Core.Files;

/// <summary>
/// Reads a whole input file with a size cap that holds while reading, not only by the length the file
/// claims (a device or a file growing under us claims nothing useful). Pipes, devices, sockets and folders
/// are refused before they are opened.
/// </summary>
internal static class BoundedFileReader
{
    /// <summary>Reads at most <paramref name="maxBytes"/> bytes; false with a message that needs no file name in front.</summary>
    public static bool TryRead(string path, int maxBytes, out byte[] bytes, out string error)
    {
        ArgumentNullException.ThrowIfNull(path);
        bytes = [];
        switch (FileKinds.Of(path))
        {
            case FileKind.Missing:
                error = "cannot read the file: no such file";
                return false;
            case FileKind.Directory:
                error = "this is a folder, not a file; give the path of a file";
                return false;
            case FileKind.Special:
                error = "this is not a regular file (a named pipe, device or socket); SpecLint reads only regular files, so it is not opened";
                return false;
        }

        try
        {
            using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1, FileOptions.SequentialScan);
            var buffer = new byte[Math.Min(maxBytes + 1, stream.CanSeek ? (int)Math.Min(stream.Length + 1, maxBytes + 1) : maxBytes + 1)];
            var total = 0;
            while (true)
            {
                if (total == buffer.Length)
                {
                    if (buffer.Length > maxBytes)
                    {
                        error = TooLarge(maxBytes);
                        return false;
                    }

                    Array.Resize(ref buffer, Math.Min(maxBytes + 1, Math.Max(4096, buffer.Length * 2)));
                }

                var read = stream.Read(buffer, total, buffer.Length - total);
                if (read == 0)
                {
                    break;
                }

                total += read;
            }

            bytes = total == buffer.Length ? buffer : buffer[..total];
            error = "";
            return true;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException or ArgumentException)
        {
            error = "cannot read the file: " + e.Message;
            return false;
        }
    }

    /// <summary>The message for a file over the cap.</summary>
    public static string TooLarge(int maxBytes) =>
        $"the file is over {maxBytes.ToString(CultureInfo.InvariantCulture)} bytes (1 MiB); split it into one file per channel";
}
