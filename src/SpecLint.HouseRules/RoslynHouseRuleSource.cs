using System.Collections.Immutable;
using SpecLint.Core.Config;
using SpecLint.HouseRules.Compiling;
using SpecLint.HouseRules.Discovery;
using SpecLint.HouseRules.Loading;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.HouseRules;

/// <summary>
/// The house rules of a configuration: the C# files it names, compiled with Roslyn (or taken from the cache),
/// loaded, and guarded. Every problem becomes a finding at its .cs position; none stops the check.
/// </summary>
internal sealed class RoslynHouseRuleSource : IHouseRuleSource
{
    private readonly HouseRuleCache _cache;
    private readonly RuleCatalog _builtIn;
    private readonly string _workingDirectory;
    private readonly Dictionary<string, HouseRuleSet> _loaded = new(StringComparer.Ordinal);

    /// <summary>A source using the default cache folder (or <c>SPECLINT_CACHE</c>).</summary>
    public RoslynHouseRuleSource()
        : this(null)
    {
    }

    /// <summary>A source with the compiled rules cached in <paramref name="cacheFolder"/> (null: the default).</summary>
    public RoslynHouseRuleSource(string? cacheFolder, RuleCatalog? builtIn = null)
    {
        _cache = cacheFolder is null ? HouseRuleCache.Default() : new HouseRuleCache(cacheFolder);
        _builtIn = builtIn ?? RuleCatalog.BuiltIn;
        _workingDirectory = Directory.GetCurrentDirectory();
    }

    /// <summary>How many times this source started the compiler (a cache hit does not).</summary>
    public int Compilations { get; private set; }

    /// <summary>The folder compiled rules are cached in.</summary>
    public string CacheFolder => _cache.Folder;

    /// <inheritdoc />
    public HouseRuleSet Load(RepoConfig config)
    {
        ArgumentNullException.ThrowIfNull(config);
        if (config.Folder is not { } root)
        {
            return HouseRuleSet.Empty;
        }

        string Display(string path) =>
            Path.GetRelativePath(_workingDirectory, Path.IsPathRooted(path) ? path : Path.Combine(root, path)).Replace('\\', '/');

        var (files, problems) = HouseRuleFiles.Find(config, Display);
        if (files.IsEmpty)
        {
            return HouseRuleSet.Empty with { Problems = problems };
        }

        var key = HouseRuleCache.Key(files, HouseRuleCompiler.OptionsFingerprint);
        var memo = key + "|" + root + "|" + config.HouseRuleBudget.Ticks;
        if (!_loaded.TryGetValue(memo, out var set))
        {
            var compiled = _cache.TryLoad(key);
            if (compiled is null)
            {
                compiled = HouseRuleCompiler.Compile(files, "SpecLintHouseRules_" + key[..16]);
                Compilations++;
                _cache.Store(key, compiled);
            }

            set = HouseRuleLoader.Load(compiled, root, config.HouseRuleBudget, _builtIn, Display);
            _loaded[memo] = set;
        }

        return set with { Problems = problems.AddRange(set.Problems) };
    }
}
