using SpecLint.Core.Units;

namespace SpecLint.Core.Spec.Model;

/// <summary>Operating conditions.</summary>
/// <param name="Temperature">Ambient temperature: one value or a range.</param>
/// <param name="SupplyPositive">The positive rail.</param>
/// <param name="SupplyNegative">The negative rail (0 V for a single supply).</param>
public sealed record Conditions(Spread<Temperature> Temperature, Spread<Voltage> SupplyPositive, Spread<Voltage> SupplyNegative)
{
    /// <summary>
    /// The temperature nominal metrics use (references.md §D5): 25 °C when it lies in the range, the single value
    /// when one is given, otherwise the middle of the range.
    /// </summary>
    public Temperature Nominal
    {
        get
        {
            if (Temperature.IsExact)
            {
                return Temperature.Typ;
            }

            var room = Units.Temperature.Room;
            if (Temperature.Form != ToleranceForm.Range)
            {
                return Temperature.Typ;
            }

            return room >= Temperature.Min && room <= Temperature.Max ? room : Temperature.Typ;
        }
    }

    /// <summary>The hottest temperature, at which noise is computed.</summary>
    public Temperature Hottest => Temperature.Max;
}
