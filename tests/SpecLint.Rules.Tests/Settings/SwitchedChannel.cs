namespace SpecLint.Rules.Tests.Settings;

/// <summary>A switched photodiode meter of an invented instrument, shared by the tests of channels with more than one gain.</summary>
internal static class SwitchedChannel
{
    /// <summary>Two settings, low and mid, with an ideal switch; tests add settings or a switch after it.</summary>
    public const string TwoSettings = """
        spec: 1
        kind: transimpedance
        name: meter
        conditions:
          temperature: 25 °C
          supply: { positive: 5 V, negative: 0 V }
        bias: 0.2 V
        input:
          type: photodiode
          capacitance: 60 pF
          current: { min: 1 nA, max: 100 µA }
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
            - { name: low, resistance: 20 kΩ, capacitance: 22 pF, input: { current: { min: 1 µA, max: 200 µA } } }
            - { name: mid, resistance: 2 MΩ, capacitance: 2.2 pF, input: { current: { min: 10 nA, max: 2 µA } } }
        """;
}
