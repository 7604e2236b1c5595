using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>
/// The spread of a spec's phase margin, bandwidth and peaking over its part tolerances and temperature range
/// (references.md §1 "Tolerances", §4 items 13–14), and optionally a seeded Monte Carlo yield.
/// </summary>
/// <remarks>
/// <para>Varied: every spread in the spec — Rf, Cf (its own tolerance, IEC 60062 letter codes absolute below
/// 10 pF) and, as a separate factor, Cf's dielectric over the temperature range (<see cref="Dielectric"/>), Cpar,
/// sensor capacitance, stray capacitance, Rsh, GBW, the second pole, the temperature range, the supply rails,
/// dark current and bias. Vos and Ib are error bounds the DC analysis applies at both signs, so they are not
/// varied; Ib does follow the temperature (<see cref="ToleranceOptions.BiasCurrentDoublingKelvin"/>).</para>
/// <para>Extremes: all 2ⁿ vertices of the parameters that enter the loop (the others cannot move phase margin,
/// bandwidth or peaking and are held typical there), then a coordinate-wise search inside the box from the
/// most extreme vertex of each figure (<see cref="CornerSearch"/>). Past
/// <see cref="ToleranceOptions.MaxVertexParameters"/> loop parameters only the most influential are enumerated.</para>
/// </remarks>
internal static class ToleranceAnalyzer
{
    /// <summary>Analyses the tolerances of a spec; null when nothing in it varies.</summary>
    /// <param name="spec">The spec.</param>
    /// <param name="options">What to compute; <see cref="ToleranceOptions.CornersOnly"/> for the cheap path.</param>
    public static ToleranceResult? Analyze(TiaSpec spec, ToleranceOptions options)
    {
        ArgumentNullException.ThrowIfNull(spec);
        ArgumentNullException.ThrowIfNull(options);
        var box = new ToleranceBox(spec, options);
        if (box.Axes.IsEmpty)
        {
            return null;
        }

        var search = new CornerSearch(box);
        var found = search.Run(options);
        var (minPmX, minPm) = found[Extreme.MinPhaseMargin];
        var (maxPmX, maxPm) = found[Extreme.MaxPhaseMargin];
        var (minBwX, minBw) = found[Extreme.MinBandwidth];
        var (maxBwX, maxBw) = found[Extreme.MaxBandwidth];
        var (peakX, peak) = found[Extreme.MaxPeaking];

        var monteCarlo = options.MonteCarlo is { } mc ? MonteCarloRunner.Run(box, spec, options, mc) : null;
        return new ToleranceResult(
            [.. box.Axes.Select(a => a.ToVariedParameter())],
            minPm.PhaseMarginDeg is { } a ? Angle.FromDegrees(a) : null,
            box.CornerAt(minPmX),
            maxPm.PhaseMarginDeg is { } b ? Angle.FromDegrees(b) : null,
            minBw.BandwidthHz is { } c ? new Frequency(c) : null,
            box.CornerAt(minBwX),
            maxBw.BandwidthHz is { } d ? new Frequency(d) : null,
            box.CornerAt(maxBwX),
            peak.PeakingDb,
            box.CornerAt(peakX),
            minPm.PhaseMarginDeg is not { } worst || worst < 0,
            monteCarlo)
        {
            PhaseMarginMaxAt = box.CornerAt(maxPmX),
            CornerEvaluations = search.Evaluations,
            VertexParameters = search.EnumeratedAxes,
        };
    }

    /// <summary>
    /// The operating point at a corner of <paramref name="spec"/>'s tolerance box (for example
    /// <see cref="ToleranceResult.PhaseMarginMinAt"/>), with Ib at that corner's temperature. Parameters the
    /// corner does not name are typical.
    /// </summary>
    /// <param name="spec">The spec the corner belongs to.</param>
    /// <param name="corner">The corner.</param>
    /// <param name="options">The options the corner was found with (for the bias-current temperature law).</param>
    public static Circuit CircuitAt(TiaSpec spec, Corner corner, ToleranceOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(spec);
        ArgumentNullException.ThrowIfNull(corner);
        var box = new ToleranceBox(spec, options ?? ToleranceOptions.CornersOnly);
        return box.Build(box.PointOf(corner));
    }
}
