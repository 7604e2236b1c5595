using System.Collections.Immutable;
using SpecLint.Core.Spec;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Tolerance;

/// <summary>Specs with spreads, built directly (no YAML), for the tolerance tests.</summary>
internal static class TolerantSpecs
{
    public static Spread<T> Rel<T>(double typ, double percent)
        where T : struct, IQuantity<T> =>
        new(T.FromSi(typ), T.FromSi(typ * (1 - (percent / 100))), T.FromSi(typ * (1 + (percent / 100))), ToleranceForm.Relative);

    public static Spread<T> Exact<T>(double typ)
        where T : struct, IQuantity<T> => Spread<T>.Exact(T.FromSi(typ));

    public static Spread<Temperature> Range(double lowCelsius, double highCelsius) =>
        new(Temperature.FromCelsius((lowCelsius + highCelsius) / 2), Temperature.FromCelsius(lowCelsius), Temperature.FromCelsius(highCelsius), ToleranceForm.Range);

    /// <summary>A photodiode channel (references.md §D3 example values) with the spreads given; everything else exact.</summary>
    public static TiaSpec Channel(
        Spread<Resistance>? rf = null,
        Spread<Capacitance>? cf = null,
        string? dielectric = null,
        Spread<Capacitance>? sensor = null,
        Spread<Resistance>? rsh = null,
        Spread<Frequency>? gbw = null,
        Spread<Frequency>? secondPole = null,
        Spread<Temperature>? temperature = null,
        Gain? a0 = null,
        double biasCurrent = 1e-12,
        Requirements? requirements = null) => new(
        "ch.tia.yaml", 1, "transimpedance", "ch", null, [],
        new Conditions(temperature ?? Spread<Temperature>.Exact(Temperature.Room), Exact<Voltage>(5), Exact<Voltage>(0)),
        Exact<Voltage>(0.2),
        new SensorInput(
            SensorType.Photodiode,
            sensor ?? Exact<Capacitance>(12e-12),
            rsh,
            Exact<Current>(50e-12),
            new Current(2e-9),
            new Current(1.5e-6),
            CurrentDirection.OutOfNode,
            null),
        new Amplifier(
            gbw ?? Exact<Frequency>(8e6),
            a0 ?? Gain.FromDecibels(115),
            secondPole,
            new VoltageNoiseDensity(7e-9), null,
            new CurrentNoiseDensity(0.6e-15), null,
            new Capacitance(3e-12), new Capacitance(2e-12),
            Exact<Current>(biasCurrent),
            Exact<Voltage>(0.3e-3),
            new Voltage(0.02), new Voltage(0.04), null, null),
        new Feedback(rf ?? Exact<Resistance>(1e6), cf ?? Exact<Capacitance>(2.2e-12), dielectric, Exact<Capacitance>(0.15e-12)),
        new Board(Exact<Capacitance>(0.8e-12)),
        requirements ?? Requirements.None,
        ImmutableArray<Waiver>.Empty,
        SourceMap.Empty);
}
