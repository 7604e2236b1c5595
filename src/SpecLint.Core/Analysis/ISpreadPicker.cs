using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis;

/// <summary>
/// Chooses one value from each spread of a spec when a <see cref="Circuit"/> is built: the typical value
/// for nominal metrics, a limit for a tolerance corner, a random draw for Monte Carlo.
/// </summary>
public interface ISpreadPicker
{
    /// <summary>Picks the value used for the spec key at <paramref name="pointer"/>.</summary>
    /// <typeparam name="T">The quantity type.</typeparam>
    /// <param name="pointer">JSON Pointer of the key, e.g. <c>/feedback/capacitance</c>.</param>
    /// <param name="spread">The key's typical value and limits.</param>
    T Pick<T>(string pointer, Spread<T> spread)
        where T : struct, IQuantity<T>;
}
