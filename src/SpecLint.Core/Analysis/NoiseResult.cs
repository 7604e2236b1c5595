using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis;

/// <summary>Noise figures of one operating point. Always quote <see cref="Temperature"/> and the band with them.</summary>
/// <param name="BandLow">Low end of the integration band.</param>
/// <param name="BandHigh">High end of the integration band.</param>
/// <param name="BandIsDefault">True when the band is SpecLint's default (1 Hz .. 10·f−3dB), not the spec's.</param>
/// <param name="Temperature">Temperature of the thermal-noise terms (the hottest in the spec for nominal metrics).</param>
/// <param name="Output">Output rms noise per source.</param>
/// <param name="OutputRms">Total output rms noise over the band.</param>
/// <param name="InputRms">Input-referred rms current, output rms / |Zt(0)| (references.md §1 row 10).</param>
/// <param name="SnrAtMinimumDb">20·log10(Imin·|Zt(0)| / output rms); null when Imin is zero.</param>
/// <param name="NoiseEquivalentPower">Input-referred rms current / responsivity, the rms optical power over the band; null without a responsivity.</param>
/// <param name="SpotFrequency">Frequency of <see cref="SpotDensities"/>: the geometric middle of the band.</param>
/// <param name="SpotDensities">Output PSD of each source at <see cref="SpotFrequency"/>.</param>
public sealed record NoiseResult(
    Frequency BandLow,
    Frequency BandHigh,
    bool BandIsDefault,
    Temperature Temperature,
    NoiseRms Output,
    Voltage OutputRms,
    Current InputRms,
    double? SnrAtMinimumDb,
    Power? NoiseEquivalentPower,
    Frequency SpotFrequency,
    NoiseDensities SpotDensities);
