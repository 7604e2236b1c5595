namespace SpecLint.Cli.Tests;

/// <summary>Spec texts for end-to-end tests, in the invented scenario of the demo.</summary>
internal static class Specs
{
    /// <summary>A channel with comfortable margins everywhere (checked by hand: PM ≈ 88°, output 0.2 .. 3.2 V on a 4.75 V rail).</summary>
    public const string Clean = """
        spec: 1
        kind: transimpedance
        name: e2e-clean
        conditions:
          temperature: 25 °C
          supply: { positive: 5 V ±5%, negative: 0 V }
        bias: 0.2 V
        input:
          type: photodiode
          capacitance: 20 pF
          current: { min: 80 nA, max: 3 µA }
        amplifier:
          gbw: 10 MHz
          voltage-noise: 8 nV/√Hz
          current-noise: 1 fA/√Hz
          input-capacitance: { common-mode: 3 pF, differential: 2 pF }
          bias-current: 2 pA
          offset-voltage: 0.5 mV
          output-swing: { to-negative: 20 mV, to-positive: 40 mV }
        feedback:
          resistance: 1 MΩ ±1%
          capacitance: 3.3 pF ±10%
          dielectric: C0G
        """;

    /// <summary>The same channel with Cf left off: the loop rings (phase margin far below 45°).</summary>
    public static string NoCf => Clean.Replace("name: e2e-clean", "name: e2e-no-cf", StringComparison.Ordinal)
        .Replace("  capacitance: 3.3 pF ±10%\n  dielectric: C0G", "  parasitic-capacitance: 0.05 pF", StringComparison.Ordinal);

    /// <summary>A channel that only has a warning: an X7R feedback capacitor.</summary>
    public static string WarningOnly => Clean.Replace("name: e2e-clean", "name: e2e-x7r", StringComparison.Ordinal)
        .Replace("dielectric: C0G", "dielectric: X7R", StringComparison.Ordinal);
}
