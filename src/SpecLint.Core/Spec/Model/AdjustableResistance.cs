using SpecLint.Core.Units;

namespace SpecLint.Core.Spec.Model;

/// <summary>
/// A feedback resistance set by a potentiometer or a digital potentiometer (<c>feedback.resistance: { adjustable:
/// a .. b }</c>): the adjustment range is not a tolerance; every figure is evaluated over all of it.
/// </summary>
/// <param name="Low">The lowest setting of the element.</param>
/// <param name="High">The highest setting.</param>
/// <param name="Steps">The number of positions of a digital potentiometer (evenly spaced from low to high), or null for a continuous one.</param>
/// <param name="WiperResistance">Resistance of the wiper, in series with the element (Cf spans both).</param>
/// <param name="Tolerance">The element's own relative tolerance (0.2 for ±20 %), applied at every setting.</param>
public sealed record AdjustableResistance(Resistance Low, Resistance High, int? Steps, Resistance WiperResistance, double Tolerance)
{
    /// <summary>The resistance at one position of the element (wiper included), nominal.</summary>
    public Resistance At(Resistance element) => element + WiperResistance;
}
