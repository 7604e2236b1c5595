using SpecLint.Core.Analysis;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Spec.Model;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Checking;

/// <summary>
/// The analysis the engine runs for each spec and for each fix a rule re-checks. One instance serves the rules
/// of one spec, and remembers what it computed for each candidate spec (by reference): a fix search re-analyses a
/// candidate for its own test and again when the other rules re-check it, and the costly corner search then runs
/// once. Not thread-safe; the rules of one spec run one after another.
/// </summary>
internal sealed class DefaultSpecAnalyzer : ISpecAnalyzer
{
    private readonly Func<TiaSpec, bool, ToleranceResult?> _tolerances;
    private readonly Dictionary<(TiaSpec Spec, bool Noise), AnalysisResult> _nominal = new(KeyComparer.Instance);
    private readonly Dictionary<(TiaSpec Spec, bool MonteCarlo), ToleranceResult?> _corners = new(KeyComparer.Instance);

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
        if (!_nominal.TryGetValue((spec, includeNoise), out var analysis))
        {
            analysis = includeNoise ? TiaAnalyzer.Analyze(spec) : TiaAnalyzer.Analyze(CircuitFactory.Nominal(spec), AnalysisOptions.WithoutNoise);
            _nominal[(spec, includeNoise)] = analysis;
        }

        ToleranceResult? tolerances = null;
        if (includeCorners && !_corners.TryGetValue((spec, monteCarlo), out tolerances))
        {
            tolerances = _tolerances(spec, monteCarlo);
            _corners[(spec, monteCarlo)] = tolerances;
        }

        return new SpecAnalysis(spec, analysis.Circuit, analysis, tolerances);
    }

    /// <summary>Specs by reference (a candidate is the same object in every re-check of one search), flags by value.</summary>
    private sealed class KeyComparer : IEqualityComparer<(TiaSpec Spec, bool Flag)>
    {
        public static readonly KeyComparer Instance = new();

        public bool Equals((TiaSpec Spec, bool Flag) x, (TiaSpec Spec, bool Flag) y) => ReferenceEquals(x.Spec, y.Spec) && x.Flag == y.Flag;

        public int GetHashCode((TiaSpec Spec, bool Flag) obj) => HashCode.Combine(System.Runtime.CompilerServices.RuntimeHelpers.GetHashCode(obj.Spec), obj.Flag);
    }
}
