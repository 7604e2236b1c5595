using System.Collections.Immutable;
using SpecLint.Core.Analysis;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Config;
using SpecLint.Core.Spec;
using SpecLint.Core.Spec.Model;
using SpecLint.Rules.BuiltIn;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Checking;

/// <summary>
/// One <c>check</c>: finds the spec files, reads each with its repository configuration, analyses it, runs
/// the rules, applies waivers. A file that cannot be read is reported and the others are still checked.
/// </summary>
internal static class CheckRunner
{
    /// <summary>
    /// Runs a check. Never throws for bad input; an exception here is a SpecLint bug. <paramref name="tolerances"/>
    /// replaces the standard corner and Monte Carlo analysis (tests use it); <see cref="CheckOptions.Tolerances"/> turns it off.
    /// </summary>
    public static CheckRun Run(CheckOptions options, Func<TiaSpec, RepoConfig, bool, ToleranceResult?>? tolerances = null)
    {
        ArgumentNullException.ThrowIfNull(options);
        var problems = new List<Finding>();
        var configs = new ConfigCache(options.ConfigPath, options.Catalog, options.HouseRules, problems);
        var rootConfig = options.Paths.Count == 0 || options.ConfigPath is not null
            ? configs.ForFolder(Directory.GetCurrentDirectory())
            : configs.ForFolder(Directory.Exists(options.Paths[0]) ? options.Paths[0] : Path.GetDirectoryName(Path.GetFullPath(options.Paths[0]))!);

        var paths = options.Paths.Count > 0
            ? options.Paths
            : [rootConfig.Path is { } p ? Path.GetRelativePath(Directory.GetCurrentDirectory(), Path.GetDirectoryName(Path.GetFullPath(p))!) : "."];
        var files = SpecFileFinder.Find(paths, rootConfig.Include, rootConfig.Exclude, rootConfig.Folder, out var missing);
        if (options.HouseRules is not null)
        {
            // A house rule's cases carry deliberate mistakes; 'test-rules' runs them, a check of the tree does not
            // (unless a case file is named on the command line).
            var named = paths.Select(p => Path.GetFullPath(p)).ToHashSet(StringComparer.Ordinal);
            files = [.. files.Where(f => named.Contains(Path.GetFullPath(f)) || !HouseRuleCases.IsCase(f, configs.ForSpec(f)))];
        }

        foreach (var m in missing)
        {
            problems.Add(new Finding(RuleIds.SpecInvalid, Severity.Error, m, "", 1, 1, "no such file or folder"));
        }

        if (files.Count == 0 && missing.Count == 0)
        {
            problems.Add(new Finding(RuleIds.NoSpecs, Severity.Error, string.Join(", ", paths), "", 1, 1,
                $"no spec files matching {string.Join(", ", rootConfig.Include)} were found; check the path, or 'include' in .speclint.yaml"));
        }

        if (options.Select is { } select)
        {
            files = [.. files.Where(select)];
        }

        // Configurations and house rules load here, one after another, before any spec is analysed: loading
        // compiles house rules and records problems in order. The specs are then independent and run in
        // parallel, each into its own slot, so the outcome is the same on any number of cores.
        var jobs = new (string File, RepoConfig Config, CheckOptions Options)[files.Count];
        for (var i = 0; i < files.Count; i++)
        {
            var config = configs.ForSpec(files[i]);
            jobs[i] = (files[i], config, options with { Catalog = configs.CatalogFor(config) });
        }

        var slots = new SpecOutcome[files.Count];
        var done = 0;
        var progressGate = new object();
        try
        {
            Parallel.For(0, jobs.Length, new ParallelOptions { MaxDegreeOfParallelism = options.MaxDegreeOfParallelism }, i =>
            {
                slots[i] = CheckOne(jobs[i].File, jobs[i].Config, jobs[i].Options, tolerances);
                if (options.Progress is { } progress)
                {
                    lock (progressGate)
                    {
                        progress(++done, jobs.Length, jobs[i].File);
                    }
                }
            });
        }
        catch (AggregateException e) when (e.InnerExceptions.Count > 0)
        {
            // An exception here is a bug (exit code 3); keep its own type and stack for the report.
            System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(e.InnerExceptions[0]).Throw();
            throw;
        }

        var outcomes = slots.ToList();
        CheckUniqueNames(outcomes, problems);
        return new CheckRun(
            [.. outcomes],
            [.. problems],
            options.FailOn ?? ConfigurationBinding.FailOn(rootConfig),
            [.. configs.Files])
        {
            Catalog = configs.AllRules,
        };
    }

