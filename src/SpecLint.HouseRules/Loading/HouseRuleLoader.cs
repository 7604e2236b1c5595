using System.Collections.Immutable;
using System.Text.RegularExpressions;
using SpecLint.HouseRules.Compiling;
using SpecLint.HouseRules.Guarding;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.HouseRules.Loading;

/// <summary>
/// Loads a compiled set of house rules, creates each rule within its budget, and checks what it declares: an
/// id that is a readable slug, not taken by a built-in rule or another house rule, options whose defaults
/// parse, and a folder named after the id (where its page and cases are looked for).
/// </summary>
internal static partial class HouseRuleLoader
{
    [GeneratedRegex("^[a-z][a-z0-9]*(-[a-z0-9]+)*$", RegexOptions.CultureInvariant)]
    private static partial Regex Slug();

    /// <summary>The guarded rules and the problems, with paths shown through <paramref name="display"/> (root-relative → shown).</summary>
    public static HouseRuleSet Load(CompiledRules compiled, string root, TimeSpan budget, RuleCatalog builtIn, Func<string, string> display)
    {
        var problems = compiled.Problems
            .Select(p => new Finding(p.RuleId, p.Severity, display(p.Path), "", p.Line, p.Column, p.Message))
            .ToList();
        if (compiled.Image is not { } image || compiled.Rules.IsEmpty)
        {
            return new HouseRuleSet([], [.. problems], ImmutableDictionary<string, string>.Empty, ImmutableDictionary<string, string>.Empty);
        }

        var context = new HouseRuleLoadContext();
        var assembly = context.LoadFromStream(new MemoryStream(image), compiled.Symbols is { } s ? new MemoryStream(s) : null);
        var handle = BudgetHandle.For(assembly);
        var rules = new List<IRule>();
        var pages = ImmutableDictionary.CreateBuilder<string, string>(StringComparer.Ordinal);
        var sources = ImmutableDictionary.CreateBuilder<string, string>(StringComparer.Ordinal);
        var taken = new Dictionary<string, DeclaredType>(StringComparer.Ordinal);
        var reserved = builtIn.KnownIds.ToHashSet(StringComparer.Ordinal);

        foreach (var declared in compiled.Rules)
        {
            var at = (declared.Path, declared.Line, declared.Column);
            Finding Invalid(string message, Severity severity = Severity.Error) =>
                new(RuleIds.HouseRuleInvalid, severity, display(declared.Path), "", declared.Line, declared.Column, message);

            var type = assembly.GetType(declared.MetadataName);
            if (type is null)
            {
                continue;
            }

            if (type.GetConstructor(Type.EmptyTypes) is not { } ctor)
            {
                problems.Add(Invalid($"'{type.Name}' needs a public constructor without parameters so SpecLint can create it"));
                continue;
            }

            IRule? rule = null;
            RuleDescriptor? descriptor = null;
            Exception? failure = null;
            var (tripped, _) = handle.Run(budget, () =>
            {
                try
                {
                    rule = (IRule)ctor.Invoke(null);
                    descriptor = rule.Descriptor;
                }
                catch (Exception e) when (e is not OutOfMemoryException)
                {
                    failure = e;
                }
            });
            if (tripped)
            {
                problems.Add(new Finding(RuleIds.HouseRuleBudget, Severity.Error, display(declared.Path), "", declared.Line, declared.Column,
                    $"creating '{type.Name}' or reading its Descriptor ran past the house-rule budget"));
                continue;
            }

            if (failure is not null || rule is null)
            {
                var where = failure is null ? at : RuleFailure.Locate(failure, assembly) ?? at;
                problems.Add(new Finding(RuleIds.HouseRuleFailed, Severity.Error, display(where.Item1), "", where.Item2, where.Item3,
                    $"creating '{type.Name}' or reading its Descriptor threw {(failure is null ? "nothing usable" : RuleFailure.Describe(failure))}"));
                continue;
            }

            if (descriptor is null || string.IsNullOrEmpty(descriptor.Id) || !Slug().IsMatch(descriptor.Id))
            {
                problems.Add(Invalid($"'{type.Name}' has the id '{RuleFailure.Clean(descriptor?.Id ?? "", 80)}'; a rule id is a lower-case slug that names what is checked, e.g. 'guard-ring-note'"));
                continue;
            }

            var id = descriptor.Id;
            if (reserved.Contains(id))
            {
                problems.Add(Invalid($"'{type.Name}' uses the id '{id}', which SpecLint already uses for {(RuleIds.EngineIds.Contains(id) ? "its own findings" : "a built-in rule")}; give the house rule an id of its own"));
                continue;
            }

            if (taken.TryGetValue(id, out var first))
            {
                problems.Add(Invalid($"'{type.Name}' uses the id '{id}', already used by {display(first.Path)}:{first.Line}; each rule needs its own id"));
                continue;
            }

            if (BadOption(descriptor) is { } optionProblem)
            {
                problems.Add(Invalid(optionProblem));
                continue;
            }

            taken[id] = declared;
            var folder = Path.GetDirectoryName(declared.Path.Replace('/', Path.DirectorySeparatorChar)) ?? "";
            if (!string.Equals(Path.GetFileName(folder), id, StringComparison.Ordinal))
            {
                problems.Add(Invalid($"rule '{id}' is declared outside a folder named '{id}'; keep it in <house-rules>/{id}/ so its page ({id}.md) and cases are found", Severity.Warning));
            }
            else if (ReadPage(Path.Combine(root, folder, id + ".md")) is { } page)
            {
                pages[id] = page;
                var pagePath = Path.Combine(folder, id + ".md").Replace('\\', '/');
                foreach (var shape in RulePageSections.Problems(id, page))
                {
                    problems.Add(new Finding(RuleIds.HouseRuleInvalid, Severity.Warning, display(pagePath), "", 1, 1, $"{id}.md: {shape}"));
                }
            }

            sources[id] = display(declared.Path);
            rules.Add(new GuardedRule(rule, descriptor, handle, budget, assembly, at, display));
        }

        return new HouseRuleSet([.. rules.OrderBy(r => r.Descriptor.Id, StringComparer.Ordinal)], [.. problems], pages.ToImmutable(), sources.ToImmutable());
    }

    private static string? BadOption(RuleDescriptor descriptor)
    {
        foreach (var option in descriptor.Options)
        {
            if (option is null || string.IsNullOrEmpty(option.Key))
            {
                return $"rule '{descriptor.Id}' declares an option without a key";
            }

            try
            {
                _ = option.DefaultSi;
            }
            catch (Exception e) when (e is FormatException or ArgumentException or InvalidOperationException)
            {
                return $"rule '{descriptor.Id}': the default '{RuleFailure.Clean(option.Default ?? "", 60)}' of option '{option.Key}' is not a {option.Dimension} value; write it as a user would, e.g. \"45 deg\" or \"100 mV\"";
            }
        }

        return null;
    }

    private static string? ReadPage(string path)
    {
        try
        {
            var info = new FileInfo(path);
            return info.Exists && info.Length <= 256 * 1024 ? File.ReadAllText(path) : null;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return null;
        }
    }
}
