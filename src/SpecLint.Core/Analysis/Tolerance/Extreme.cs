namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>The extremes the corner search looks for; each is scored so that larger is more extreme.</summary>
internal enum Extreme
{
    MinPhaseMargin,
    MaxPhaseMargin,
    MinBandwidth,
    MaxBandwidth,
    MaxPeaking,
}
