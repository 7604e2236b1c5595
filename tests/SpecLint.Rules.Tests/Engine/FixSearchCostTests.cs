using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Config;
using SpecLint.Core.Spec.Model;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests.Engine;

/// <summary>
/// What a check spends on fix searches: corner analyses (the costly part) happen only for rules that fail, and
/// each candidate spec a search tries is analysed once, however many checks look at it.
/// </summary>
public sealed class FixSearchCostTests
{
    // references.md §3.2 worked example with a ±10 % Cf, so every candidate has corners too.
    private static string WorkedExample(string cf) => $$"""
        {{Parts.Header}}
        conditions: { temperature: 25 °C, supply: { positive: 15 V, negative: -15 V } }
        bias: 0 V
        input: { type: photodiode, capacitance: 100 pF, current: { min: 1 µA, max: 10 µA } }
        {{Parts.IdealAmp}}
        feedback:
          resistance: 1 MΩ
          capacitance: {{cf}}
        """;

    private sealed class CountingTolerances
    {
        // The specs themselves, so that identity is by reference and none is collected and its slot reused.
        private readonly List<(TiaSpec Spec, bool MonteCarlo)> _calls = [];

        public int Total => _calls.Count;

        public int MostForOneSpec => _calls.Select(c => _calls.Count(d => ReferenceEquals(c.Spec, d.Spec) && c.MonteCarlo == d.MonteCarlo)).DefaultIfEmpty(0).Max();

        public int DistinctSpecs => _calls.Select(c => c.Spec).Distinct(ReferenceEqualityComparer.Instance).Count();

        public ToleranceResult? Analyze(TiaSpec spec, RepoConfig config, bool monteCarlo)
        {
            _calls.Add((spec, monteCarlo));
            return StandardTolerances.Analyze(spec, config, monteCarlo);
        }
    }

    private static (SpecOutcome Outcome, CountingTolerances Counts) Check(string yaml)
    {
        var counts = new CountingTolerances();
        var outcome = CheckRunner.CheckSpec(Lint.Load(yaml), RepoConfig.Default, new CheckOptions { Today = Lint.Today }, counts.Analyze);
        return (outcome, counts);
    }

    [Fact]
    public void A_spec_every_rule_passes_gets_one_corner_analysis_and_no_search()
    {
        // references.md §3.2: the Butterworth Cf 1.7841 pF gives 65.67°, clear of the 45° floor at every ±10 % corner.
        var (outcome, counts) = Check(WorkedExample("1.7841 pF ±10%"));

        Assert.DoesNotContain(outcome.Findings, f => f.Severity == Rules.Engine.Severity.Error);
        Assert.Equal(1, counts.Total);
    }

    [Fact]
    public void A_failing_margin_searches_and_analyses_each_candidate_once()
    {
        // references.md §3.2: 0.5 pF gives a margin far below 45°, so phase-margin searches upwards for a Cf.
        var (outcome, counts) = Check(WorkedExample("0.5 pF ±10%"));

        var finding = Assert.Single(outcome.Findings, f => f.RuleId == "phase-margin");
        Assert.NotNull(finding.Fix);
        // The search tried several candidates, and each was analysed for its own test and re-checked by the other
        // rules from one corner analysis.
        Assert.True(counts.DistinctSpecs > 2, $"{counts.DistinctSpecs} specs analysed");
        Assert.Equal(1, counts.MostForOneSpec);
    }
}
