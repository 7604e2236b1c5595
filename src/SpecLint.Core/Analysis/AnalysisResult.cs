using System.Collections.Immutable;
using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis;

/// <summary>The figures of one operating point (references.md §D4, §5). Absent values are null, never 0.</summary>
/// <param name="Circuit">The operating point analysed.</param>
/// <param name="Transimpedance">|Zt(0)| with the finite A0 (the output moves by pol·|Zt(0)|·I, see <see cref="Circuit.Polarity"/>).</param>
/// <param name="LoopGainDc">T(0) = A0·Rsh/(Rsh + Rf).</param>
/// <param name="Bandwidth">First frequency where |Zt| falls through |Zt(0)|/√2, after any peak; null if not found in the scan.</param>
/// <param name="PeakingDb">max 20·log10(|Zt|/|Zt(0)|), 0 when the maximum is at DC.</param>
/// <param name="PeakFrequency">Where the peak is; null when <see cref="PeakingDb"/> is 0.</param>
/// <param name="PhaseMargin">180° + ∠T at the first falling |T| = 1 crossing; null when there is none (|T| never reaches 1).</param>
/// <param name="Crossover">Frequency of that crossing, or null.</param>
/// <param name="Crossings">Every |T| = 1 crossing in frequency order, with its direction.</param>
/// <param name="NoiseGainDc">DC noise gain 1 + Rf/Rsh.</param>
/// <param name="NoiseGainHighFrequency">1 + Cin/(Cf + Cpar); +∞ when Cf + Cpar = 0 (JSON writers should emit null).</param>
/// <param name="BetaZero">β zero 1/(2π·Rf·(Cf + Cpar)); null when Cf + Cpar = 0.</param>
/// <param name="BetaPole">β pole (1/Rf + 1/Rsh)/(2π·(Cin + Cf + Cpar)); null when that capacitance is 0.</param>
/// <param name="Output">DC output range and headroom.</param>
/// <param name="ShotToRfThermalRatio">Imin·Rf/(2kT/q) at the noise temperature: ≥ 1 means shot-noise limited.</param>
/// <param name="Noise">Noise figures, or null when not requested.</param>
public sealed record AnalysisResult(
    Circuit Circuit,
    Resistance Transimpedance,
    double LoopGainDc,
    Frequency? Bandwidth,
    double PeakingDb,
    Frequency? PeakFrequency,
    Angle? PhaseMargin,
    Frequency? Crossover,
    ImmutableArray<LoopCrossing> Crossings,
    double NoiseGainDc,
    double NoiseGainHighFrequency,
    Frequency? BetaZero,
    Frequency? BetaPole,
    OutputRange Output,
    double ShotToRfThermalRatio,
    NoiseResult? Noise);
