namespace SpecLint.Core.Analysis;

/// <summary>
/// Exact SI defining constants (CODATA 2018; SI Brochure, 9th ed., BIPM 2019). Both are exact by
/// definition since the 2019 SI redefinition, so no uncertainty is carried.
/// </summary>
public static class PhysicalConstants
{
    /// <summary>Boltzmann constant k in J/K (exact).</summary>
    public const double BoltzmannJoulesPerKelvin = 1.380649e-23;

    /// <summary>Elementary charge q in C (exact).</summary>
    public const double ElementaryChargeCoulombs = 1.602176634e-19;

    /// <summary>The thermal voltage kT/q.</summary>
    /// <param name="temperature">Absolute temperature.</param>
    public static Units.Voltage ThermalVoltage(Units.Temperature temperature) =>
        new(BoltzmannJoulesPerKelvin * temperature.Kelvin / ElementaryChargeCoulombs);
}
