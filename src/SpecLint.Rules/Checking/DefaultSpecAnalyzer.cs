using SpecLint.Core.Analysis;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Spec.Model;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Checking;

/// <summary>The analysis the engine runs for each spec and for each fix a rule re-checks.</summary>
internal sealed class DefaultSpecAnalyzer : ISpecAnalyzer
{
    private readonly Func<TiaSpec, bool, ToleranceResult?> _tolerances;

    /// <summary>Creates the analyzer; <paramref name="tolerances"/> computes corners (and Monte Carlo when its flag is true).</summary>
    public DefaultSpecAnalyzer(Func<TiaSpec, bool, ToleranceResult?> tolerances)
    {
        _tolerances = tolerances ?? throw new ArgumentNullException(nameof(tolerances));
    }

    /// <inheritdoc />
    public SpecAnalysis Analyze(TiaSpec spec, bool includeNoise, bool includeCorners) => Analyze(spec, includeNoise, includeCorners, monteCarlo: false);

    /// <summary>As <see cref="Analyze(TiaSpec, bool, bool)"/>, optionally with Monte Carlo (only the main run needs it; fix re-checks do not).</summary>
    public SpecAnalysis Analyze(TiaSpec spec, bool includeNoise, bool includeCorners, bool monteCarlo)
    {
        ArgumentNullException.ThrowIfNull(spec);
        var circuit = CircuitFactory.Nominal(spec);
        var analysis = includeNoise ? TiaAnalyzer.Analyze(spec) : TiaAnalyzer.Analyze(circuit, AnalysisOptions.WithoutNoise);
        var tolerances = includeCorners ? _tolerances(spec, monteCarlo) : null;
        return new SpecAnalysis(spec, circuit, analysis, tolerances);
    }
}
