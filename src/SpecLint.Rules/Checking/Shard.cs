using System.Buffers.Binary;
using System.Globalization;
using System.Security.Cryptography;
using System.Text;

namespace SpecLint.Rules.Checking;

/// <summary>
/// One of n shards (<c>--shard i/n</c>): a spec file belongs to shard (hash of its path mod n) + 1, the hash
/// being the first 8 bytes (big-endian) of the SHA-256 of the path's UTF-8 bytes, as shown (relative to the
/// working directory, forward slashes). The same path lands in the same shard on every machine and every run,
/// and paths that differ in one digit spread evenly (a plain FNV hash puts most of them in one shard of two).
/// </summary>
/// <param name="Index">1-based shard number.</param>
/// <param name="Count">How many shards.</param>
internal sealed record Shard(int Index, int Count)
{
    /// <summary>Parses <c>i/n</c> with 1 ≤ i ≤ n; null with a message otherwise.</summary>
    public static Shard? Parse(string text, out string? error)
    {
        ArgumentNullException.ThrowIfNull(text);
        var parts = text.Split('/');
        if (parts.Length == 2
            && int.TryParse(parts[0], NumberStyles.None, CultureInfo.InvariantCulture, out var i)
            && int.TryParse(parts[1], NumberStyles.None, CultureInfo.InvariantCulture, out var n)
            && n >= 1 && i >= 1 && i <= n)
        {
            error = null;
            return new Shard(i, n);
        }

        error = $"--shard: '{text}' is not a shard; write i/n with 1 ≤ i ≤ n, e.g. 2/4";
        return null;
    }

    /// <summary>True when <paramref name="path"/> belongs to this shard.</summary>
    public bool Contains(string path) => Of(path, Count) == Index;

    /// <summary>The 1-based shard of <paramref name="path"/> among <paramref name="count"/>.</summary>
    public static int Of(string path, int count)
    {
        ArgumentNullException.ThrowIfNull(path);
        var digest = SHA256.HashData(Encoding.UTF8.GetBytes(path.Replace('\\', '/')));
        var hash = BinaryPrimitives.ReadUInt64BigEndian(digest);
        return (int)(hash % (ulong)count) + 1;
    }
}
