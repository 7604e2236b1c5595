using System.Collections.Immutable;
using System.Globalization;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;

namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>
/// The tolerance box of one spec: every spread as an axis, and the circuit at any point of the box.
/// Vos and Ib are not axes: they are error bounds the DC analysis already applies at both signs; Ib does
/// follow the temperature (<see cref="ToleranceOptions.BiasCurrentDoublingKelvin"/>).
/// </summary>
internal sealed class ToleranceBox
{

    private LoopHint? _hint;
    private readonly Circuit _typical;
    private readonly double _ibAt25;
    private readonly double _doublingKelvin;

    public ToleranceBox(TiaSpec spec, ToleranceOptions options)
    {
        ArgumentNullException.ThrowIfNull(spec);
        ArgumentNullException.ThrowIfNull(options);
        var nominalT = spec.Conditions.Nominal;
        _typical = CircuitFactory.Create(spec, nominalT, TypicalPicker.Instance);
        _ibAt25 = _typical.Ib.Amperes;
        // The spec's own figure for its op-amp wins over the run-wide default.
        _doublingKelvin = spec.Amplifier.BiasCurrentDoubling?.Kelvin ?? options.BiasCurrentDoublingKelvin;

        var axes = new List<ToleranceAxis>();
        var fb = spec.Feedback;
        Add(axes, AxisKind.FeedbackResistance, SpecPointers.FeedbackResistance, "Rf", fb.Resistance);
        if (fb.Capacitance is { } cf)
        {
            Add(axes, AxisKind.FeedbackCapacitance, SpecPointers.FeedbackCapacitance, "Cf", cf);
            var t = spec.Conditions.Temperature;
            if (Dielectric.TryParse(fb.Dielectric, out var d))
            {
                var (lo, hi) = d.TemperatureFactors(t.Min, t.Max);
                if (lo != hi)
                {
                    var range = t.IsExact ? Celsius(t.Typ) : $"{Celsius(t.Min)} .. {Celsius(t.Max)}";
                    var rated = d.IsRatedFor(t.Min, t.Max) ? "" : $"; outside its rated {Celsius(d.RatedLow)} .. {Celsius(d.RatedHigh)}, so the change may be larger";
                    var how = d.Class == 2 ? " (class 2: the full change, as a bound)" : "";
                    axes.Add(new ToleranceAxis(AxisKind.Dielectric, "/feedback/dielectric", "Cf dielectric", lo, 1, hi, null,
                        $"{d.Describe()} over {range}{how}{rated}"));
                }
            }
        }

        Add(axes, AxisKind.ParasiticCapacitance, SpecPointers.ParasiticCapacitance, "Cpar", fb.ParasiticCapacitance);
        Add(axes, AxisKind.SensorCapacitance, SpecPointers.SensorCapacitance, "Csensor", spec.Input.Capacitance);
        if (spec.Input.ShuntResistance is { } rsh)
        {
            Add(axes, AxisKind.ShuntResistance, SpecPointers.ShuntResistance, "Rsh", rsh);
        }

        if (spec.Input.SeriesResistance is { } rs)
        {
            Add(axes, AxisKind.SeriesResistance, SpecPointers.SeriesResistance, "Rs", rs);
        }

        Add(axes, AxisKind.StrayCapacitance, SpecPointers.StrayCapacitance, "Cstray", spec.Board.StrayCapacitance);
        Add(axes, AxisKind.Gbw, SpecPointers.Gbw, "GBW", spec.Amplifier.Gbw);
        if (spec.Amplifier.SecondPole is { } p2)
        {
            Add(axes, AxisKind.SecondPole, SpecPointers.SecondPole, "fp2", p2);
        }

        var temp = spec.Conditions.Temperature;
        if (temp.Min.Kelvin < temp.Max.Kelvin)
        {
            var ib = (double.IsPositiveInfinity(_doublingKelvin) || _doublingKelvin <= 0)
                ? "Ib fixed"
                : string.Create(CultureInfo.InvariantCulture, $"Ib doubles every {_doublingKelvin:0.##} K from 25 °C");
            axes.Add(new ToleranceAxis(AxisKind.Temperature, "/conditions/temperature", "T",
                temp.Min.Kelvin, nominalT.Kelvin, temp.Max.Kelvin, Dimension.Temperature,
                $"operating range; moves Rf's thermal noise, {ib}"));
        }

        Add(axes, AxisKind.SupplyPositive, SpecPointers.SupplyPositive, "V+", spec.Conditions.SupplyPositive);
        Add(axes, AxisKind.SupplyNegative, SpecPointers.SupplyNegative, "V−", spec.Conditions.SupplyNegative);
        Add(axes, AxisKind.DarkCurrent, SpecPointers.DarkCurrent, "Idark", spec.Input.DarkCurrent);
        Add(axes, AxisKind.Bias, SpecPointers.Bias, "Vbias", spec.Bias);
        Axes = [.. axes];
    }

