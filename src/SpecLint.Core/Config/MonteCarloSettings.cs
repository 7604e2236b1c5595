namespace SpecLint.Core.Config;

/// <summary>The <c>monte-carlo</c> block of the repository configuration.</summary>
/// <param name="Samples">Random builds per spec (default 1000).</param>
/// <param name="Seed">Seed of the random generator, so runs repeat exactly (default 1).</param>
/// <param name="Distribution">How part values are drawn (default uniform).</param>
internal sealed record MonteCarloSettings(int Samples, long Seed, MonteCarloDistribution Distribution)
{
    /// <summary>1000 samples, seed 1, uniform.</summary>
    public static MonteCarloSettings Default { get; } = new(1000, 1, MonteCarloDistribution.Uniform);
}
