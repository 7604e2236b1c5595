using SpecLint.Core.Units;

namespace SpecLint.Core.Spec.Model;

/// <summary>What the channel must achieve. Every member is optional and overrides the house default.</summary>
/// <param name="Bandwidth">Minimum closed-loop -3 dB bandwidth.</param>
/// <param name="PhaseMargin">Phase-margin floor.</param>
/// <param name="PeakingDb">Maximum gain peaking in dB.</param>
/// <param name="Noise">Noise band and input-referred limit.</param>
public sealed record Requirements(Frequency? Bandwidth, Angle? PhaseMargin, double? PeakingDb, NoiseRequirement? Noise)
{
    /// <summary>No requirements: house defaults apply throughout.</summary>
    public static Requirements None { get; } = new(null, null, null, null);
}