    /// <summary>Every axis, in the stable order of the result.</summary>
    public ImmutableArray<ToleranceAxis> Axes { get; }

    /// <summary>The typical point of the box.</summary>
    public double[] TypicalPoint() => [.. Axes.Select(a => a.Typ)];

    /// <summary>
    /// The typical point's loop roots, where the corner search and every Monte Carlo sample start their own root
    /// search; found once per box.
    /// </summary>
    public LoopHint Hint => _hint ??= TiaAnalyzer.LoopHintOf(Build(TypicalPoint()));

    /// <summary>The circuit at a point of the box (one value per axis).</summary>
    public Circuit Build(ReadOnlySpan<double> x)
    {
        var v = Read(x);
        return _typical with
        {
            Rf = new Resistance(v.Rf),
            // The dielectric's temperature change and Cf's own tolerance are separate factors (references.md §4 item 13).
            Cf = new Capacitance(v.Cf * v.CfFactor),
            Cpar = new Capacitance(v.Cpar),
            SensorCapacitance = new Capacitance(v.Sensor),
            StrayCapacitance = new Capacitance(v.Stray),
            Rsh = v.Rsh is { } r ? new Resistance(r) : null,
            Gbw = new Frequency(v.Gbw),
            SecondPole = v.SecondPole is { } p ? new Frequency(p) : null,
            Temperature = new Temperature(v.Kelvin),
            Ib = new Current(IbAt(v.Kelvin)),
            SupplyPositive = new Voltage(v.SupplyPositive),
            SupplyNegative = new Voltage(v.SupplyNegative),
            Idark = new Current(v.Idark),
            Vbias = new Voltage(v.Vbias),
            SeriesResistance = new Resistance(v.SeriesResistance),
        };
    }

    /// <summary>
    /// The loop of the circuit at a point without building it, for Monte Carlo samples; false when that circuit has
    /// a switch, wiper, unselected branches or an access resistance (<see cref="Build"/> serves those).
    /// </summary>
    /// <remarks>The same values, summed in the same order, as the built circuit's, so the same figures to the bit.</remarks>
    public bool TryPlainLoop(ReadOnlySpan<double> x, out PlainLoop loop)
    {
        var c = _typical;
        loop = default;
        if (c.FeedbackSeriesResistance.Ohms > 0 || !c.OffBranches.IsDefaultOrEmpty)
        {
            return false;
        }

        var v = Read(x);
        if (v.SeriesResistance > 0)
        {
            return false;
        }

        var cfb = new Capacitance(v.Cf * v.CfFactor) + new Capacitance(v.Cpar);
        var cin = new Capacitance(v.Sensor) + c.CommonModeCapacitance + c.DifferentialCapacitance + new Capacitance(v.Stray);
        loop = new PlainLoop(v.Rf, cfb.Farads, v.Rsh, cin.Farads, c.A0.Linear, v.Gbw, v.SecondPole);
        return true;
    }

    private readonly record struct PointValues(
        double Rf,
        double Cf,
        double CfFactor,
        double Cpar,
        double Sensor,
        double Stray,
        double? Rsh,
        double Gbw,
        double? SecondPole,
        double Kelvin,
        double SupplyPositive,
        double SupplyNegative,
        double Idark,
        double Vbias,
        double SeriesResistance);

    private PointValues Read(ReadOnlySpan<double> x)
    {
        var c = _typical;
        double rf = c.Rf.Ohms, cf = c.Cf.Farads, cfFactor = 1, cpar = c.Cpar.Farads, cs = c.SensorCapacitance.Farads;
        double stray = c.StrayCapacitance.Farads, gbw = c.Gbw.Hertz, kelvin = c.Temperature.Kelvin;
        double vpos = c.SupplyPositive.Volts, vneg = c.SupplyNegative.Volts, idark = c.Idark.Amperes, vbias = c.Vbias.Volts;
        var rsh = c.Rsh?.Ohms;
        var rs = c.SeriesResistance.Ohms;
        var p2 = c.SecondPole?.Hertz;
        for (var i = 0; i < x.Length; i++)
        {
            var v = x[i];
            switch (Axes[i].Kind)
            {
                case AxisKind.FeedbackResistance: rf = v; break;
                case AxisKind.FeedbackCapacitance: cf = v; break;
                case AxisKind.Dielectric: cfFactor = v; break;
                case AxisKind.ParasiticCapacitance: cpar = v; break;
                case AxisKind.SensorCapacitance: cs = v; break;
                case AxisKind.ShuntResistance: rsh = v; break;
                case AxisKind.StrayCapacitance: stray = v; break;
                case AxisKind.Gbw: gbw = v; break;
                case AxisKind.SecondPole: p2 = v; break;
                case AxisKind.Temperature: kelvin = v; break;
                case AxisKind.SupplyPositive: vpos = v; break;
                case AxisKind.SupplyNegative: vneg = v; break;
                case AxisKind.DarkCurrent: idark = v; break;
                case AxisKind.Bias: vbias = v; break;
                case AxisKind.SeriesResistance: rs = v; break;
            }
        }

        return new PointValues(rf, cf, cfFactor, cpar, cs, stray, rsh, gbw, p2, kelvin, vpos, vneg, idark, vbias, rs);
    }

