using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis;

/// <summary>Integrated output rms noise of each source over the band (they add in power).</summary>
/// <param name="RfThermal">Rf thermal noise.</param>
/// <param name="RshThermal">Rsh thermal noise (zero when Rsh is infinite).</param>
/// <param name="Shot">Shot noise of Imin + Idark.</param>
/// <param name="CurrentNoise">Op-amp current noise, 1/f part included.</param>
/// <param name="VoltageNoise">Op-amp voltage noise through the noise gain, 1/f part included.</param>
public sealed record NoiseRms(Voltage RfThermal, Voltage RshThermal, Voltage Shot, Voltage CurrentNoise, Voltage VoltageNoise)
{
    /// <summary>Thermal noise of a switch, wiper, unselected branches or access resistance (zero for a plain channel).</summary>
    public Voltage SeriesThermal { get; init; }

    /// <summary>The root-sum-square of all sources.</summary>
    public Voltage Total => new(Math.Sqrt(
        Sq(RfThermal) + Sq(RshThermal) + Sq(Shot) + Sq(CurrentNoise) + Sq(VoltageNoise) + Sq(SeriesThermal)));

    private static double Sq(Voltage v) => v.Volts * v.Volts;
}
