using System.Collections.Immutable;
using SpecLint.Core.Analysis;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Tests.Analysis;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Ngspice;

/// <summary>Invented circuits for the ngspice cross-check, spanning the cases the analysis must get right.</summary>
internal static class NgspiceCases
{
    public static IReadOnlyDictionary<string, Circuit> All { get; } = new Dictionary<string, Circuit>
    {
        ["worked example, Cf45"] = TestCircuits.WorkedExample(TestCircuits.Cf45) with
        {
            En = new VoltageNoiseDensity(5e-9),
            In = new CurrentNoiseDensity(2e-15),
            Imin = new Current(10e-9),
            Imax = new Current(2e-6),
            Vbias = new Voltage(0.5),
            Vos = new Voltage(1e-3),
            Ib = new Current(1e-9),
        },
        ["10 kΩ fast with a second pole"] = new Circuit
        {
            Rf = new Resistance(10e3),
            Cf = new Capacitance(4.7e-12),
            SensorCapacitance = new Capacitance(50e-12),
            Gbw = new Frequency(50e6),
            SecondPole = new Frequency(200e6),
            A0 = Gain.FromDecibels(100),
            En = new VoltageNoiseDensity(3e-9),
            EnCorner = new Frequency(1e3),
            In = new CurrentNoiseDensity(1e-12),
            Imin = new Current(1e-6),
            Imax = new Current(200e-6),
            Vbias = new Voltage(0.1),
            Vos = new Voltage(2e-3),
            Ib = new Current(5e-6),
            Temperature = Temperature.FromCelsius(85),
        },
        ["10 GΩ parasitic-only Cf"] = new Circuit
        {
            Rf = new Resistance(10e9),
            Cpar = new Capacitance(0.2e-12),
            SensorCapacitance = new Capacitance(5e-12),
            CommonModeCapacitance = new Capacitance(2e-12),
            Gbw = new Frequency(1e6),
            A0 = Gain.FromDecibels(120),
            En = new VoltageNoiseDensity(20e-9),
            EnCorner = new Frequency(10),
            In = new CurrentNoiseDensity(0.1e-15),
            InCorner = new Frequency(5),
            Imin = new Current(10e-12),
            Imax = new Current(300e-12),
            Idark = new Current(1e-12),
            Vos = new Voltage(50e-6),
            Ib = new Current(20e-15),
            Vbias = new Voltage(0.3),
        },
        ["photodiode with second pole and Rsh"] = TestCircuits.Photodiode,
        ["electrode with 10 nF"] = new Circuit
        {
            Rf = new Resistance(100e6),
            Cf = new Capacitance(47e-12),
            SensorCapacitance = new Capacitance(10e-9),
            Rsh = new Resistance(1e9),
            Gbw = new Frequency(1e6),
            A0 = Gain.FromDecibels(110),
            En = new VoltageNoiseDensity(10e-9),
            EnCorner = new Frequency(50),
            In = new CurrentNoiseDensity(1e-15),
            Imin = new Current(1e-12),
            Imax = new Current(20e-9),
            Vbias = new Voltage(1.5),
            Vos = new Voltage(0.5e-3),
            Ib = new Current(2e-12),
            Temperature = Temperature.FromCelsius(37),
        },
        ["Rsh close to Rf"] = new Circuit
        {
            Rf = new Resistance(10e6),
            Rsh = new Resistance(12e6),
            Cf = new Capacitance(2.2e-12),
            SensorCapacitance = new Capacitance(20e-12),
            Gbw = new Frequency(5e6),
            A0 = Gain.FromDecibels(100),
            En = new VoltageNoiseDensity(8e-9),
            In = new CurrentNoiseDensity(5e-15),
            Imin = new Current(1e-9),
            Imax = new Current(100e-9),
            Vbias = new Voltage(1),
            Vos = new Voltage(1e-3),
            Ib = new Current(10e-12),
        },
        ["loop never reaches one"] = new Circuit
        {
            Rf = new Resistance(1e6),
            Rsh = new Resistance(1e5),
            Cf = new Capacitance(1e-12),
            SensorCapacitance = new Capacitance(100e-12),
            A0 = new Gain(5),
            Gbw = new Frequency(1e6),
            En = new VoltageNoiseDensity(10e-9),
            Imin = new Current(1e-6),
            Imax = new Current(1e-6),
            Vbias = new Voltage(2),
            Vos = new Voltage(3e-3),
            Ib = new Current(1e-9),
        },
        ["rising then falling crossing"] = new Circuit
        {
            Rf = new Resistance(1e9),
            Rsh = new Resistance(1e5),
            Cf = new Capacitance(1e-12),
            A0 = new Gain(1e3),
            Gbw = new Frequency(10e6),
            En = new VoltageNoiseDensity(4e-9),
            Imin = new Current(1e-9),
            Imax = new Current(5e-9),
            Vbias = new Voltage(2.5),
            Vos = new Voltage(0.1e-3),
        },
        ["Cf = 0 two-pole loop"] = TestCircuits.WorkedExample(Capacitance.Zero) with
        {
            En = new VoltageNoiseDensity(5e-9),
            In = new CurrentNoiseDensity(1e-15),
            Imin = new Current(1e-9),
        },
        ["100 kΩ into the node, split rails"] = new Circuit
        {
            Rf = new Resistance(100e3),
            Cf = new Capacitance(3.3e-12),
            Cpar = new Capacitance(0.1e-12),
            SensorCapacitance = new Capacitance(30e-12),
            DifferentialCapacitance = new Capacitance(1e-12),
            Gbw = new Frequency(20e6),
            SecondPole = new Frequency(60e6),
            A0 = Gain.FromDecibels(80),
            En = new VoltageNoiseDensity(4e-9),
            EnCorner = new Frequency(2e3),
            In = new CurrentNoiseDensity(0.5e-12),
            InCorner = new Frequency(10e3),
            Imin = new Current(100e-9),
            Imax = new Current(30e-6),
            Idark = new Current(1e-9),
            Vbias = new Voltage(-1),
            SupplyPositive = new Voltage(5),
            SupplyNegative = new Voltage(-5),
            Direction = CurrentDirection.IntoNode,
            Vos = new Voltage(0.2e-3),
            Ib = new Current(50e-9),
            Temperature = Temperature.FromCelsius(-20),
        },
        ["second pole below crossover"] = TestCircuits.WorkedExample(new Capacitance(0.3e-12)) with
        {
            SecondPole = new Frequency(300e3),
            En = new VoltageNoiseDensity(5e-9),
        },
        ["switched gain, low selected"] = Switched(0),
        ["switched gain, middle selected"] = Switched(1),
        ["switched gain, high selected"] = Switched(2),
        ["potentiometer at 12 kΩ"] = Potentiometer(12e3),
        ["potentiometer at 150 kΩ"] = Potentiometer(150e3),
        ["potentiometer at 1 MΩ"] = Potentiometer(1e6),
        ["electrode with 20 kΩ access resistance"] = new Circuit
        {
            Rf = new Resistance(10e6),
            Cf = new Capacitance(10e-12),
            SeriesResistance = new Resistance(20e3),
            SensorCapacitance = new Capacitance(2e-9),
            Rsh = new Resistance(50e6),
            CommonModeCapacitance = new Capacitance(4e-12),
            StrayCapacitance = new Capacitance(2e-12),
            Gbw = new Frequency(2e6),
            A0 = Gain.FromDecibels(115),
            En = new VoltageNoiseDensity(12e-9),
            EnCorner = new Frequency(30),
            In = new CurrentNoiseDensity(2e-15),
            Imin = new Current(50e-12),
            Imax = new Current(200e-9),
            Vbias = new Voltage(0.6),
            Vos = new Voltage(0.3e-3),
            Ib = new Current(3e-12),
            Temperature = Temperature.FromCelsius(30),
        },
        ["electrode, no shunt, 1 MΩ access resistance"] = new Circuit
        {
            Rf = new Resistance(1e9),
            Cf = new Capacitance(1e-12),
            SeriesResistance = new Resistance(1e6),
            SensorCapacitance = new Capacitance(30e-12),
            CommonModeCapacitance = new Capacitance(3e-12),
            Gbw = new Frequency(1e6),
            A0 = Gain.FromDecibels(120),
            En = new VoltageNoiseDensity(15e-9),
            In = new CurrentNoiseDensity(0.5e-15),
            Imin = new Current(2e-12),
            Imax = new Current(2e-9),
            Vbias = new Voltage(0),
            SupplyNegative = new Voltage(-5),
            Vos = new Voltage(1e-3),
            Ib = new Current(1e-13),
        },
    };