    /// <summary>Checks one file with a given configuration.</summary>
    public static SpecOutcome CheckOne(string file, RepoConfig config, CheckOptions options, Func<TiaSpec, RepoConfig, bool, ToleranceResult?>? tolerances = null)
    {
        ArgumentNullException.ThrowIfNull(options);
        var loaded = SpecLoader.LoadFile(file, file);
        if (loaded.Spec is not { } spec || !loaded.IsValid)
        {
            var bad = loaded.Diagnostics
                .Select(d => new Finding(RuleIds.SpecInvalid, Severity.Error, d.File, d.Pointer, d.Line, d.Column, (d.KeyPath.Length > 0 ? d.KeyPath + ": " : "") + d.Message))
                .ToImmutableArray();
            return new SpecOutcome(file, null, null, null, null, bad) { IsUnreadable = loaded.Unreadable };
        }

        return CheckSpec(spec, config, options, tolerances);
    }

    /// <summary>Checks an already loaded spec: once, or once per gain setting (references.md §D8).</summary>
    public static SpecOutcome CheckSpec(TiaSpec spec, RepoConfig config, CheckOptions options, Func<TiaSpec, RepoConfig, bool, ToleranceResult?>? tolerances = null)
    {
        ArgumentNullException.ThrowIfNull(spec);
        ArgumentNullException.ThrowIfNull(config);
        ArgumentNullException.ThrowIfNull(options);
        tolerances ??= StandardTolerances.Analyze;
        IReadOnlyList<TiaSpec> views;
        try
        {
            views = GainViews.All(spec);
        }
        catch (Exception e) when (AnalysisFailedException.IsNumericalFailure(e))
        {
            return Failed(spec, config, options, e, null);
        }

        if (views.Count == 1 && views[0].Setting is null)
        {
            var (analysis, findings, failure) = CheckView(views[0], config, options, tolerances);
            if (failure is not null)
            {
                return Failed(spec, config, options, failure, null);
            }

            var all = Order(WaiverApplication.Apply(spec, findings, options.Today, options.Catalog.KnownIds));
            return new SpecOutcome(spec.File, spec, analysis!.Circuit, analysis.Analysis, analysis.Tolerances, all);
        }

        return CheckSettings(spec, views, config, options, tolerances);
    }

    private static SpecOutcome CheckSettings(TiaSpec spec, IReadOnlyList<TiaSpec> views, RepoConfig config, CheckOptions options, Func<TiaSpec, RepoConfig, bool, ToleranceResult?> tolerances)
    {
        var channel = spec.Channel ?? spec;
        var adjustable = channel.Feedback.Adjustable is not null;
        var perView = new List<(TiaSpec View, SpecAnalysis? Analysis, List<Finding> Findings)>();
        foreach (var view in views)
        {
            var (analysis, findings, failure) = CheckView(view, config, options, tolerances);
            var raw = failure is null ? findings : Failed(view, config, options, failure, view.Setting).Findings;
            List<Finding> list = [.. raw.Select(f => SettingFindings.Remap(view, f, adjustable))];
            perView.Add((view, failure is null ? analysis : null, list));
        }

        var merged = SettingFindings.Merge([.. perView.Select(p => (p.View.Setting!, (IReadOnlyList<Finding>)p.Findings))], adjustable);
        if (adjustable)
        {
            merged = RangeFixes.Verify(channel, merged, [.. perView.SelectMany(p => p.Findings)], view => CheckView(view, config, options, tolerances).Findings);
        }

        var all = Order(WaiverApplication.Apply(channel, merged, options.Today, options.Catalog.KnownIds));
        var settings = perView
            .Select(p => new SettingOutcome(
                p.View.Setting!,
                p.View,
                p.Analysis?.Circuit,
                p.Analysis?.Analysis,
                p.Analysis?.Tolerances,
                [.. all.Where(f => f.Setting is null || f.Setting == p.View.Setting)]))
            .ToImmutableArray();
        var first = perView[0].Analysis;
        return new SpecOutcome(spec.File, spec, first?.Circuit, first?.Analysis, first?.Tolerances, all) { Settings = settings };
    }

    private static (SpecAnalysis? Analysis, IReadOnlyList<Finding> Findings, Exception? Failure) CheckView(
        TiaSpec view, RepoConfig config, CheckOptions options, Func<TiaSpec, RepoConfig, bool, ToleranceResult?> tolerances)
    {
        var analyzer = new DefaultSpecAnalyzer((s, mc) => options.Tolerances ? tolerances(s, config, mc) : null);
        try
        {
            var analysis = analyzer.Analyze(view, includeNoise: true, includeCorners: true, monteCarlo: true);
            // Fix searches re-run the analysis on candidate values, which can fail the same way.
            return (analysis, new RuleRunner(options.Catalog, config, analyzer).Run(analysis), null);
        }
        catch (Exception e) when (AnalysisFailedException.IsNumericalFailure(e))
        {
            return (null, [], e);
        }
    }

