namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>
/// SplitMix64 (G. Steele, D. Lea, C. Flood, "Fast splittable pseudorandom number generators", OOPSLA 2014;
/// constants as in S. Vigna's public-domain splitmix64.c). Written out here so results do not depend on the
/// runtime's <see cref="Random"/>, whose algorithm may change between .NET versions.
/// </summary>
internal struct SplitMix64
{
    private const ulong Gamma = 0x9E3779B97F4A7C15;

    private ulong _state;

    /// <summary>A generator whose first output is Mix(seed + γ).</summary>
    public SplitMix64(ulong seed)
    {
        _state = seed;
    }

    /// <summary>
    /// The generator of Monte Carlo sample <paramref name="index"/>: seeded with output number index + 1 of a
    /// parent generator seeded with <paramref name="seed"/>. Each sample's draws depend only on (seed, index),
    /// never on which thread ran it or in what order.
    /// </summary>
    public static SplitMix64 ForSample(long seed, long index) =>
        new(Mix(unchecked((ulong)seed + (((ulong)index + 1) * Gamma))));

    /// <summary>The finaliser: a bijective 64-bit mix.</summary>
    public static ulong Mix(ulong z)
    {
        unchecked
        {
            z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9;
            z = (z ^ (z >> 27)) * 0x94D049BB133111EB;
            return z ^ (z >> 31);
        }
    }

    /// <summary>The next 64 random bits.</summary>
    public ulong Next()
    {
        unchecked
        {
            _state += Gamma;
        }

        return Mix(_state);
    }

    /// <summary>A uniform double in [0, 1) from the top 53 bits.</summary>
    public double NextDouble() => (Next() >> 11) * (1.0 / (1UL << 53));

    /// <summary>A standard normal draw (Box–Muller, cosine branch only, so each call uses exactly two outputs).</summary>
    public double NextNormal()
    {
        // 1 − u is in (0, 1], so the logarithm is finite.
        var u1 = 1 - NextDouble();
        var u2 = NextDouble();
        return Math.Sqrt(-2 * Math.Log(u1)) * Math.Cos(2 * Math.PI * u2);
    }
}
