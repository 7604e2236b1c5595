using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis;

/// <summary>Builds <see cref="Circuit"/> operating points from a <see cref="TiaSpec"/>.</summary>
public static class CircuitFactory
{
    /// <summary>
    /// The nominal operating point (references.md §D5): typical values at <see cref="Conditions.Nominal"/>, with the
    /// offset voltage and bias current at their largest magnitude (see <see cref="TypicalPicker"/>), the bias
    /// current moved from 25 °C to the nominal temperature as the corners move it (<see cref="BiasCurrentLaw"/>).
    /// Noise metrics are computed at <see cref="Conditions.Hottest"/> by <see cref="TiaAnalyzer.Analyze(TiaSpec)"/>.
    /// </summary>
    /// <param name="spec">The spec.</param>
    public static Circuit Nominal(TiaSpec spec)
    {
        ArgumentNullException.ThrowIfNull(spec);
        var nominal = spec.Conditions.Nominal;
        var c = Create(spec, nominal, TypicalPicker.Instance);
        var doubling = spec.Amplifier.BiasCurrentDoubling?.Kelvin ?? BiasCurrentLaw.DefaultDoublingKelvin;
        return c with { Ib = BiasCurrentLaw.At(c.Ib, nominal, doubling) };
    }

    /// <summary>Builds the operating point with the values <paramref name="picker"/> chooses, at <paramref name="temperature"/>.</summary>
    /// <param name="spec">The spec.</param>
    /// <param name="temperature">The temperature for thermal noise and kT/q.</param>
    /// <param name="picker">Chooses one value from each spread.</param>
    public static Circuit Create(TiaSpec spec, Temperature temperature, ISpreadPicker picker)
    {
        ArgumentNullException.ThrowIfNull(spec);
        ArgumentNullException.ThrowIfNull(picker);
        var amp = spec.Amplifier;
        var input = spec.Input;
        var fb = spec.Feedback;
        var (series, off) = Switched(spec);
        return new Circuit
        {
            FeedbackSeriesResistance = series,
            OffBranches = off,
            SeriesResistance = input.SeriesResistance is { } rs ? picker.Pick(SpecPointers.SeriesResistance, rs) : Resistance.Zero,
            Rf = picker.Pick(SpecPointers.FeedbackResistance, fb.Resistance),
            Cf = fb.Capacitance is { } cf ? picker.Pick(SpecPointers.FeedbackCapacitance, cf) : Capacitance.Zero,
            Cpar = picker.Pick(SpecPointers.ParasiticCapacitance, fb.ParasiticCapacitance),
            SensorCapacitance = picker.Pick(SpecPointers.SensorCapacitance, input.Capacitance),
            CommonModeCapacitance = amp.CommonModeCapacitance,
            DifferentialCapacitance = amp.DifferentialCapacitance,
            StrayCapacitance = picker.Pick(SpecPointers.StrayCapacitance, spec.Board.StrayCapacitance),
            Rsh = input.ShuntResistance is { } rsh ? picker.Pick(SpecPointers.ShuntResistance, rsh) : null,
            A0 = amp.OpenLoopGain,
            Gbw = picker.Pick(SpecPointers.Gbw, amp.Gbw),
            SecondPole = amp.SecondPole is { } p2 ? picker.Pick(SpecPointers.SecondPole, p2) : null,
            En = amp.VoltageNoise,
            EnCorner = amp.VoltageNoiseCorner ?? Frequency.Zero,
            In = amp.CurrentNoise,
            InCorner = amp.CurrentNoiseCorner ?? Frequency.Zero,
            Ib = picker.Pick(SpecPointers.BiasCurrent, amp.BiasCurrent),
            Vos = picker.Pick(SpecPointers.OffsetVoltage, amp.OffsetVoltage),
            Idark = picker.Pick(SpecPointers.DarkCurrent, input.DarkCurrent),
            Imin = input.CurrentMin,
            Imax = input.CurrentMax,
            Vbias = picker.Pick(SpecPointers.Bias, spec.Bias),
            SupplyPositive = picker.Pick(SpecPointers.SupplyPositive, spec.Conditions.SupplyPositive),
            SupplyNegative = picker.Pick(SpecPointers.SupplyNegative, spec.Conditions.SupplyNegative),
            SwingToPositive = amp.SwingToPositive,
            SwingToNegative = amp.SwingToNegative,
            Direction = input.Direction,
            Temperature = temperature,
            Responsivity = input.Responsivity,
        };
    }

    /// <summary>
    /// A switched channel's selected branch sees the switch's on-resistance; every other setting's branch (at its
    /// typical values) reaches the node through an open switch's off-capacitance. An ideal switch (none given) has
    /// neither, and the unselected branches then drop out.
    /// </summary>
    private static (Resistance Series, System.Collections.Immutable.ImmutableArray<OffBranch> Off) Switched(TiaSpec spec)
    {
        var fb = spec.Feedback;
        if (fb.Settings.IsDefaultOrEmpty || fb.Switch is not { } sw)
        {
            return (Resistance.Zero, []);
        }

        var off = System.Collections.Immutable.ImmutableArray.CreateBuilder<OffBranch>();
        if (sw.OffCapacitance.Farads > 0)
        {
            foreach (var s in fb.Settings)
            {
                if (s.Name != spec.Setting)
                {
                    off.Add(new OffBranch(s.Resistance.Typ, (s.Capacitance?.Typ ?? Capacitance.Zero) + s.ParasiticCapacitance.Typ, sw.OffCapacitance));
                }
            }
        }

        return (sw.OnResistance, off.ToImmutable());
    }
}
