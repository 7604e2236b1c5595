using System.Collections.Immutable;
using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using SpecLint.HouseRules.Compiling;
using SpecLint.HouseRules.Discovery;
using SpecLint.Rules.Engine;

namespace SpecLint.HouseRules.Loading;

/// <summary>
/// Compiled house rules on disk, keyed by a hash of the sources, SpecLint's own build and the compile options,
/// so an unchanged folder of rules is loaded without starting the compiler. The folder is the user's cache
/// folder (<c>$XDG_CACHE_HOME/speclint</c>, <c>~/.cache/speclint</c>), never the repository, unless
/// <c>SPECLINT_CACHE</c> names another. Entries are written to a temporary name and renamed into place, the
/// description last, so a reader never sees half an entry.
/// </summary>
internal sealed class HouseRuleCache(string folder)
{
    /// <summary>The environment variable that moves the cache.</summary>
    public const string EnvironmentVariable = "SPECLINT_CACHE";

    private static readonly JsonSerializerOptions Json = new() { WriteIndented = false };

    /// <summary>The folder entries are kept in.</summary>
    public string Folder { get; } = folder;

    /// <summary>The cache at <c>SPECLINT_CACHE</c> or the user's cache folder.</summary>
    public static HouseRuleCache Default()
    {
        var configured = Environment.GetEnvironmentVariable(EnvironmentVariable);
        if (!string.IsNullOrWhiteSpace(configured))
        {
            return new HouseRuleCache(Path.GetFullPath(configured));
        }

        var xdg = Environment.GetEnvironmentVariable("XDG_CACHE_HOME");
        var root = !string.IsNullOrWhiteSpace(xdg) ? xdg
            : OperatingSystem.IsWindows() ? Environment.GetFolderPath(Environment.SpecialFolder.LocalApplicationData)
            : Path.Combine(Environment.GetFolderPath(Environment.SpecialFolder.UserProfile), ".cache");
        return new HouseRuleCache(Path.Combine(root, "speclint", "house-rules"));
    }

    /// <summary>The key of a set of sources: their paths and text, SpecLint's assemblies and the compile options.</summary>
    public static string Key(IReadOnlyList<SourceFile> files, string optionsFingerprint)
    {
        using var hash = IncrementalHash.CreateHash(HashAlgorithmName.SHA256);
        void Add(string s)
        {
            var bytes = Encoding.UTF8.GetBytes(s);
            hash.AppendData(BitConverter.GetBytes(bytes.Length));
            hash.AppendData(bytes);
        }

        Add("speclint-house-rules/1");
        foreach (var assembly in new[] { typeof(IRule).Assembly, typeof(Core.Units.Capacitance).Assembly, typeof(HouseRuleCache).Assembly })
        {
            Add(assembly.ManifestModule.ModuleVersionId.ToString());
        }

        Add(optionsFingerprint);
        foreach (var f in files.OrderBy(f => f.RelativePath, StringComparer.Ordinal))
        {
            Add(f.RelativePath);
            Add(f.Text);
        }

        return Convert.ToHexStringLower(hash.GetHashAndReset());
    }

    /// <summary>The entry for <paramref name="key"/>, or null when there is none or it cannot be read.</summary>
    public CompiledRules? TryLoad(string key)
    {
        try
        {
            var description = Path.Combine(Folder, key + ".json");
            if (!File.Exists(description))
            {
                return null;
            }

            var entry = JsonSerializer.Deserialize<Entry>(File.ReadAllBytes(description), Json);
            if (entry is null)
            {
                return null;
            }

            byte[]? image = null, symbols = null;
            if (entry.HasImage)
            {
                image = File.ReadAllBytes(Path.Combine(Folder, key + ".dll"));
                symbols = File.ReadAllBytes(Path.Combine(Folder, key + ".pdb"));
            }

            return new CompiledRules(image, symbols, [.. entry.Problems], [.. entry.Rules]);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or JsonException or NotSupportedException)
        {
            return null;
        }
    }

    /// <summary>Stores an entry; a cache that cannot be written only costs the next run a compile.</summary>
    public void Store(string key, CompiledRules compiled)
    {
        try
        {
            Directory.CreateDirectory(Folder);
            if (compiled.Image is { } image && compiled.Symbols is { } symbols)
            {
                WriteAtomically(Path.Combine(Folder, key + ".dll"), image);
                WriteAtomically(Path.Combine(Folder, key + ".pdb"), symbols);
            }

            var entry = new Entry(compiled.Image is not null, [.. compiled.Problems], [.. compiled.Rules]);
            WriteAtomically(Path.Combine(Folder, key + ".json"), JsonSerializer.SerializeToUtf8Bytes(entry, Json));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException)
        {
            // Not cached: the next run compiles again.
        }
    }

    private static void WriteAtomically(string path, byte[] bytes)
    {
        var temp = path + "." + Environment.ProcessId + "." + Guid.NewGuid().ToString("N")[..8] + ".tmp";
        File.WriteAllBytes(temp, bytes);
        File.Move(temp, path, overwrite: true);
    }

    private sealed record Entry(bool HasImage, List<CompileProblem> Problems, List<DeclaredType> Rules);
}
