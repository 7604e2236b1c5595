using System.Collections.Immutable;
using System.Text;
using SpecLint.Core.Config;
using SpecLint.Core.Files;
using SpecLint.Core.Spec;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.HouseRules.Discovery;

/// <summary>
/// Finds the house-rule C# files a configuration names: <c>house-rules: [folders or globs]</c>, relative to the
/// configuration's folder, or <c>house-rules/</c> beside it when the key is absent and the folder exists.
/// </summary>
internal static class HouseRuleFiles
{
    /// <summary>A single source larger than this is refused: rules are small classes.</summary>
    public const int MaxFileBytes = 512 * 1024;

    /// <summary>More files than this is refused: it is not a folder of rules.</summary>
    public const int MaxFiles = 1000;

    private static readonly string[] SkippedFolders = ["bin", "obj", ".git", "cases"];

    /// <summary>The files, sorted by relative path, and the problems met (missing folders, unreadable files, an empty folder).</summary>
    public static (ImmutableArray<SourceFile> Files, ImmutableArray<Finding> Problems) Find(RepoConfig config, Func<string, string> display)
    {
        ArgumentNullException.ThrowIfNull(config);
        ArgumentNullException.ThrowIfNull(display);
        var problems = new List<Finding>();
        if (config.Folder is not { } root)
        {
            return ([], []);
        }

        var configDisplay = display(config.Path!);
        var patterns = config.HouseRules.IsEmpty
            ? Directory.Exists(Path.Combine(root, RepoConfig.DefaultHouseRuleFolder)) ? [RepoConfig.DefaultHouseRuleFolder] : ImmutableArray<string>.Empty
            : config.HouseRules;
        var found = new SortedDictionary<string, string>(StringComparer.Ordinal);
        for (var i = 0; i < patterns.Length; i++)
        {
            var pattern = patterns[i];
            var pointer = config.HouseRules.IsEmpty ? "" : $"/house-rules/{i}";
            var at = pointer.Length == 0 ? SourcePosition.FileStart : config.Locations.Locate(pointer);
            var before = found.Count;
            if (pattern.IndexOfAny(['*', '?', '[']) >= 0)
            {
                var glob = new GlobPattern(pattern);
                foreach (var file in Walk(root))
                {
                    var rel = Relative(root, file);
                    if (glob.IsMatch(rel) && rel.EndsWith(".cs", StringComparison.Ordinal))
                    {
                        found[rel] = file;
                    }
                }
            }
            else
            {
                var full = Path.GetFullPath(Path.Combine(root, pattern));
                if (!IsInside(root, full))
                {
                    problems.Add(new Finding(RuleIds.ConfigInvalid, Severity.Error, configDisplay, pointer, at.Line, at.Column,
                        $"house-rules: '{pattern}' leaves the folder of {RepoConfig.FileName}; house rules live inside the repository"));
                    continue;
                }

                if (File.Exists(full) && full.EndsWith(".cs", StringComparison.Ordinal))
                {
                    found[Relative(root, full)] = full;
                }
                else if (!Directory.Exists(full))
                {
                    problems.Add(new Finding(RuleIds.ConfigInvalid, Severity.Error, configDisplay, pointer, at.Line, at.Column,
                        $"house-rules: no folder '{pattern}' beside {RepoConfig.FileName}; create it (speclint new-rule <id> does) or remove the entry"));
                    continue;
                }
                else
                {
                    foreach (var file in Walk(full).Where(f => f.EndsWith(".cs", StringComparison.Ordinal)))
                    {
                        found[Relative(root, file)] = file;
                    }
                }
            }

            if (found.Count == before)
            {
                problems.Add(new Finding(RuleIds.HouseRuleInvalid, Severity.Warning, configDisplay, pointer, at.Line, at.Column,
                    $"house-rules: '{pattern}' holds no C# files, so no house rule runs from it; add one with 'speclint new-rule <id>'"));
            }
        }

        if (found.Count > MaxFiles)
        {
            problems.Add(new Finding(RuleIds.HouseRuleInvalid, Severity.Error, configDisplay, "/house-rules", 1, 1,
                $"house-rules: {found.Count} C# files found, more than the {MaxFiles} a folder of rules may hold; narrow the folders or globs"));
            return ([], [.. problems]);
        }

        var files = ImmutableArray.CreateBuilder<SourceFile>();
        foreach (var (rel, full) in found)
        {
            if (Read(full, rel, display, problems) is { } text)
            {
                files.Add(new SourceFile(rel, full, text));
            }
        }

        return (files.ToImmutable(), [.. problems]);
    }

    private static string? Read(string full, string rel, Func<string, string> display, List<Finding> problems)
    {
        // The same guarded read as spec files: regular files only, capped while reading.
        if (!BoundedFileReader.TryRead(full, MaxFileBytes, out var bytes, out var error))
        {
            problems.Add(new Finding(RuleIds.HouseRuleInvalid, Severity.Error, display(full), "", 1, 1, $"cannot use {rel}: {error}"));
            return null;
        }

        try
        {
            return new UTF8Encoding(false, throwOnInvalidBytes: true).GetString(bytes).TrimStart('\uFEFF');
        }
        catch (DecoderFallbackException)
        {
            problems.Add(new Finding(RuleIds.HouseRuleInvalid, Severity.Error, display(full), "", 1, 1, $"{rel} is not UTF-8 text, so it cannot be C# source"));
            return null;
        }
    }

    // Regular files only, no symbolic links to folders (a link loop or a link out of the repository must not be walked).
    private static IEnumerable<string> Walk(string folder)
    {
        var pending = new Stack<string>();
        pending.Push(folder);
        while (pending.Count > 0)
        {
            var dir = pending.Pop();
            string[] files;
            string[] dirs;
            try
            {
                files = Directory.GetFiles(dir);
                dirs = Directory.GetDirectories(dir);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                continue;
            }

            foreach (var f in files.Order(StringComparer.Ordinal))
            {
                if (new FileInfo(f).LinkTarget is null)
                {
                    yield return f;
                }
            }

            foreach (var d in dirs.OrderDescending(StringComparer.Ordinal))
            {
                var info = new DirectoryInfo(d);
                if (info.LinkTarget is null && !SkippedFolders.Contains(info.Name, StringComparer.Ordinal))
                {
                    pending.Push(d);
                }
            }
        }
    }

    private static string Relative(string root, string full) => Path.GetRelativePath(root, full).Replace('\\', '/');

    private static bool IsInside(string root, string full)
    {
        var rel = Path.GetRelativePath(root, full);
        return rel != ".." && !rel.StartsWith("../", StringComparison.Ordinal) && !rel.StartsWith("..\\", StringComparison.Ordinal) && !Path.IsPathRooted(rel);
    }
}
