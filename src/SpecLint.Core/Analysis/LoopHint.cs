namespace SpecLint.Core.Analysis;

/// <summary>
/// Where a nearby operating point (a tolerance box's typical one) has its loop-gain crossover and its −3 dB point,
/// as ω² in (rad/s)². Samples of the box differ by tolerances of a few percent, so their roots lie close by and a
/// bracket around these starts the fast path's root search; zero (the default) means no hint.
/// </summary>
/// <param name="CrossoverOmegaSquared">ω² at |T| = 1, or 0.</param>
/// <param name="BandwidthOmegaSquared">ω² at the −3 dB point, or 0.</param>
internal readonly record struct LoopHint(double CrossoverOmegaSquared, double BandwidthOmegaSquared)
{
    /// <summary>No hint: the search starts from the middle of the loop's characteristic frequencies.</summary>
    public static LoopHint None => default;
}
