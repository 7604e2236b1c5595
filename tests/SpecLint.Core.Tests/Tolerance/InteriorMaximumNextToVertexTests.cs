using SpecLint.Core.Analysis;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Spec;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Tolerance;

/// <summary>
/// The corner search refines around the best vertex too, not only around interior grid points (issue 13 item 2):
/// here the bandwidth is largest at Cd ×1.373, between the +50 % vertex and its grid neighbour ×1.25.
/// </summary>
public sealed class InteriorMaximumNextToVertexTests
{
    private const string Yaml = """
        spec: 1
        kind: transimpedance
        name: vertex-neighbour
        conditions: { temperature: 25 °C, supply: { positive: 5 V, negative: 0 V } }
        bias: 0 V
        input:
          type: photodiode
          capacitance: 45 pF ±50%
          current: { min: 1 nA, max: 10 µA }
        amplifier:
          gbw: 82.5 MHz
          open-loop-gain: 82.5 dB
          second-pole: 100 MHz
          voltage-noise: 5 nV/√Hz
          current-noise: 1 fA/√Hz
          input-capacitance: { common-mode: 5.2 pF, differential: 3.1 pF }
          bias-current: 1 pA
          offset-voltage: 1 mV
          output-swing: { to-negative: 10 mV, to-positive: 10 mV }
        feedback:
          resistance: 93.753 kΩ
          capacitance: 1.68 pF
          parasitic-capacitance: 36.5 fF
        board:
          stray-capacitance: 1.5 pF
        """;

    [Fact]
    public void Bandwidth_maximum_between_a_vertex_and_its_neighbour_is_found()
    {
        var load = SpecLoader.LoadText(Yaml, "vertex-neighbour.tia.yaml");
        Assert.True(load.IsValid, string.Join("; ", load.Diagnostics.Select(d => d.Message)));
        var spec = load.Spec!;
        var r = ToleranceAnalyzer.Analyze(spec, ToleranceOptions.CornersOnly)!;

        // Independent: sample the Cd axis every 0.1 % and refine the best sample by golden section.
        var nominal = CircuitFactory.Nominal(spec);
        double Bw(double factor) => TiaAnalyzer.Analyze(
            nominal with { SensorCapacitance = new Capacitance(45e-12 * factor) },
            AnalysisOptions.WithoutNoise).Bandwidth!.Value.Hertz;
        var best = 0.5;
        for (var k = 0.5; k <= 1.5; k += 0.001)
        {
            best = Bw(k) > Bw(best) ? k : best;
        }

        var (a, b) = (best - 0.001, Math.Min(1.5, best + 0.001));
        for (var i = 0; i < 100; i++)
        {
            var m1 = a + ((b - a) / 3);
            var m2 = b - ((b - a) / 3);
            (a, b) = Bw(m1) < Bw(m2) ? (m1, b) : (a, m2);
        }

        var argMax = (a + b) / 2;
        Assert.Equal(1.373, argMax, 0.001);
        var bwMax = Bw(argMax);
        Assert.True(bwMax > Bw(1.5) * (1 + 1e-4), "the maximum is inside the box, clearly above the vertex");
        Assert.Equal(1, r.BandwidthMax!.Value.Hertz / bwMax, 1e-9);
    }
}
