using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis;

/// <summary>
/// How the op-amp's input bias current follows temperature: the spec gives it at 25 °C and it doubles every
/// <c>doublingKelvin</c> (leakage of a FET input's protection diodes, common practice: about every 10 K).
/// </summary>
public static class BiasCurrentLaw
{
    /// <summary>The default doubling interval, 10 K (common practice for FET inputs).</summary>
    public const double DefaultDoublingKelvin = 10;

    /// <summary>The temperature the spec's bias current is given at, 25 °C.</summary>
    public const double ReferenceCelsius = 25;

    /// <summary>The bias current at <paramref name="temperature"/>; zero or infinite doubling keeps it constant.</summary>
    /// <param name="at25">The bias current at 25 °C.</param>
    /// <param name="temperature">The temperature.</param>
    /// <param name="doublingKelvin">The rise over which it doubles.</param>
    public static Current At(Current at25, Temperature temperature, double doublingKelvin) =>
        double.IsPositiveInfinity(doublingKelvin) || !(doublingKelvin > 0)
            ? at25
            : new Current(at25.Amperes * Math.Pow(2, (temperature.Celsius - ReferenceCelsius) / doublingKelvin));
}
