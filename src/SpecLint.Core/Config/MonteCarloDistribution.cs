namespace SpecLint.Core.Config;

/// <summary>How Monte Carlo draws a part value within its tolerance.</summary>
public enum MonteCarloDistribution
{
    /// <summary>Every value between the limits equally likely (the default: a tolerance is a limit, not a spread).</summary>
    Uniform,

    /// <summary>Normal, with the tolerance limits at ±3σ, clipped to the limits.</summary>
    Normal,
}
