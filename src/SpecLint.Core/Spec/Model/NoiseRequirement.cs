using SpecLint.Core.Units;

namespace SpecLint.Core.Spec.Model;

/// <summary>The band noise is integrated over and the input-referred rms limit.</summary>
/// <param name="BandLow">Low end of the band, or null for the default.</param>
/// <param name="BandHigh">High end of the band, or null for the default.</param>
/// <param name="MaxInput">Largest allowed input-referred rms current noise, or null.</param>
public sealed record NoiseRequirement(Frequency? BandLow, Frequency? BandHigh, Current? MaxInput);
