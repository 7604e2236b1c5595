using System.Collections.Immutable;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Config;
using SpecLint.Core.Spec;
using SpecLint.Core.Spec.Model;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Changes;

/// <summary>
/// <c>check --against</c>: checks the spec files a change touched (every spec when configuration or house rules
/// changed), checks each one's base version read from git with the base's configuration and the base's house rules
/// (see <see cref="BaseConfigs"/>), and sorts the findings into new, resolved and unchanged. Deleted specs are checked at the base so their findings show as resolved.
/// </summary>
internal static class ChangeCheck
{
    /// <summary>Runs the comparison. Never throws for bad input.</summary>
    public static CheckRun Run(CheckOptions options, GitChangeSet changes, Gate gate, Func<TiaSpec, RepoConfig, bool, ToleranceResult?>? tolerances = null)
    {
        ArgumentNullException.ThrowIfNull(options);
        ArgumentNullException.ThrowIfNull(changes);
        var everySpec = RecheckScope.TouchesEverySpec(changes, options.ConfigPath, options.HouseRules is not null);
        var onHead = changes.Files.Where(f => f.Status != ChangeStatus.Deleted)
            .ToDictionary(f => Path.GetFullPath(Path.Combine(changes.Root, f.Path)), StringComparer.Ordinal);
        var outer = options.Select;
        var run = CheckRunner.Run(options with
        {
            Select = f => (outer?.Invoke(f) ?? true) && (everySpec || onHead.ContainsKey(Path.GetFullPath(f))),
        }, tolerances);

        var baseOptions = options with { Catalog = run.Catalog, Progress = null };
        var configs = new BaseConfigs(changes, options, run.Catalog);
        var specs = new List<SpecChange>();
        foreach (var head in run.Specs)
        {
            var change = onHead.GetValueOrDefault(Path.GetFullPath(head.File));
            if (change is null)
            {
                if (changes.RepoPath(head.File) is not { } repoPath)
                {
                    continue;
                }

                change = new FileChange(ChangeStatus.Changed, repoPath);
            }

            specs.Add(Compare(change, head, changes, configs, baseOptions, tolerances));
        }

        var deleted = DeletedSpecs(changes, options, outer).ToList();
        foreach (var (change, display) in deleted)
        {
            var before = CheckBase(change.Path, display, changes, configs, baseOptions, tolerances, out var problems);
            var resolved = before is null ? FindingClasses.None : FindingClasses.Classify(before.Name, before.Findings, before.Name, []);
            specs.Add(new SpecChange(ChangeStatus.Deleted, display, null, before, null, resolved, problems));
        }

        var report = new ChangeReport(changes.Ref, changes.MergeBase, [.. specs.OrderBy(s => s.File, StringComparer.Ordinal)], everySpec)
        {
            BaseNotes = configs.Notes,
        };
        return run with { RunProblems = [.. run.RunProblems.Select(p => Reword(p, deleted))], Changes = report, Gate = gate };
    }

    private static SpecChange Compare(FileChange change, SpecOutcome head, GitChangeSet changes, BaseConfigs configs, CheckOptions options, Func<TiaSpec, RepoConfig, bool, ToleranceResult?>? tolerances)
    {
        var previous = change.Status == ChangeStatus.Renamed ? GitChangeSet.Display(changes.Root, change.PreviousPath!) : null;
        var before = change.BasePath is { } basePath
            ? CheckBase(basePath, previous ?? head.File, changes, configs, options, tolerances, out var problems)
            : NoBase(out problems);
        var classes = FindingClasses.Classify(before?.Spec?.Name, before?.Findings ?? [], head.Name, head.Findings);
        return new SpecChange(change.Status, head.File, previous, before, head, classes, problems);
    }

    private static SpecOutcome? NoBase(out ImmutableArray<Finding> problems)
    {
        problems = [];
        return null;
    }

    /// <summary>Loads and checks the base version of <paramref name="repoPath"/>; a version that is not a valid spec is returned in <paramref name="problems"/>.</summary>
    private static SpecOutcome? CheckBase(string repoPath, string display, GitChangeSet changes, BaseConfigs configs, CheckOptions options, Func<TiaSpec, RepoConfig, bool, ToleranceResult?>? tolerances, out ImmutableArray<Finding> problems)
    {
        problems = [];
        if (changes.BaseBytes(repoPath) is not { } bytes)
        {
            return null;
        }

        var loaded = SpecLoader.LoadBytes(bytes, display);
        if (loaded.Spec is not { } spec || !loaded.IsValid)
        {
            problems = [.. loaded.Diagnostics.Select(d => new Finding(RuleIds.SpecInvalid, Severity.Error, d.File, d.Pointer, d.Line, d.Column,
                $"at the merge base {changes.MergeBase[..Math.Min(12, changes.MergeBase.Length)]}: {(d.KeyPath.Length > 0 ? d.KeyPath + ": " : "")}{d.Message}"))];
            return null;
        }

        var (config, catalog) = configs.For(display);
        return configs.Shown(display, CheckRunner.CheckSpec(spec, config, options with { Catalog = catalog }, tolerances));
    }

    /// <summary>Deleted spec files that the paths and include globs would have selected (house-rule cases excepted, as a check of the tree does).</summary>
    private static IEnumerable<(FileChange Change, string Display)> DeletedSpecs(GitChangeSet changes, CheckOptions options, Func<string, bool>? select)
    {
        var configFile = options.ConfigPath ?? RepoConfigLoader.FindFor(Path.Combine(Directory.GetCurrentDirectory(), "_"));
        var config = configFile is null ? RepoConfig.Default : RepoConfigLoader.Load(configFile).Config;
        var include = config.Include.Select(g => new GlobPattern(g)).ToList();
        IReadOnlyList<string> roots = options.Paths.Count > 0
            ? options.Paths
            : [configFile is null ? "." : Path.GetDirectoryName(Path.GetFullPath(configFile))!];
        foreach (var change in changes.Files.Where(f => f.Status == ChangeStatus.Deleted))
        {
            var full = Path.GetFullPath(Path.Combine(changes.Root, change.Path));
            var display = GitChangeSet.Display(changes.Root, change.Path);
            var selected = roots.Any(r =>
            {
                var rootFull = Path.GetFullPath(r);
                if (rootFull == full)
                {
                    return true;
                }

                var relative = Path.GetRelativePath(rootFull, full).Replace('\\', '/');
                return !relative.StartsWith("..", StringComparison.Ordinal) && !Path.IsPathRooted(relative) && include.Any(g => g.IsMatch(relative));
            });
            // A deleted house rule takes its cases with it; they were never checked as specs, so they are not resolved ones.
            var isCase = options.HouseRules is not null && HouseRuleCases.IsCase(full, config);
            if (selected && !isCase && (select?.Invoke(display) ?? true))
            {
                yield return (change, display);
            }
        }
    }

    /// <summary>A path on the command line that was deleted since the merge base gets a message that says so.</summary>
    private static Finding Reword(Finding problem, List<(FileChange Change, string Display)> deleted)
    {
        var gone = deleted.FirstOrDefault(d => Path.GetFullPath(d.Display) == Path.GetFullPath(problem.File));
        return problem.RuleId == RuleIds.SpecInvalid && gone.Change is not null
            ? problem with { Message = "this spec was deleted since the merge base; its findings are listed as resolved. Name its folder, or leave it off the command line" }
            : problem;
    }
}
