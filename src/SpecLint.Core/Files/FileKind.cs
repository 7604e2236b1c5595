namespace SpecLint.Core.Files;

/// <summary>What a path names, as far as SpecLint cares: only regular files are ever opened for reading.</summary>
internal enum FileKind
{
    /// <summary>Nothing at this path (or a dangling symbolic link).</summary>
    Missing,

    /// <summary>A regular file (possibly reached through symbolic links).</summary>
    Regular,

    /// <summary>A folder.</summary>
    Directory,

    /// <summary>A named pipe, a device, a socket or anything else that is neither a file nor a folder.</summary>
    Special,
}
