using System.Runtime.InteropServices;

namespace SpecLint.Core.Files;

/// <summary>
/// Tells regular files from named pipes, devices and sockets before anything is opened: opening a named pipe
/// blocks until a writer appears, and a device such as /dev/zero never ends, so both must be refused by
/// their type, not by what reading them does.
/// </summary>
/// <remarks>
/// .NET has no public API for the file type on Unix (<see cref="FileAttributes"/> only knows folders and
/// links), so this asks the runtime's own native shim, which every .NET runtime on Unix ships and whose
/// status record starts with two 32-bit fields (flags, then the POSIX mode). On Windows there are no named
/// pipes or devices in the file namespace that a spec path could name, so attributes suffice.
/// </remarks>
internal static class FileKinds
{
    private const int TypeMask = 0xF000;
    private const int RegularType = 0x8000;
    private const int DirectoryType = 0x4000;

    /// <summary>The kind of file at <paramref name="path"/>, following symbolic links.</summary>
    public static FileKind Of(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (path.Length == 0 || path.Contains('\0', StringComparison.Ordinal))
        {
            return FileKind.Missing;
        }

        if (!OperatingSystem.IsWindows())
        {
            try
            {
                if (NativeStat(path, out var status) != 0)
                {
                    return FileKind.Missing;
                }

                return (status.Mode & TypeMask) switch
                {
                    RegularType => FileKind.Regular,
                    DirectoryType => FileKind.Directory,
                    _ => FileKind.Special,
                };
            }
            catch (Exception e) when (e is DllNotFoundException or EntryPointNotFoundException)
            {
                // Fall through to the portable (weaker) check below.
            }
        }

        if (Directory.Exists(path))
        {
            return FileKind.Directory;
        }

        return File.Exists(path) ? FileKind.Regular : FileKind.Missing;
    }

    /// <summary>Whether the path itself (not what it points to) is a symbolic link.</summary>
    public static bool IsSymbolicLink(string path)
    {
        try
        {
            return new FileInfo(path).LinkTarget is not null;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            return false;
        }
    }

    [DllImport("libSystem.Native", EntryPoint = "SystemNative_Stat", SetLastError = true)]
    private static extern int NativeStat([MarshalAs(UnmanagedType.LPUTF8Str)] string path, out NativeFileStatus status);

    /// <summary>The start of the runtime's status record; sized generously so the native side never writes past it.</summary>
    [StructLayout(LayoutKind.Sequential, Size = 512)]
    private struct NativeFileStatus
    {
        public int Flags;
        public int Mode;
    }
}
