using SpecLint.Core.Analysis;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Rules.Checking;

namespace SpecLint.Rules.Changes;

/// <summary>
/// The figures a reviewer compares between the base and the head of a change: nominal phase margin and its worst
/// corner, bandwidth, peaking, input-referred noise, output range and Monte Carlo yield. SI units; null where the
/// analysis gives no value (phase margin undefined, no corners run).
/// </summary>
internal sealed record MetricSnapshot(
    double? PhaseMarginDeg,
    double? PhaseMarginDegMin,
    string? PhaseMarginMinCorner,
    double? BandwidthHz,
    double? PeakingDb,
    double? InputNoiseRmsA,
    double? OutputMinV,
    double? OutputMaxV,
    double? Yield)
{
    /// <summary>The figures of an analysed spec (for a channel with more than one gain, its first setting's), or null when it did not load or the analysis did not run.</summary>
    public static MetricSnapshot? Of(SpecOutcome? outcome) => Of(outcome?.Analysis, outcome?.Tolerances);

    /// <summary>The figures of one gain setting, or null when its analysis did not run.</summary>
    public static MetricSnapshot? Of(SettingOutcome? setting) => Of(setting?.Analysis, setting?.Tolerances);

    private static MetricSnapshot? Of(AnalysisResult? a, ToleranceResult? t)
    {
        if (a is null)
        {
            return null;
        }

        return new MetricSnapshot(
            a.PhaseMargin?.Degrees,
            t?.PhaseMarginMin?.Degrees,
            t is null ? null : t.PhaseMarginMinAt.Describe(),
            a.Bandwidth?.Hertz,
            a.PeakingDb,
            a.Noise?.InputRms.Amperes,
            a.Output.Min.Volts,
            a.Output.Max.Volts,
            t?.MonteCarlo?.Yield);
    }
}
