using SpecLint.Core.Spec.Model;

namespace SpecLint.Rules.Engine;

/// <summary>Runs the analysis for a spec; rules use it to re-check a fix before they suggest it.</summary>
internal interface ISpecAnalyzer
{
    /// <summary>Analyses <paramref name="spec"/>: nominal always; noise and tolerance corners as asked.</summary>
    SpecAnalysis Analyze(TiaSpec spec, bool includeNoise, bool includeCorners);
}
