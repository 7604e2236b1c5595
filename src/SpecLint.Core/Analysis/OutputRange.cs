using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis;

/// <summary>
/// The DC output from zero signal (dark current alone) to full scale (<c>Imax + Idark</c>), widened by the
/// offset and bias-current errors at their worst signs (references.md §1 row 12), and the range the op-amp can drive.
/// </summary>
/// <param name="Idle">Ideal output with dark current only, Vbias + pol·Idark·Rf.</param>
/// <param name="FullScale">Ideal output at full scale, Vbias + pol·(Imax + Idark)·Rf.</param>
/// <param name="ErrorBand">|Vos|·(1 + Rf/Rsh) + |Ib|·Rf, added on both sides.</param>
/// <param name="Min">Lowest output of the ideal formula, errors included.</param>
/// <param name="Max">Highest output of the ideal formula, errors included.</param>
/// <param name="MinExact">Lowest output of the exact finite-A0 DC solution over ±Vos × ±Ib × (idle, full scale).</param>
/// <param name="MaxExact">Highest output of the exact finite-A0 DC solution over the same eight cases.</param>
/// <param name="LowLimit">Lowest output the op-amp can reach, V− + swing to the negative rail.</param>
/// <param name="HighLimit">Highest output the op-amp can reach, V+ − swing to the positive rail.</param>
public sealed record OutputRange(
    Voltage Idle,
    Voltage FullScale,
    Voltage ErrorBand,
    Voltage Min,
    Voltage Max,
    Voltage MinExact,
    Voltage MaxExact,
    Voltage LowLimit,
    Voltage HighLimit)
{
    /// <summary>Margin to the low limit (negative when the output clips), using the exact solution.</summary>
    public Voltage HeadroomLow => MinExact - LowLimit;

    /// <summary>Margin to the high limit (negative when the output clips), using the exact solution.</summary>
    public Voltage HeadroomHigh => HighLimit - MaxExact;

    /// <summary>True when the whole exact range lies within the op-amp's swing.</summary>
    public bool Fits => HeadroomLow.Volts >= 0 && HeadroomHigh.Volts >= 0;
}
