using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis;

/// <summary>One frequency at which the loop gain magnitude |T| equals 1.</summary>
/// <param name="Frequency">Where |T| = 1.</param>
/// <param name="Direction">Whether |T| falls or rises through 1 there.</param>
/// <param name="Phase">∠T there, unwrapped continuously from ∠T(0) = 0 (so it can be below −180°).</param>
public sealed record LoopCrossing(Frequency Frequency, CrossingDirection Direction, Angle Phase)
{
    /// <summary>180° + ∠T: the phase margin this crossing would give. Meaningful only for a falling crossing.</summary>
    public Angle Margin => Angle.FromDegrees(180) + Phase;
}
