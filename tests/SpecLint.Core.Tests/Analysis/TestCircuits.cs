using SpecLint.Core.Analysis;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Analysis;

/// <summary>Circuits the analysis tests share.</summary>
internal static class TestCircuits
{
    /// <summary>Cf45 of the worked example, √(Cin/(2π·Rf·GBW)) (references.md §1 row 14, §3.2).</summary>
    public static Capacitance Cf45 => new(Math.Sqrt(100e-12 / (2 * Math.PI * 1e6 * 10e6)));

    /// <summary>
    /// references.md §3.2 worked example: Cin = 100 pF, Rf = 1 MΩ, GBW = 10 MHz, single pole, A0 = 1e9, with the given Cf.
    /// </summary>
    public static Circuit WorkedExample(Capacitance cf) => new()
    {
        Rf = new Resistance(1e6),
        Cf = cf,
        SensorCapacitance = new Capacitance(100e-12),
        Gbw = new Frequency(10e6),
        A0 = new Gain(1e9),
        Temperature = new Temperature(300),
    };

    /// <summary>
    /// A photodiode front end with every feature in play: finite Rsh, a second pole, noise corners, offsets.
    /// </summary>
    public static Circuit Photodiode => new()
    {
        Rf = new Resistance(10e6),
        Cf = new Capacitance(1e-12),
        Cpar = new Capacitance(0.15e-12),
        SensorCapacitance = new Capacitance(12e-12),
        CommonModeCapacitance = new Capacitance(3e-12),
        DifferentialCapacitance = new Capacitance(2e-12),
        StrayCapacitance = new Capacitance(0.8e-12),
        Rsh = new Resistance(2e9),
        A0 = Gain.FromDecibels(115),
        Gbw = new Frequency(8e6),
        SecondPole = new Frequency(40e6),
        En = new VoltageNoiseDensity(7e-9),
        EnCorner = new Frequency(200),
        In = new CurrentNoiseDensity(0.6e-15),
        InCorner = new Frequency(50),
        Ib = new Current(1e-12),
        Vos = new Voltage(0.3e-3),
        Idark = new Current(50e-12),
        Imin = new Current(2e-9),
        Imax = new Current(150e-9),
        Vbias = new Voltage(0.2),
        SupplyPositive = new Voltage(5),
        SupplyNegative = Voltage.Zero,
        SwingToPositive = new Voltage(0.04),
        SwingToNegative = new Voltage(0.02),
        Temperature = Temperature.FromCelsius(25),
        Responsivity = new Responsivity(0.42),
    };
}
