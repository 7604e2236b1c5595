using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis;

/// <summary>
/// Picks typical values, except for the offset voltage and bias current: those are error bounds applied
/// at both signs anyway, so the largest magnitude the spec allows is the honest nominal figure.
/// </summary>
public sealed class TypicalPicker : ISpreadPicker
{
    /// <summary>The shared instance.</summary>
    public static TypicalPicker Instance { get; } = new();

    /// <inheritdoc />
    public T Pick<T>(string pointer, Spread<T> spread)
        where T : struct, IQuantity<T> =>
        pointer is SpecPointers.OffsetVoltage or SpecPointers.BiasCurrent
            ? spread.WorstMagnitude
            : spread.Typ;
}
