using System.Globalization;
using System.Reflection;
using SpecLint.Rules.Engine;

namespace SpecLint.HouseRules.Guarding;

/// <summary>
/// A house rule as the engine runs it: within its time budget, its exceptions caught and reported at the .cs
/// line that threw, its findings stamped with its own id. Neither a runaway nor a throwing rule stops the
/// other rules or specs.
/// </summary>
internal sealed class GuardedRule : IRule
{
    private readonly IRule _inner;
    private readonly BudgetHandle _budget;
    private readonly TimeSpan _limit;
    private readonly Assembly _assembly;
    private readonly Func<string, string> _display;
    private readonly (string Path, int Line, int Column) _declaredAt;

    public GuardedRule(IRule inner, RuleDescriptor descriptor, BudgetHandle budget, TimeSpan limit, Assembly assembly,
        (string Path, int Line, int Column) declaredAt, Func<string, string> display)
    {
        _inner = inner;
        Descriptor = descriptor;
        _budget = budget;
        _limit = limit;
        _assembly = assembly;
        _declaredAt = declaredAt;
        _display = display;
    }

    /// <inheritdoc />
    public RuleDescriptor Descriptor { get; }

    /// <summary>The source file that declares the rule, relative to the configuration's folder.</summary>
    public string SourcePath => _declaredAt.Path;

    /// <inheritdoc />
    public IEnumerable<Finding> Check(RuleContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var findings = new List<Finding>();
        Exception? thrown = null;
        (bool Tripped, TimeSpan Elapsed) run;
        try
        {
            run = _budget.Run(_limit, () =>
            {
                try
                {
                    foreach (var f in _inner.Check(context))
                    {
                        findings.Add(f);
                    }
                }
                catch (Exception e) when (e is not OutOfMemoryException)
                {
                    thrown = e;
                }
            });
        }
        catch (Exception e) when (e is not OutOfMemoryException)
        {
            thrown = e;
            run = (false, TimeSpan.Zero);
        }

        var spec = context.Spec.File;
        if (run.Tripped || run.Elapsed > _limit)
        {
            return [Problem(RuleIds.HouseRuleBudget, _declaredAt,
                $"house rule '{Descriptor.Id}' ran past its {Seconds(_limit)} budget on {spec} and was stopped; make it cheaper, or raise house-rule-budget in .speclint.yaml")];
        }

        if (thrown is not null)
        {
            var at = RuleFailure.Locate(thrown, _assembly) ?? _declaredAt;
            var what = thrown is InsufficientExecutionStackException ? "recursed too deep" : "threw " + RuleFailure.Describe(thrown);
            return [Problem(RuleIds.HouseRuleFailed, at, $"house rule '{Descriptor.Id}' {what} while checking {spec}; the other rules still ran")];
        }

        // A rule reports under its own id only: another id would let it pose as a built-in rule.
        return findings.Select(f => f.RuleId == Descriptor.Id ? f : f with { RuleId = Descriptor.Id }).ToList();
    }

    private Finding Problem(string id, (string Path, int Line, int Column) at, string message) =>
        new(id, Severity.Error, _display(at.Path), "", at.Line, at.Column, message);

    private static string Seconds(TimeSpan t) =>
        t.TotalSeconds >= 1 ? t.TotalSeconds.ToString("0.###", CultureInfo.InvariantCulture) + " s" : t.TotalMilliseconds.ToString("0", CultureInfo.InvariantCulture) + " ms";
}
