using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis;

/// <summary>
/// Output noise power spectral densities of each source at one frequency, in V²/Hz (they add in power,
/// references.md §4 item 17). Use <see cref="Density"/> for V/√Hz.
/// </summary>
/// <param name="RfThermal">4kT/Rf through |Zt|².</param>
/// <param name="RshThermal">4kT/Rsh through |Zt|² (zero when Rsh is infinite).</param>
/// <param name="Shot">2q(Imin + Idark) through |Zt|².</param>
/// <param name="CurrentNoise">Op-amp i_n²(1 + f_ci/f) through |Zt|².</param>
/// <param name="VoltageNoise">Op-amp e_n²(1 + f_ce/f) through the noise gain |A/(1 + Aβ)|².</param>
public readonly record struct NoiseDensities(
    double RfThermal,
    double RshThermal,
    double Shot,
    double CurrentNoise,
    double VoltageNoise)
{
    /// <summary>
    /// Thermal noise of the resistances a network adds, through their own transfers: a gain switch's on-resistance or
    /// a wiper, the unselected feedback resistors (through their switches' off-capacitance) and an electrode's access
    /// resistance. Zero for a plain Rf ∥ Cf channel.
    /// </summary>
    public double SeriesThermal { get; init; }

    /// <summary>The sum of all sources in V²/Hz.</summary>
    public double Total => RfThermal + RshThermal + Shot + CurrentNoise + VoltageNoise + SeriesThermal;

    /// <summary>Converts a PSD in V²/Hz to a density in V/√Hz.</summary>
    /// <param name="psdVoltsSquaredPerHertz">A member of this record.</param>
    public static VoltageNoiseDensity Density(double psdVoltsSquaredPerHertz) => new(Math.Sqrt(psdVoltsSquaredPerHertz));
}
