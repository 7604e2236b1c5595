using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Checking;

/// <summary>What a <c>check</c> run is asked to do.</summary>
internal sealed record CheckOptions
{
    /// <summary>Files and folders to check; empty means the repository that contains the working directory.</summary>
    public IReadOnlyList<string> Paths { get; init; } = [];

    /// <summary>An explicit configuration file, overriding the walk up from each spec.</summary>
    public string? ConfigPath { get; init; }

    /// <summary>The date waivers are judged against.</summary>
    public DateOnly Today { get; init; } = DateOnly.FromDateTime(DateTime.UtcNow);

    /// <summary>A fail level overriding the configuration's <c>fail-on</c>.</summary>
    public Severity? FailOn { get; init; }

    /// <summary>Whether to compute tolerance corners and Monte Carlo (on by default).</summary>
    public bool Tolerances { get; init; } = true;

    /// <summary>The rules to run.</summary>
    public RuleCatalog Catalog { get; init; } = RuleCatalog.BuiltIn;

    /// <summary>Compiles and loads the house rules a configuration names; null skips house rules (<c>--no-house-rules</c>).</summary>
    public IHouseRuleSource? HouseRules { get; init; }

    /// <summary>
    /// Keeps only the spec files it accepts after discovery (the files a change touched, one shard); null keeps all.
    /// Finding no file at all is still an error; finding files and keeping none is not.
    /// </summary>
    public Func<string, bool>? Select { get; init; }

    /// <summary>
    /// How many specs are checked at once: −1 (the default) for every core, 1 for one after another. The output
    /// is the same either way.
    /// </summary>
    public int MaxDegreeOfParallelism { get; init; } = -1;

    /// <summary>Reports progress (specs done, count, the file just finished) for long runs, one call at a time; null for none.</summary>
    public Action<int, int, string>? Progress { get; init; }
}
