using SpecLint.Core.Analysis;
using SpecLint.Core.Spec;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Analysis;

/// <summary>The nominal output range is the exact finite-A0 solution, with Ib at the nominal temperature (issue 13 item 3).</summary>
public sealed class OutputRangeConsistencyTests
{
    // 40 °C .. 80 °C excludes 25 °C, so the nominal temperature is the middle, 60 °C; Ib 100 pA at 25 °C doubling
    // every 10 K is 100 pA·2^3.5 there. A0 = 40 dB makes the exact solution differ visibly from the ideal one.
    private const string Yaml = """
        spec: 1
        kind: transimpedance
        name: warm
        conditions: { temperature: 40 °C .. 80 °C, supply: { positive: 12 V, negative: -12 V } }
        bias: 0 V
        input:
          type: photodiode
          capacitance: 10 pF
          current: { min: 1 nA, max: 1 µA }
        amplifier:
          gbw: 10 MHz
          open-loop-gain: 40 dB
          voltage-noise: 8 nV/√Hz
          current-noise: 1 fA/√Hz
          input-capacitance: { common-mode: 5 pF, differential: 2 pF }
          bias-current: 100 pA
          offset-voltage: 1 mV
          output-swing: { to-negative: 50 mV, to-positive: 50 mV }
        feedback:
          resistance: 10 MΩ
          capacitance: 1 pF
        """;

    [Fact]
    public void Nominal_range_is_the_exact_solution_with_Ib_at_the_nominal_temperature()
    {
        var spec = SpecLoader.LoadText(Yaml, "warm.tia.yaml").Spec!;
        var r = TiaAnalyzer.Analyze(spec);

        // KCL at the inverting node with vo = A0·(Vos − vn) and Ib leaving the node (DC, no Rsh):
        // vo·(1 + 1/A0)/Rf = Vos/Rf + Ib + I, taken at both signs of Vos and Ib.
        var a0 = 100.0;
        var ib = 100e-12 * Math.Pow(2, 3.5);
        double Vo(double i, double vos, double b) => ((vos / 10e6) + b + i) * 10e6 / (1 + (1 / a0));
        var max = Vo(1e-6, 1e-3, ib);
        var min = Vo(0, -1e-3, -ib);
        Assert.Equal(max, r.Output.Max.Volts, 1e-12);
        Assert.Equal(min, r.Output.Min.Volts, 1e-12);
        Assert.Equal(60, r.Circuit.Temperature.Celsius, 1e-9);
        Assert.Equal(ib, r.Circuit.Ib.Amperes, 1e-20);
    }
}
