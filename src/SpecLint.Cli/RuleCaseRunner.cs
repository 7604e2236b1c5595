using System.Text.RegularExpressions;
using SpecLint.Core.Config;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Cli;

/// <summary>Runs house rules on their case specs and compares the findings with the <c># expect: &lt;id&gt;</c> marks.</summary>
internal static partial class RuleCaseRunner
{
    [GeneratedRegex(@"#\s*expect:\s*(?<ids>[a-z0-9-]+(\s*,\s*[a-z0-9-]+)*)", RegexOptions.CultureInvariant)]
    private static partial Regex ExpectMark();

    public sealed record Result(int Passed, int Failed, IReadOnlyList<string> Lines);

    public static Result Run(RuleCatalog catalog, RepoConfig config, IReadOnlyList<string> ids)
    {
        var lines = new List<string>();
        int passed = 0, failed = 0;
        var cwd = Directory.GetCurrentDirectory();
        foreach (var id in ids)
        {
            var source = catalog.HouseRuleSource(id)!;
            var cases = Path.Combine(Path.GetDirectoryName(Path.GetFullPath(source))!, "cases");
            var files = Directory.Exists(cases) ? Directory.GetFiles(cases, "*.tia.yaml").Order(StringComparer.Ordinal).ToList() : [];
            if (files.Count == 0)
            {
                lines.Add($"warn  {id}: no cases in {Path.GetRelativePath(cwd, cases).Replace('\\', '/')}/*.tia.yaml; add a flagged and a clean spec");
                continue;
            }

            foreach (var file in files)
            {
                var shown = Path.GetRelativePath(cwd, file).Replace('\\', '/');
                var problems = Compare(file, shown, id, catalog, config);
                if (problems.Count == 0)
                {
                    passed++;
                    lines.Add($"ok    {id}  {shown}");
                }
                else
                {
                    failed++;
                    lines.Add($"FAIL  {id}  {shown}");
                    lines.AddRange(problems.Select(p => "        " + p));
                }
            }
        }

        return new Result(passed, failed, lines);
    }

    private static List<string> Compare(string file, string shown, string id, RuleCatalog catalog, RepoConfig config)
    {
        var expected = new HashSet<(int Line, string Id)>();
        var text = File.ReadAllLines(file);
        for (var i = 0; i < text.Length; i++)
        {
            if (ExpectMark().Match(text[i]) is { Success: true } m)
            {
                foreach (var e in m.Groups["ids"].Value.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries))
                {
                    expected.Add((i + 1, e));
                }
            }
        }

        // The rule under test, and any other id a mark names, are compared; other rules' findings are not.
        var judged = expected.Select(e => e.Id).Append(id).ToHashSet(StringComparer.Ordinal);
        var outcome = CheckRunner.CheckOne(shown, config, new CheckOptions { Catalog = catalog });
        var problems = new List<string>();
        if (outcome.IsUnusable)
        {
            problems.AddRange(outcome.Findings.Where(f => f.RuleId == RuleIds.SpecInvalid).Select(f => $"line {f.Line}: the case is not a valid spec: {f.Message}"));
            return problems;
        }

        var actual = outcome.Findings.Where(f => !f.Waived && judged.Contains(f.RuleId) || RuleIds.HouseRuleIds.Contains(f.RuleId)).ToList();
        foreach (var f in actual.Where(f => RuleIds.HouseRuleIds.Contains(f.RuleId)))
        {
            problems.Add(f.ToString());
        }

        foreach (var (line, expectedId) in expected.OrderBy(e => e.Line))
        {
            if (!actual.Any(f => f.Line == line && f.RuleId == expectedId))
            {
                problems.Add($"line {line}: expected a finding of '{expectedId}', none was reported");
            }
        }

        foreach (var f in actual.Where(f => !RuleIds.HouseRuleIds.Contains(f.RuleId) && !expected.Contains((f.Line, f.RuleId))))
        {
            problems.Add($"line {f.Line}: unexpected finding of '{f.RuleId}': {f.Message}");
        }

        return problems;
    }
}
