using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests.Engine;

/// <summary>A spec whose figures the analysis cannot produce gets an analysis-failed finding, not a crash (issue 13 item 4).</summary>
public sealed class AnalysisFailureTests
{
    // Rf 1 TΩ with Cf 100 nF: f−3dB = 1/(2π·Rf·Cf) ≈ 1.6 µHz, so the default noise band, 1 Hz to 10·f−3dB, is empty.
    private const string Spec = """
        spec: 1
        kind: transimpedance
        name: empty-band
        conditions: { temperature: 25 °C, supply: { positive: 5 V, negative: -5 V } }
        bias: 0 V
        input:
          type: photodiode
          capacitance: 10 pF
          current: { min: 1 pA, max: 1 pA }
        amplifier:
          gbw: 10 MHz
          voltage-noise: 8 nV/√Hz
          current-noise: 1 fA/√Hz
          input-capacitance: { common-mode: 5 pF, differential: 2 pF }
          bias-current: 0 A
          offset-voltage: 0 V
          output-swing: { to-negative: 50 mV, to-positive: 50 mV }
        feedback:
          resistance: 1 TΩ
          capacitance: 100 nF
        """;

    [Fact]
    public void An_empty_default_noise_band_is_an_analysis_failed_finding_at_the_spec()
    {
        var r = Lint.Check(Spec);
        var f = Assert.Single(r.Of(RuleIds.AnalysisFailed));
        Assert.Equal(Severity.Error, f.Severity);
        Assert.Equal(1, f.Line);
        Assert.Contains("noise band", f.Message, StringComparison.Ordinal);
        Assert.Contains("requirements.noise.band", f.Message, StringComparison.Ordinal);
        // The only other finding is the implausible Cf that caused it; no rule that needs the analysis runs.
        var cf = Assert.Single(r.Findings, x => x.RuleId != RuleIds.AnalysisFailed);
        Assert.Equal(("plausible-values", "/feedback/capacitance"), (cf.RuleId, cf.Pointer));
    }

    [Fact]
    public void Non_convergence_of_the_solver_counts_as_a_numerical_failure()
    {
        // The root finders' own exception does not derive from ArithmeticException; it must still be caught.
        Assert.False(typeof(ArithmeticException).IsAssignableFrom(typeof(MathNet.Numerics.NonConvergenceException)));
        Assert.True(Core.Analysis.AnalysisFailedException.IsNumericalFailure(new MathNet.Numerics.NonConvergenceException()));
        Assert.True(Core.Analysis.AnalysisFailedException.IsNumericalFailure(new Core.Analysis.AnalysisFailedException("x")));
        Assert.False(Core.Analysis.AnalysisFailedException.IsNumericalFailure(new InvalidOperationException()));
    }
}
