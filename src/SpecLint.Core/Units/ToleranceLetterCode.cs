namespace SpecLint.Core.Units;

/// <summary>
/// One IEC 60062 tolerance letter. For capacitors the letters B, C, D, F and G are absolute below
/// 10 pF (references.md §3.5, from memory: IEC 60062:2016 not consulted).
/// </summary>
/// <param name="Letter">The code letter.</param>
/// <param name="MinusPercent">Relative tolerance below the nominal, in percent.</param>
/// <param name="PlusPercent">Relative tolerance above the nominal, in percent.</param>
/// <param name="AbsoluteBelow10pF">The absolute tolerance in farads for capacitors under 10 pF, or null when the letter is not used there.</param>
public sealed record ToleranceLetterCode(char Letter, double MinusPercent, double PlusPercent, double? AbsoluteBelow10pF)
{
    /// <summary>The capacitance below which capacitor letters mean an absolute tolerance.</summary>
    public const double AbsoluteThresholdFarads = 10e-12;

    /// <summary>The deviation below and above <paramref name="typ"/>; NaN when the letter has no meaning for the value.</summary>
    public (double Minus, double Plus, bool Absolute) Deviation(double typ, Dimension dimension)
    {
        if (dimension == Dimension.Capacitance && typ < AbsoluteThresholdFarads)
        {
            return AbsoluteBelow10pF is { } abs ? (abs, abs, true) : (double.NaN, double.NaN, true);
        }

        return (Math.Abs(typ) * MinusPercent / 100, Math.Abs(typ) * PlusPercent / 100, false);
    }
}
