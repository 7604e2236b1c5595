using System.Collections.Immutable;
using Microsoft.CodeAnalysis.Diagnostics;

namespace SpecLint.Analyzers;

/// <summary>
/// Every units analyzer, for hosts that run them on a compilation they build themselves
/// (<c>compilation.WithAnalyzers(UnitAnalyzers.All)</c>), such as the house-rule compiler.
/// </summary>
public static class UnitAnalyzers
{
    /// <summary>A new instance of each analyzer, in id order.</summary>
    public static ImmutableArray<DiagnosticAnalyzer> All => ImmutableArray.Create<DiagnosticAnalyzer>(
        new ImplausibleMagnitudeAnalyzer(),
        new UnitNameMismatchAnalyzer(),
        new MixedUnitArithmeticAnalyzer(),
        new CelsiusInThermalProductAnalyzer(),
        new DegreesAsRadiansAnalyzer(),
        new AngularFrequencyAsHertzAnalyzer(),
        new DecibelScaleAnalyzer(),
        new OptionDimensionMismatchAnalyzer());
}
