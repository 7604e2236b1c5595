using System.Globalization;
using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>One varied parameter: its limits in SI units (or as a factor when <see cref="Dimension"/> is null).</summary>
/// <param name="Kind">The circuit value it moves.</param>
/// <param name="Pointer">JSON Pointer of the spec key.</param>
/// <param name="Label">Short name for messages.</param>
/// <param name="Low">Low limit.</param>
/// <param name="Typ">Typical value.</param>
/// <param name="High">High limit.</param>
/// <param name="Dimension">Unit of the values, or null for a dimensionless factor.</param>
/// <param name="Source">Where the spread comes from, for the report.</param>
internal sealed record ToleranceAxis(AxisKind Kind, string Pointer, string Label, double Low, double Typ, double High, Dimension? Dimension, string Source)
{
    /// <summary>
    /// True when the axis enters the loop gain or the transimpedance (and so the phase margin, bandwidth and
    /// peaking). Temperature, rails, dark current and bias only move noise and DC figures.
    /// </summary>
    public bool AffectsLoop => Kind is AxisKind.FeedbackResistance or AxisKind.FeedbackCapacitance or AxisKind.Dielectric
        or AxisKind.ParasiticCapacitance or AxisKind.SensorCapacitance or AxisKind.ShuntResistance
        or AxisKind.StrayCapacitance or AxisKind.Gbw or AxisKind.SecondPole;

    /// <summary>The value at a position t ∈ [0, 1] across the box (0 = low, 1 = high); exact at both ends.</summary>
    public double At(double t) => t <= 0 ? Low : t >= 1 ? High : Low + (t * (High - Low));

    /// <summary>Which end a value sits at.</summary>
    public CornerEnd EndOf(double value) =>
        value == Low ? CornerEnd.Low : value == High ? CornerEnd.High : value == Typ ? CornerEnd.Typical : CornerEnd.Inside;

    /// <summary>A value formatted for people: three significant digits with its unit, or "×0.85" for a factor.</summary>
    public string Format(double value) => Dimension is { } d
        ? QuantityFormat.FormatRounded(value, d, 3)
        : "×" + value.ToString("0.####", CultureInfo.InvariantCulture);

    /// <summary>The parameter as the result lists it.</summary>
    public VariedParameter ToVariedParameter() => new(Pointer, Label, Format(Low), Format(Typ), Format(High), Source);
}
