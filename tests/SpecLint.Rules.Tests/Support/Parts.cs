namespace SpecLint.Rules.Tests.Support;

/// <summary>
/// Stanzas shared by the inline specs. Each starts at column 0 and ends without a newline, so it can stand on
/// a line of its own inside an interpolated raw string.
/// </summary>
internal static class Parts
{
    /// <summary>The required header.</summary>
    public const string Header = """
        spec: 1
        kind: transimpedance
        name: channel
        """;

    /// <summary>
    /// A quiet single-pole op-amp with no DC errors and no input capacitance, so hand computations hold:
    /// 10 MHz GBW and A0 = 1e9 (180 dB) as in references.md §3.2's worked example.
    /// </summary>
    public const string IdealAmp = """
        amplifier:
          gbw: 10 MHz
          open-loop-gain: 180 dB
          voltage-noise: 10 nV/√Hz
          current-noise: 1 fA/√Hz
          input-capacitance: { common-mode: 0 pF, differential: 0 pF }
          bias-current: 0 A
          offset-voltage: 0 V
          output-swing: { to-negative: 0 V, to-positive: 0 V }
        """;
}
