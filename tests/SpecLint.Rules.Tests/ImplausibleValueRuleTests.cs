using SpecLint.Core.Units;
using SpecLint.Rules.BuiltIn;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests;

public sealed class ImplausibleValueRuleTests
{
    private const string Id = "plausible-values";

    // Plausible parts throughout (common practice for a photodiode channel); each test replaces one value.
    private static string Channel(
        string rf = "1 MΩ ±1%",
        string cf = "2.2 pF",
        string cd = "10 pF",
        string rsh = "2 GΩ",
        string gbw = "10 MHz",
        string imin = "1 nA",
        string imax = "1 µA",
        string en = "10 nV/√Hz",
        string inoise = "1 fA/√Hz",
        string bias = "1 pA",
        string positive = "15 V",
        string negative = "-15 V") => $$"""
        {{Parts.Header}}
        conditions: { temperature: 25 °C, supply: { positive: {{positive}}, negative: {{negative}} } }
        bias: 0 V
        input:
          type: photodiode
          capacitance: {{cd}}
          shunt-resistance: {{rsh}}
          current: { min: {{imin}}, max: {{imax}} }
        amplifier:
          gbw: {{gbw}}
          open-loop-gain: 120 dB
          voltage-noise: {{en}}
          current-noise: {{inoise}}
          input-capacitance: { common-mode: 0 pF, differential: 0 pF }
          bias-current: {{bias}}
          offset-voltage: 0 V
          output-swing: { to-negative: 0 V, to-positive: 0 V }
        feedback:
          resistance: {{rf}}
          capacitance: {{cf}}
        """;

    [Fact]
    public void Accepts_a_channel_of_plausible_parts()
    {
        Lint.Check(Channel()).Clean(Id);
    }

    [Fact]
    public void Flags_milliohms_typed_for_megaohms_and_names_the_megaohm_reading()
    {
        // Rf 10 mΩ with Cf 47 nF: both parse, and before this rule the check passed without a word.
        var r = Lint.Check(Channel(rf: "[|10 mΩ ±1%|]", cf: "47 nF"));

        var rf = r.Of(Id).Single(f => f.Pointer == "/feedback/resistance");
        Assert.Equal(Severity.Warning, rf.Severity);
        Assert.Equal(r.Spec.Mark, (rf.Line, rf.Column));
        Assert.Contains("did you mean 10 MΩ?", rf.Message, StringComparison.Ordinal);
        Assert.Equal(new FixSuggestion("/feedback/resistance", "10 MΩ ±1%"), rf.Fix);
        var cf = r.Of(Id).Single(f => f.Pointer == "/feedback/capacitance");
        Assert.Contains("did you mean 47 pF?", cf.Message, StringComparison.Ordinal);
        Assert.Equal(2, r.Of(Id).Count);
    }

