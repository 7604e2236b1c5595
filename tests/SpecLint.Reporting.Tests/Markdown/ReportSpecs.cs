namespace SpecLint.Reporting.Tests.Markdown;

/// <summary>Two channels of an invented instrument: one clean, one with no feedback capacitor.</summary>
internal static class ReportSpecs
{
    public const string Clean = """
        spec: 1
        kind: transimpedance
        name: report-clean
        conditions:
          temperature: 25 °C
          supply: { positive: 5 V, negative: 0 V }
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

    public static string Unstable => Clean
        .Replace("name: report-clean", "name: report-unstable", StringComparison.Ordinal)
        .Replace("  capacitance: 3.3 pF ±10%\n  dielectric: C0G", "  parasitic-capacitance: 0.05 pF", StringComparison.Ordinal);
}