    /// <summary>The corner record of a point.</summary>
    public Corner CornerAt(ReadOnlySpan<double> x)
    {
        var settings = ImmutableArray.CreateBuilder<CornerSetting>(Axes.Length);
        for (var i = 0; i < Axes.Length; i++)
        {
            var a = Axes[i];
            settings.Add(new CornerSetting(a.Pointer, a.Label, a.EndOf(x[i]), a.Format(x[i])) { SiValue = x[i] });
        }

        return new Corner(settings.MoveToImmutable());
    }

    /// <summary>The point a corner names (its <see cref="CornerSetting.SiValue"/>s, typical for axes it does not list).</summary>
    public double[] PointOf(Corner corner)
    {
        var x = TypicalPoint();
        for (var i = 0; i < Axes.Length; i++)
        {
            foreach (var s in corner.Settings)
            {
                if (s.Pointer == Axes[i].Pointer)
                {
                    x[i] = s.SiValue;
                }
            }
        }

        return x;
    }

    private double IbAt(double kelvin) => BiasCurrentLaw.At(new Current(_ibAt25), new Temperature(kelvin), _doublingKelvin).Amperes;

    // The shortest round-trip text can print 40 °C as "4E+01 °C"; tables want plain figures.
    private static string Celsius(Temperature t) => QuantityFormat.FormatRounded(t.Kelvin, Dimension.Temperature, 4);

    private static void Add<T>(List<ToleranceAxis> axes, AxisKind kind, string pointer, string label, Spread<T> spread)
        where T : struct, IQuantity<T>
    {
        if (!(spread.Min.Si < spread.Max.Si))
        {
            return;
        }

        axes.Add(new ToleranceAxis(kind, pointer, label, spread.Min.Si, spread.Typ.Si, spread.Max.Si, T.Dimension, SourceOf(spread)));
    }

    private static string SourceOf<T>(Spread<T> s)
        where T : struct, IQuantity<T>
    {
        var minus = s.Typ.Si - s.Min.Si;
        var plus = s.Max.Si - s.Typ.Si;
        var absolute = s.Form == ToleranceForm.Absolute
            || (s.Form == ToleranceForm.LetterCode && T.Dimension == Dimension.Capacitance && s.Typ.Si < ToleranceLetterCode.AbsoluteThresholdFarads);
        string deviation;
        if (absolute)
        {
            // Compared as printed: 0.68 pF ± 0.25 pF gives limits whose differences disagree in the last bit.
            var (p, m) = (QuantityFormat.FormatRounded(plus, T.Dimension, 3), QuantityFormat.FormatRounded(minus, T.Dimension, 3));
            deviation = p == m ? "±" + p : $"+{p}/−{m}";
        }
        else if (s.Typ.Si != 0)
        {
            var lo = 100 * minus / Math.Abs(s.Typ.Si);
            var hi = 100 * plus / Math.Abs(s.Typ.Si);
            deviation = Math.Abs(lo - hi) < 1e-9 * Math.Max(1, hi)
                ? string.Create(CultureInfo.InvariantCulture, $"±{hi:0.###} %")
                : string.Create(CultureInfo.InvariantCulture, $"+{hi:0.###}/−{lo:0.###} %");
        }
        else
        {
            deviation = $"{QuantityFormat.FormatRounded(s.Min.Si, T.Dimension, 4)} .. {QuantityFormat.FormatRounded(s.Max.Si, T.Dimension, 4)}";
        }

        return s.Form switch
        {
            ToleranceForm.LetterCode => $"letter code {s.ToleranceText?.Trim()} (IEC 60062): {deviation}",
            ToleranceForm.Range => $"range {QuantityFormat.FormatRounded(s.Min.Si, T.Dimension, 4)} .. {QuantityFormat.FormatRounded(s.Max.Si, T.Dimension, 4)}",
            _ => deviation,
        };
    }
}