    /// <summary>
    /// A three-range light meter (invented): 10 kΩ ∥ 22 pF, 1 MΩ ∥ 2.2 pF and 100 MΩ ∥ 0.5 pF, one selected through a
    /// 120 Ω on-resistance, the others behind 4 pF of off-capacitance each.
    /// </summary>
    private static Circuit Switched(int selected)
    {
        (double R, double C)[] branches = [(10e3, 22e-12), (1e6, 2.2e-12), (100e6, 0.5e-12)];
        var off = ImmutableArray.CreateBuilder<OffBranch>();
        for (var k = 0; k < branches.Length; k++)
        {
            if (k != selected)
            {
                off.Add(new OffBranch(new Resistance(branches[k].R), new Capacitance(branches[k].C), new Capacitance(4e-12)));
            }
        }

        return new Circuit
        {
            Rf = new Resistance(branches[selected].R),
            Cf = new Capacitance(branches[selected].C),
            Cpar = new Capacitance(0.05e-12),
            FeedbackSeriesResistance = new Resistance(120),
            OffBranches = off.ToImmutable(),
            SensorCapacitance = new Capacitance(60e-12),
            Rsh = new Resistance(500e6),
            CommonModeCapacitance = new Capacitance(3e-12),
            Gbw = new Frequency(8e6),
            SecondPole = new Frequency(40e6),
            A0 = Gain.FromDecibels(110),
            En = new VoltageNoiseDensity(7e-9),
            EnCorner = new Frequency(100),
            In = new CurrentNoiseDensity(3e-15),
            Imin = new Current(1e-9),
            Imax = new Current(selected == 0 ? 200e-6 : selected == 1 ? 2e-6 : 20e-9),
            Idark = new Current(20e-12),
            Vbias = new Voltage(0.2),
            Vos = new Voltage(0.5e-3),
            Ib = new Current(5e-12),
        };
    }

    /// <summary>A digital potentiometer (invented) at one position: the element plus its 75 Ω wiper, across 4.7 pF.</summary>
    private static Circuit Potentiometer(double elementOhms) => new()
    {
        Rf = new Resistance(elementOhms + 75),
        Cf = new Capacitance(4.7e-12),
        SensorCapacitance = new Capacitance(25e-12),
        Gbw = new Frequency(10e6),
        A0 = Gain.FromDecibels(105),
        En = new VoltageNoiseDensity(6e-9),
        In = new CurrentNoiseDensity(10e-15),
        Imin = new Current(5e-9),
        Imax = new Current(3e-6),
        Vbias = new Voltage(0.25),
        Vos = new Voltage(0.8e-3),
        Ib = new Current(2e-12),
    };
}
