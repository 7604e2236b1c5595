using System.Collections.Immutable;
using SpecLint.Core.Analysis;
using SpecLint.Core.Spec;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Analysis;

public sealed class CircuitFactoryTests
{
    /// <summary>The references.md §D3 example spec, built directly (no YAML).</summary>
    private static TiaSpec Spec(Spread<Capacitance>? cf) => new(
        "ch2.tia.yaml", 1, "transimpedance", "fluor-ch2", null, [],
        new Conditions(
            new Spread<Temperature>(Temperature.FromCelsius(25), Temperature.FromCelsius(-10), Temperature.FromCelsius(60), ToleranceForm.Range),
            new Spread<Voltage>(new Voltage(5), new Voltage(4.75), new Voltage(5.25), ToleranceForm.Relative),
            Spread<Voltage>.Exact(Voltage.Zero)),
        Spread<Voltage>.Exact(new Voltage(0.2)),
        new SensorInput(
            SensorType.Photodiode,
            new Spread<Capacitance>(new Capacitance(12e-12), new Capacitance(9.6e-12), new Capacitance(14.4e-12), ToleranceForm.Relative),
            Spread<Resistance>.Exact(new Resistance(2e9)),
            Spread<Current>.Exact(new Current(50e-12)),
            new Current(2e-9),
            new Current(1.5e-6),
            CurrentDirection.OutOfNode,
            new Responsivity(0.42)),
        new Amplifier(
            new Spread<Frequency>(new Frequency(8e6), new Frequency(5.6e6), new Frequency(10.4e6), ToleranceForm.Relative),
            Gain.FromDecibels(115),
            Spread<Frequency>.Exact(new Frequency(40e6)),
            new VoltageNoiseDensity(7e-9), new Frequency(200),
            new CurrentNoiseDensity(0.6e-15), null,
            new Capacitance(3e-12), new Capacitance(2e-12),
            Spread<Current>.Exact(new Current(1e-12)),
            new Spread<Voltage>(new Voltage(50e-6), new Voltage(-0.3e-3), new Voltage(0.3e-3), ToleranceForm.Range),
            new Voltage(0.02), new Voltage(0.04), null, null),
        new Feedback(Spread<Resistance>.Exact(new Resistance(1e6)), cf, "C0G", Spread<Capacitance>.Exact(new Capacitance(0.15e-12))),
        new Board(Spread<Capacitance>.Exact(new Capacitance(0.8e-12))),
        new Requirements(null, null, null, new NoiseRequirement(new Frequency(1), new Frequency(100e3), null)),
        ImmutableArray<Waiver>.Empty,
        SourceMap.Empty);

    [Fact]
    public void Nominal_takes_typical_values_at_the_nominal_temperature()
    {
        var c = CircuitFactory.Nominal(Spec(Spread<Capacitance>.Exact(new Capacitance(2.2e-12))));
        Assert.Equal(new Resistance(1e6), c.Rf);
        Assert.Equal(2.2e-12, c.Cf.Farads);
        Assert.Equal(new Frequency(8e6), c.Gbw);
        Assert.Equal(12e-12 + 3e-12 + 2e-12 + 0.8e-12, c.Cin.Farads, 1e-24);
        Assert.Equal(Temperature.FromCelsius(25), c.Temperature);
        Assert.Equal(new Voltage(5), c.SupplyPositive);
        // Offset is an error bound: its largest magnitude, not the 50 µV typical (TypicalPicker).
        Assert.Equal(0.3e-3, Math.Abs(c.Vos.Volts));
    }

    [Fact]
    public void Missing_Cf_is_a_parasitic_only_design()
    {
        var c = CircuitFactory.Nominal(Spec(null));
        Assert.Equal(Capacitance.Zero, c.Cf);
        Assert.Equal(0.15e-12, c.FeedbackCapacitance.Farads);
    }

    [Fact]
    public void Spec_analysis_puts_noise_at_the_hottest_temperature_over_the_required_band()
    {
        var r = TiaAnalyzer.Analyze(Spec(Spread<Capacitance>.Exact(new Capacitance(2.2e-12))));
        Assert.Equal(Temperature.FromCelsius(60), r.Noise!.Temperature);
        Assert.Equal(Temperature.FromCelsius(25), r.Circuit.Temperature);
        Assert.Equal(100e3, r.Noise.BandHigh.Hertz);
        Assert.False(r.Noise.BandIsDefault);
    }

    [Fact]
    public void A_picker_chooses_corner_values()
    {
        var c = CircuitFactory.Create(Spec(null), Temperature.FromCelsius(60), new MinPicker());
        Assert.Equal(new Frequency(5.6e6), c.Gbw);
        Assert.Equal(new Capacitance(9.6e-12), c.SensorCapacitance);
    }

    private sealed class MinPicker : ISpreadPicker
    {
        public T Pick<T>(string pointer, Spread<T> spread)
            where T : struct, IQuantity<T> => spread.Min;
    }
}