    private static SpecOutcome Failed(TiaSpec spec, RepoConfig config, CheckOptions options, Exception e, string? setting)
    {
        var at = spec.Locations.Locate("");
        var failed = new Finding(RuleIds.AnalysisFailed, Severity.Error, spec.File, "", at.Line, at.Column, $"the analysis failed: {e.Message}; check the values for a typo in a prefix") { Setting = setting };
        return new SpecOutcome(spec.File, spec, null, null, null, [failed, .. ImplausibleValues(spec, config, options.Catalog).Select(f => f with { Setting = setting })]);
    }

    private static ImmutableArray<Finding> Order(IEnumerable<Finding> findings) =>
        findings
            .OrderBy(f => f.Line).ThenBy(f => f.Column).ThenBy(f => f.RuleId, StringComparer.Ordinal)
            .ThenBy(f => f.Setting ?? "", StringComparer.Ordinal).ThenBy(f => f.Message, StringComparer.Ordinal)
            .ToImmutableArray();

    // The plausibility check needs no analysis: when a value far off makes the analysis fail, it still names the
    // value and the prefix that fits, which is most often the cause.
    private static IEnumerable<Finding> ImplausibleValues(TiaSpec spec, RepoConfig config, RuleCatalog catalog)
    {
        var descriptor = ImplausibleValueRule.Info;
        var ruleConfig = ConfigurationBinding.For(config, descriptor.Id);
        if (!catalog.Rules.Any(r => r is ImplausibleValueRule) || ruleConfig.Off || !RuleRunner.AppliesTo(config, descriptor.Id, spec))
        {
            return [];
        }

        return ImplausibleValueRule.Problems(spec, key => RuleContext.OptionSi(descriptor, ruleConfig, key))
            .Select(p =>
            {
                var where = spec.Locations.LocateKeyOrValue(p.Pointer);
                return new Finding(descriptor.Id, ruleConfig.Severity ?? descriptor.DefaultSeverity, spec.File, p.Pointer, where.Line, where.Column, p.Message, p.Fix);
            })
            .ToList();
    }

    private static void CheckUniqueNames(List<SpecOutcome> outcomes, List<Finding> problems)
    {
        foreach (var group in outcomes.Where(o => o.Spec is not null).GroupBy(o => o.Spec!.Name, StringComparer.Ordinal).Where(g => g.Count() > 1))
        {
            foreach (var o in group.Skip(1))
            {
                var at = o.Spec!.Locations.Locate("/name");
                problems.Add(new Finding(RuleIds.SpecInvalid, Severity.Error, o.File, "/name", at.Line, at.Column,
                    $"name: '{group.Key}' is already used by {group.First().File}; names must be unique within the repository"));
            }
        }
    }

    private sealed class ConfigCache(string? explicitPath, RuleCatalog catalog, IHouseRuleSource? houseRules, List<Finding> problems)
    {
        private readonly Dictionary<string, RepoConfig> _byPath = new(StringComparer.Ordinal);
        private readonly Dictionary<RepoConfig, RuleCatalog> _catalogs = new(ReferenceEqualityComparer.Instance);

        /// <summary>Every rule of every configuration read so far (for reports that describe the rules).</summary>
        private RuleCatalog? _allRules;

        public RuleCatalog AllRules => _allRules ?? catalog;

        public RuleCatalog CatalogFor(RepoConfig config) => _catalogs.GetValueOrDefault(config, catalog);

        public IEnumerable<string> Files => _byPath.Keys.Where(k => k.Length > 0).Order(StringComparer.Ordinal);

        public RepoConfig ForSpec(string specFile) =>
            Load(explicitPath ?? RepoConfigLoader.FindFor(specFile));

        public RepoConfig ForFolder(string folder) =>
            Load(explicitPath ?? RepoConfigLoader.FindFor(Path.Combine(folder, "_")));

        private RepoConfig Load(string? path)
        {
            var key = path ?? "";
            if (_byPath.TryGetValue(key, out var cached))
            {
                return cached;
            }

            var config = RepoConfig.Default;
            if (path is not null)
            {
                var display = Path.GetRelativePath(Directory.GetCurrentDirectory(), path).Replace('\\', '/');
                var loaded = RepoConfigLoader.Load(path, display);
                foreach (var d in loaded.Diagnostics)
                {
                    problems.Add(new Finding(RuleIds.ConfigInvalid, Severity.Error, d.File, d.Pointer, d.Line, d.Column, (d.KeyPath.Length > 0 ? d.KeyPath + ": " : "") + d.Message));
                }

                config = loaded.Config;
                var rules = catalog;
                if (houseRules is not null)
                {
                    var set = houseRules.Load(config);
                    problems.AddRange(set.Problems);
                    rules = catalog.With(set);
                    _allRules = AllRules.With(set);
                }

                _catalogs[config] = rules;
                problems.AddRange(ConfigurationBinding.Validate(config, rules, display));
            }

            _byPath[key] = config;
            return config;
        }
    }
}
