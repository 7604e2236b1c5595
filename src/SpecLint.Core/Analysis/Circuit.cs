using System.Collections.Immutable;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis;

/// <summary>
/// One operating point of a TIA front end: every value the small-signal, noise and DC models need, each
/// one number (no spreads). Immutable; tolerance corners and Monte Carlo samples are made with
/// <c>with</c> expressions, e.g. <c>nominal with { Cf = nominal.Cf * 1.1 }</c>.
/// </summary>
/// <remarks>
/// The model is references.md §D4 / references.md §1: single- or two-pole op-amp, + input at AC ground, sensor =
/// current source ∥ Cd ∥ Rsh with its far terminal at <see cref="Vbias"/>, Cf + Cpar across Rf.
/// </remarks>
public sealed record Circuit
{
    /// <summary>Feedback resistance Rf (must be positive and finite).</summary>
    public required Resistance Rf { get; init; }

    /// <summary>Feedback capacitor Cf; zero for a parasitic-only design.</summary>
    public Capacitance Cf { get; init; } = Capacitance.Zero;

    /// <summary>Parasitic capacitance across Rf (layout, resistor body).</summary>
    public Capacitance Cpar { get; init; } = Capacitance.Zero;

    /// <summary>Sensor capacitance at its operating bias.</summary>
    public Capacitance SensorCapacitance { get; init; } = Capacitance.Zero;

    /// <summary>Op-amp common-mode input capacitance (counted at the − input, references.md §4 item 16).</summary>
    public Capacitance CommonModeCapacitance { get; init; } = Capacitance.Zero;

    /// <summary>Op-amp differential input capacitance (to AC ground, since the + input is at AC ground).</summary>
    public Capacitance DifferentialCapacitance { get; init; } = Capacitance.Zero;

    /// <summary>Board stray capacitance at the inverting node.</summary>
    public Capacitance StrayCapacitance { get; init; } = Capacitance.Zero;

    /// <summary>Sensor shunt resistance; null means infinite.</summary>
    public Resistance? Rsh { get; init; }

    /// <summary>Op-amp DC open-loop gain A0.</summary>
    public Gain A0 { get; init; } = Gain.FromDecibels(120);

    /// <summary>Op-amp gain-bandwidth product.</summary>
    public required Frequency Gbw { get; init; }

    /// <summary>Op-amp second pole; null for a single-pole op-amp.</summary>
    public Frequency? SecondPole { get; init; }

    /// <summary>Input voltage noise density, white part.</summary>
    public VoltageNoiseDensity En { get; init; } = VoltageNoiseDensity.Zero;

    /// <summary>1/f corner of the voltage noise (zero: no 1/f part).</summary>
    public Frequency EnCorner { get; init; } = Frequency.Zero;

    /// <summary>Input current noise density, white part.</summary>
    public CurrentNoiseDensity In { get; init; } = CurrentNoiseDensity.Zero;

    /// <summary>1/f corner of the current noise (zero: no 1/f part).</summary>
    public Frequency InCorner { get; init; } = Frequency.Zero;

    /// <summary>Input bias current, positive flowing out of the summing node into the op-amp pin.</summary>
    public Current Ib { get; init; } = Current.Zero;

    /// <summary>Input offset voltage, as a source in series with the + input.</summary>
    public Voltage Vos { get; init; } = Voltage.Zero;

    /// <summary>Sensor dark current (same orientation as the signal).</summary>
    public Current Idark { get; init; } = Current.Zero;

    /// <summary>Smallest signal current to resolve (sets the shot noise and the SNR figure).</summary>
    public Current Imin { get; init; } = Current.Zero;

    /// <summary>Full-scale signal current.</summary>
    public Current Imax { get; init; } = Current.Zero;

    /// <summary>Bias voltage on the + input.</summary>
    public Voltage Vbias { get; init; } = Voltage.Zero;

    /// <summary>Positive supply rail.</summary>
    public Voltage SupplyPositive { get; init; } = new(5);

    /// <summary>Negative supply rail.</summary>
    public Voltage SupplyNegative { get; init; } = Voltage.Zero;

    /// <summary>Closest approach of the output to the positive rail.</summary>
    public Voltage SwingToPositive { get; init; } = Voltage.Zero;

    /// <summary>Closest approach of the output to the negative rail.</summary>
    public Voltage SwingToNegative { get; init; } = Voltage.Zero;

    /// <summary>Signal current orientation at the summing node (references.md §D3).</summary>
    public CurrentDirection Direction { get; init; } = CurrentDirection.OutOfNode;

    /// <summary>Temperature of the resistors' thermal noise and of kT/q.</summary>
    public Temperature Temperature { get; init; } = Temperature.Room;

    /// <summary>Sensor responsivity, or null; enables the noise-equivalent power.</summary>
    public Responsivity? Responsivity { get; init; }

    /// <summary>
    /// Resistance in series with the selected feedback branch (Rf ∥ Cf): a gain switch's on-resistance or a
    /// potentiometer's wiper. Zero for a plain feedback pair.
    /// </summary>
    public Resistance FeedbackSeriesResistance { get; init; } = Resistance.Zero;

    /// <summary>
    /// The feedback branches of a switched-gain channel that are not selected: each still reaches the summing node
    /// through its open switch's off-capacitance. Empty for a single-gain channel.
    /// </summary>
    public ImmutableArray<OffBranch> OffBranches { get; init; } = [];

    /// <summary>
    /// An electrode's access resistance, between the source (current source ∥ sensor capacitance ∥ Rsh) and the
    /// summing node. Zero for a photodiode or an ideal current source.
    /// </summary>
    public Resistance SeriesResistance { get; init; } = Resistance.Zero;

    /// <summary>True when the circuit has a switch, a wiper, unselected branches or an access resistance.</summary>
    public bool HasNetwork => FeedbackSeriesResistance.Ohms > 0 || !OffBranches.IsDefaultOrEmpty || SeriesResistance.Ohms > 0;

    /// <summary>Total capacitance from the inverting node to AC ground: sensor + common-mode + differential + stray.</summary>
    public Capacitance Cin => SensorCapacitance + CommonModeCapacitance + DifferentialCapacitance + StrayCapacitance;

    /// <summary>The op-amp's and the board's capacitance at the inverting node, without the sensor's.</summary>
    public Capacitance NodeCapacitance => CommonModeCapacitance + DifferentialCapacitance + StrayCapacitance;

    /// <summary>The DC feedback resistance: Rf plus the switch's on-resistance or the wiper.</summary>
    public Resistance DcFeedbackResistance => Rf + FeedbackSeriesResistance;

    /// <summary>Total capacitance across Rf, Cf + Cpar.</summary>
    public Capacitance FeedbackCapacitance => Cf + Cpar;

    /// <summary>+1 when the signal drives the output above the bias (out of the node), −1 otherwise.</summary>
    public int Polarity => Direction == CurrentDirection.OutOfNode ? 1 : -1;
}
