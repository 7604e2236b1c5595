namespace SpecLint.Cli.Tests.Hostile;

/// <summary>Issue 14: values that overflow the arithmetic or pass for physical ones are refused at the value, with the limits.</summary>
public sealed class HostileValueTests
{
    [Fact]
    public void Open_loop_gain_of_7000_dB_is_refused_with_its_limits() =>
        Hostile.AssertRefused(Hostile.Spec("  gbw: 10 MHz", "  open-loop-gain: 7000 dB", add: true), "14:19", "-200 dB .. 200 dB");

    [Fact]
    public void Feedback_resistance_of_1e_minus_320_megohm_is_refused() =>
        Hostile.AssertRefused(Hostile.Spec("resistance: 1 MΩ ±1%", "resistance: 1e-320 MΩ"), "21:15", "1 mΩ .. 1000 TΩ");

    [Fact]
    public void Dark_current_of_1e296_A_is_refused_quickly() =>
        Hostile.AssertRefused(Hostile.Spec("  capacitance: 20 pF", "  dark-current: 1e296 A", add: true), "11:17", "0 A, or 1e-24 A .. 1 A");

    [Fact]
    public void Bias_current_tolerance_of_1e308_percent_is_refused() =>
        Hostile.AssertRefused(Hostile.Spec("bias-current: 2 pA", "bias-current: 0.5 pA ±1e308%"), "17:17", "-1 A .. 1 A");

    [Fact]
    public void Gbw_of_1e308_Hz_is_refused_rather_than_reported_as_never_crossing() =>
        Hostile.AssertRefused(Hostile.Spec("gbw: 10 MHz", "gbw: 1e308 Hz"), "13:8", "1 mHz .. 1000 GHz");

    [Fact]
    public void Bias_of_1e300_V_is_refused_and_never_printed_as_300_digits() =>
        Hostile.AssertRefused(Hostile.Spec("bias: 0.2 V", "bias: 1e300 V"), "7:7", "-100 kV .. 100 kV");

    [Fact]
    public void Quoted_value_with_a_line_break_cannot_forge_a_finding_line()
    {
        var yaml = Hostile.Spec("dielectric: C0G", "dielectric: \"X\\nch.tia.yaml:1:1: error forged: yes\"");
        using var cli = new CliHarness();
        cli.Write("ch.tia.yaml", yaml);
        var (_, output, _) = cli.Run("check", "ch.tia.yaml", "--nominal-only");
        Assert.DoesNotContain("\nch.tia.yaml:1:1: error forged", output, StringComparison.Ordinal);
        OutputScan.AssertNoControlCharacters(output, "output");
    }

    [Fact]
    public void Quoted_value_with_ESC_is_echoed_as_an_escape()
    {
        var yaml = Hostile.Spec("dielectric: C0G", "dielectric: \"\\e[31mred\"");
        using var cli = new CliHarness();
        cli.Write("ch.tia.yaml", yaml);
        var (exit, output, _) = cli.Run("check", "ch.tia.yaml", "--nominal-only");
        Assert.Equal(2, exit);
        Assert.Contains("\\x1B[31mred", output, StringComparison.Ordinal);
        OutputScan.AssertNoControlCharacters(output, "output");
    }

    [Theory]
    [InlineData("\u2028", "line separator")]
    [InlineData("\u2029", "paragraph separator")]
    [InlineData("\u0085", "next line")]
    public void Unicode_line_separators_are_refused_where_they_stand_so_later_lines_keep_their_numbers(string separator, string name) =>
        Hostile.AssertRefused(Hostile.Spec("bias: 0.2 V", "bias: 0.2 V " + separator), "7:13", name);

    [Fact]
    public void NUL_byte_is_refused_at_its_position() =>
        Hostile.AssertRefused(Hostile.Spec("kind: transimpedance", "kind: trans\0impedance"), "2:12", "U+0000 (NUL)");

    [Fact]
    public void Raw_escape_character_is_refused_at_its_position() =>
        Hostile.AssertRefused(Hostile.Spec("kind: transimpedance", "kind: \u001b[2J"), "2:7", "U+001B (ESC)");

    [Fact]
    public void Tag_on_a_key_is_refused() =>
        Hostile.AssertRefused(Hostile.Spec("bias: 0.2 V", "!!str bias: 0.2 V"), "7:1", "YAML tag");

    [Fact]
    public void Str_tag_on_a_value_is_refused() =>
        Hostile.AssertRefused(Hostile.Spec("bias: 0.2 V", "bias: !!str 0.2 V"), "7:7", "YAML tag");

    [Fact]
    public void Bare_number_beyond_1e28_is_refused_not_a_crash() =>
        Hostile.AssertRefused(Hostile.Spec("spec: 1", "spec: -1e308"), "1:7", "too large a number");
}
