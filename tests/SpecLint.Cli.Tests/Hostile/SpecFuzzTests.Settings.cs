using CsCheck;
using System.Diagnostics;
using System.Text;

namespace SpecLint.Cli.Tests.Hostile;

/// <summary>The same seeded mutations over channels with switched settings, an adjustable Rf and an electrode.</summary>
public sealed partial class SpecFuzzTests
{
    private const int GainInputs = 300;

    private const string MoreThanOneGain = """
        spec: 1
        kind: transimpedance
        name: fuzz-gain
        conditions:
          temperature: 0 °C .. 40 °C
          supply: { positive: 5 V, negative: 0 V }
        bias: 0.2 V
        input:
          type: electrode
          series-resistance: 10 kΩ ±20%
          capacitance: 1 nF ±20%
          shunt-resistance: 1 GΩ
          current: { min: 1 nA, max: 1 µA }
        amplifier:
          gbw: 8 MHz
          voltage-noise: 7 nV/√Hz
          current-noise: 3 fA/√Hz
          input-capacitance: { common-mode: 3 pF, differential: 1 pF }
          bias-current: 5 pA
          offset-voltage: 0.5 mV
          output-swing: { to-negative: 20 mV, to-positive: 20 mV }
        feedback:
          settings:
            - name: low
              resistance: 20 kΩ ±1%
              capacitance: 22 pF ±5%
              input: { current: { min: 1 µA, max: 200 µA } }
            - name: high
              resistance: 2 MΩ ±1%
              capacitance: 2.2 pF ±5%
              requirements: { bandwidth: 2 kHz }
          switch: { on-resistance: 35 Ω, off-capacitance: 4 pF }
        waivers:
          - { rule: bandwidth, reason: survey mode, expires: 2027-01-31, setting: high }
        """;

    private const string Adjustable = """
        spec: 1
        kind: transimpedance
        name: fuzz-pot
        conditions:
          temperature: 25 °C
          supply: { positive: 5 V, negative: -5 V }
        bias: 0 V
        input:
          type: photodiode
          capacitance: 30 pF ±10%
          current: { min: 5 nA, max: 4 µA }
        amplifier:
          gbw: 10 MHz
          voltage-noise: 6 nV/√Hz
          current-noise: 10 fA/√Hz
          input-capacitance: { common-mode: 3 pF, differential: 1 pF }
          bias-current: 2 pA
          offset-voltage: 0.5 mV
          output-swing: { to-negative: 50 mV, to-positive: 50 mV }
        feedback:
          resistance: { adjustable: 1 kΩ .. 1 MΩ, steps: 64, wiper-resistance: 75 Ω, tolerance: ±20% }
          capacitance: 3.3 pF ±5%
        """;

    [Fact]
    public void Mutated_channels_with_more_than_one_gain_end_in_a_clear_result_within_bounds()
    {
        var stopwatch = Stopwatch.StartNew();
        using var cli = new CliHarness();
        cli.Write(".git/HEAD", "ref: refs/heads/main\n");
        var pcg = new PCG(14, 20261203);
        for (var i = 0; i < GainInputs; i++)
        {
            var text = Mutate(i % 3 == 2 ? Adjustable : MoreThanOneGain, Plan.Generate(pcg, null, out _));
            cli.WriteBytes("fuzz.tia.yaml", Encoding.UTF8.GetBytes(text));
            Check(cli, text, i, "check", "fuzz.tia.yaml", "--nominal-only", "--format", i % 2 == 0 ? "json" : "text");
        }

        Assert.True(stopwatch.Elapsed < TimeSpan.FromSeconds(120), $"{GainInputs} inputs took {stopwatch.Elapsed.TotalSeconds:0.0} s");
    }
}