    [Theory]
    [InlineData("rf", "[|10 mΩ|]", "/feedback/resistance", "10 MΩ")]
    [InlineData("cf", "[|22 nF|]", "/feedback/capacitance", "22 pF")]
    [InlineData("cd", "[|470 µF|]", "/input/capacitance", "470 nF")]
    [InlineData("rsh", "[|2 mΩ|]", "/input/shunt-resistance", "2 MΩ")]
    [InlineData("gbw", "[|10 mHz|]", "/amplifier/gbw", "10 MHz")]
    [InlineData("imax", "[|1 A|]", "/input/current/max", "1 mA")]
    [InlineData("en", "[|500 µV/√Hz|]", "/amplifier/voltage-noise", "500 nV/√Hz")]
    [InlineData("inoise", "[|2 nA/√Hz|]", "/amplifier/current-noise", "2 pA/√Hz")]
    [InlineData("bias", "[|1 µA .. 500 mA|]", "/amplifier/bias-current", "500 µA")]
    [InlineData("positive", "[|15 mV|]", "/conditions/supply/positive", "15 V")]
    [InlineData("negative", "[|-15 kV|]", "/conditions/supply/negative", "-15 V")]
    public void Flags_each_figure_outside_its_range_at_its_key(string figure, string value, string pointer, string meant)
    {
        var r = Lint.Check(With(figure, value));

        var f = r.SingleAtMark(Id, Severity.Warning);
        Assert.Equal(pointer, f.Pointer);
        Assert.Contains($"did you mean {meant}?", f.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("rf", "10 Ω")]
    [InlineData("rf", "1 TΩ")]
    [InlineData("cf", "10 nF")]
    [InlineData("cd", "100 µF")]
    [InlineData("imin", "0 A")]
    [InlineData("bias", "-2 pA .. 2 pA")]
    [InlineData("negative", "0 V")]
    public void Accepts_the_ends_of_each_range_and_zero(string figure, string value)
    {
        Lint.Check(With(figure, value)).Clean(Id);
    }

    [Fact]
    public void Names_the_prefix_when_the_value_makes_the_analysis_fail()
    {
        // GBW 10 mHz puts the bandwidth below 1 Hz, so the default noise band is empty and the analysis fails;
        // the finding that says why still comes with it.
        var r = Lint.Check(Channel(gbw: "[|10 mHz|]"));

        Assert.Single(r.Of(RuleIds.AnalysisFailed));
        var f = r.SingleAtMark(Id, Severity.Warning);
        Assert.Contains("did you mean 10 MHz?", f.Message, StringComparison.Ordinal);
        Assert.Equal(new FixSuggestion("/amplifier/gbw", "10 MHz"), f.Fix);
    }

    [Fact]
    public void Leaves_a_feedback_capacitor_of_a_microfarad_or_more_to_the_spec_check()
    {
        // Cf ≥ 1 µF is already spec-invalid with its own prefix hint; the rule flags the decades below that.
        var loaded = Core.Spec.SpecLoader.LoadText(Channel(cf: "2.2 µF"), Lint.SpecFile);
        Assert.False(loaded.IsValid);
        Assert.Contains(loaded.Diagnostics, d => d.Message.Contains("did you mean \"2.2 pF\"", StringComparison.Ordinal));
        Assert.Single(Lint.Check(Channel(cf: "[|220 nF|]")).Of(Id));
    }

    [Fact]
    public void Says_so_when_no_prefix_brings_the_value_into_range()
    {
        // 500 Hz, 500 kHz and 500 MHz all miss a configured 1 MHz .. 2 MHz.
        var f = Lint.Check(Channel(gbw: "[|500 kHz|]"), "rules:\n  plausible-values: { gbw-min: 1 MHz, gbw-max: 2 MHz }").SingleAtMark(Id, Severity.Warning);

        Assert.Contains("no other SI prefix brings it into range", f.Message, StringComparison.Ordinal);
        Assert.Null(f.Fix);
    }

    [Fact]
    public void Offers_no_fix_where_the_tolerance_is_written_in_the_old_prefix()
    {
        // "±1 nF" would not scale with the value: the message names the reading, the user rewrites both.
        var f = Lint.Check(Channel(cf: "[|47 nF ±1 nF|]")).SingleAtMark(Id, Severity.Warning);

        Assert.Contains("did you mean 47 pF?", f.Message, StringComparison.Ordinal);
        Assert.Null(f.Fix);
    }

    [Theory]
    [InlineData("[|10 mΩ ±1%|]")]
    [InlineData("[|4.7 mΩ F|]")]
    public void The_fix_keeps_the_tolerance_and_clears_the_finding(string rf)
    {
        var r = Lint.Check(Channel(rf: rf, cf: "1 pF"));

        r.ApplyFixAndRecheck(r.SingleAtMark(Id, Severity.Warning));
    }

    [Theory]
    [InlineData("rf-min: 1 Ω", "2.2 Ω", false)]
    [InlineData("rf-max: 100 GΩ", "[|470 GΩ|]", true)]
    [InlineData("cf-max: 100 nF", "22 nF", false)]
    public void Takes_the_ranges_from_configuration(string option, string rfOrCf, bool flagged)
    {
        var spec = option.StartsWith("rf", StringComparison.Ordinal) ? Channel(rf: rfOrCf, cf: "0.5 pF") : Channel(cf: rfOrCf);

        var r = Lint.Check(spec, $"rules:\n  plausible-values: {{ {option} }}");

        Assert.Equal(flagged, r.Of(Id).Count == 1);
    }

    [Fact]
    public void Uses_the_configured_severity_and_can_be_turned_off()
    {
        var spec = Channel(gbw: "[|10 mHz|]");

        Lint.Check(spec, "rules:\n  plausible-values: { severity: error }").SingleAtMark(Id, Severity.Error);
        Lint.Check(spec, "rules:\n  plausible-values: { severity: off }").Clean(Id);
    }

    [Theory]
    [InlineData(10e-3, Dimension.Resistance, 10, 1e12, "10 MΩ")] // the same letter in the other case first
    [InlineData(47e-9, Dimension.Capacitance, 10e-15, 10e-9, "47 pF")] // then the nearest prefix step
    [InlineData(4.7e-3, Dimension.Voltage, 0.5, 1000, "4.7 V")] // mV to MV is out of range: one step up
    [InlineData(500e3, Dimension.Frequency, 1e6, 2e6, null)] // no prefix step lands in the range
    public void Reads_the_value_under_the_prefix_that_fits(double si, Dimension dimension, double min, double max, string? expected)
    {
        Assert.Equal(expected, ImplausibleValueRule.PrefixReading(si, dimension, min, max));
    }

    private static string With(string figure, string value) => figure switch
    {
        "rf" => Channel(rf: value),
        "cf" => Channel(cf: value),
        "cd" => Channel(cd: value),
        "rsh" => Channel(rsh: value),
        "gbw" => Channel(gbw: value),
        "imin" => Channel(imin: value),
        "imax" => Channel(imax: value),
        "en" => Channel(en: value),
        "inoise" => Channel(inoise: value),
        "bias" => Channel(bias: value),
        "positive" => Channel(positive: value),
        "negative" => Channel(negative: value),
        _ => throw new ArgumentOutOfRangeException(nameof(figure)),
    };
}
