using System.Globalization;
using CsCheck;
using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Units;

public sealed class QuantityParserTests
{
    private static readonly Dimension[] DecimalDimensions =
    [
        Dimension.Resistance, Dimension.Capacitance, Dimension.Frequency, Dimension.Voltage, Dimension.Current,
        Dimension.Power, Dimension.Responsivity, Dimension.VoltageNoiseDensity, Dimension.CurrentNoiseDensity,
        Dimension.SlewRate, Dimension.Ratio,
    ];

    [Fact]
    public void Format_then_parse_returns_the_identical_double_for_every_prefix_and_decimal_dimension()
    {
        Gen.Select(Gen.Double[1.0, 999.999], Gen.Int[-6, 5], Gen.Int[0, DecimalDimensions.Length - 1])
            .Sample((mantissa, thousands, d) =>
            {
                var value = double.Parse(mantissa.ToString("R", CultureInfo.InvariantCulture) + "E" + (thousands * 3).ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
                var dimension = DecimalDimensions[d];
                var text = QuantityFormat.Format(value, dimension);
                var parsed = QuantityParser.Parse(text, dimension);
                return parsed.Typ == value && parsed.Form == ToleranceForm.None;
            });
    }

    [Fact]
    public void Format_then_parse_round_trips_any_positive_double_in_range()
    {
        Gen.Double[1e-18, 1e15].Sample(value =>
            QuantityParser.Parse(QuantityFormat.Format(value, Dimension.Capacitance), Dimension.Capacitance).Typ == value);
    }

    // Letter codes: C = ±0.25 pF absolute below 10 pF, J = ±5 % (references.md §3.5, [IEC60062], from memory).
    // RKM: "2p2" = 2.2 pF ([IEC60062], from memory).
    [Theory]
    [InlineData("12 pF ±5%", 12e-12, 11.4e-12, 12.6e-12, ToleranceForm.Relative)]
    [InlineData("2.2 pF ±0.25 pF", 2.2e-12, 1.95e-12, 2.45e-12, ToleranceForm.Absolute)]
    [InlineData("100 pF +10%/-20%", 100e-12, 80e-12, 110e-12, ToleranceForm.Relative)]
    [InlineData("100 pF -20%/+10%", 100e-12, 80e-12, 110e-12, ToleranceForm.Relative)]
    [InlineData("4.7 pF C", 4.7e-12, 4.45e-12, 4.95e-12, ToleranceForm.LetterCode)]
    [InlineData("47 pF J", 47e-12, 44.65e-12, 49.35e-12, ToleranceForm.LetterCode)]
    [InlineData("1 pF .. 3 pF", 2e-12, 1e-12, 3e-12, ToleranceForm.Range)]
    [InlineData("2p2", 2.2e-12, 2.2e-12, 2.2e-12, ToleranceForm.None)]
    [InlineData("1e-12 F", 1e-12, 1e-12, 1e-12, ToleranceForm.None)]
    [InlineData("3.3 nF", 3.3e-9, 3.3e-9, 3.3e-9, ToleranceForm.None)]
    public void Reads_capacitances_with_tolerances(string text, double typ, double min, double max, ToleranceForm form)
    {
        var q = QuantityParser.Parse(text, Dimension.Capacitance);

        Assert.Equal(typ, q.Typ, typ * 1e-12);
        Assert.Equal(min, q.Min, typ * 1e-12);
        Assert.Equal(max, q.Max, typ * 1e-12);
        Assert.Equal(form, q.Form);
    }

    [Theory]
    [InlineData("4k7", 4700)]
    [InlineData("R47", 0.47)]
    [InlineData("470R", 470)]
    [InlineData("1M0", 1e6)]
    [InlineData("2G2", 2.2e9)]
    [InlineData("10 kΩ", 1e4)]
    [InlineData("10 k\u2126", 1e4)]
    [InlineData("10 kohm", 1e4)]
    [InlineData("10kΩ", 1e4)]
    [InlineData("4k7 Ω", 4700)]
    public void Reads_resistances_in_every_spelling(string text, double ohms)
    {
        Assert.Equal(ohms, QuantityParser.Parse(text, Dimension.Resistance).Typ, ohms * 1e-15);
    }

    [Theory]
    [InlineData("1.5 µA")]
    [InlineData("1.5 uA")]
    [InlineData("1.5 μA")]
    [InlineData("1.5µA")]
    public void Accepts_each_micro_sign(string text)
    {
        Assert.Equal(1.5e-6, QuantityParser.Parse(text, Dimension.Current).Typ);
    }

    [Theory]
    [InlineData("7 nV/√Hz", Dimension.VoltageNoiseDensity, 7e-9)]
    [InlineData("7 nV/rtHz", Dimension.VoltageNoiseDensity, 7e-9)]
    [InlineData("0.6 fA/√Hz", Dimension.CurrentNoiseDensity, 0.6e-15)]
    [InlineData("0.6 fA/rtHz", Dimension.CurrentNoiseDensity, 0.6e-15)]
    [InlineData("12 V/µs", Dimension.SlewRate, 12e6)]
    [InlineData("12 V/us", Dimension.SlewRate, 12e6)]
    [InlineData("0.42 A/W", Dimension.Responsivity, 0.42)]
    [InlineData("5 %", Dimension.Ratio, 0.05)]
    public void Reads_compound_units(string text, Dimension dimension, double si)
    {
        Assert.Equal(si, QuantityParser.Parse(text, dimension).Typ, Math.Abs(si) * 1e-15);
    }

    [Theory]
    [InlineData("55 deg", 55)]
    [InlineData("55°", 55)]
    [InlineData("55 °", 55)]
    public void Reads_angles_in_degrees(string text, double degrees)
    {
        Assert.Equal(degrees, Angle.FromSi(QuantityParser.Parse(text, Dimension.Angle).Typ).Degrees, 1e-12);
    }

    [Fact]
    public void Reads_temperatures_in_celsius_and_kelvin_with_a_range()
    {
        var q = QuantityParser.Parse("-10 °C .. 60 °C", Dimension.Temperature);

        Assert.Equal(263.15, q.Min, 1e-12);
        Assert.Equal(333.15, q.Max, 1e-12);
        Assert.Equal(300, QuantityParser.Parse("300 K", Dimension.Temperature).Typ);
        Assert.Equal(115, Gain.FromSi(QuantityParser.Parse("115 dB", Dimension.Gain).Typ).Decibels, 1e-9);
    }

    // The letters SpecLint reads are those of references.md §3.5 (B C D F G J K M, W N Z); any other letter,
    // such as Q, is refused. Whether a letter exists in IEC 60062 is not claimed here.
    [Theory]
    [InlineData("2.2", Dimension.Capacitance, "\"2.2\" has no unit; a capacitance needs one, e.g. \"2.2 pF\"")]
    [InlineData("", Dimension.Capacitance, "empty value")]
    [InlineData("2.2 PF", Dimension.Capacitance, "did you mean \"2.2 pF\"?")]
    [InlineData("8 Mhz", Dimension.Frequency, "did you mean \"8 MHz\"?")]
    [InlineData("0.2 A", Dimension.Voltage, "is a current, but this key takes a voltage")]
    [InlineData("2.2 pF J", Dimension.Capacitance, "letter 'J' has no meaning below 10 pF")]
    [InlineData("12 pF Q", Dimension.Capacitance, "'Q' is not a tolerance letter SpecLint reads")]
    [InlineData("5 V J", Dimension.Voltage, "letter codes apply to resistors and capacitors only")]
    [InlineData("3 pF .. 1 pF", Dimension.Capacitance, "the range runs backwards")]
    [InlineData("1 pF ±5% .. 3 pF", Dimension.Capacitance, "a range cannot also carry a tolerance")]
    [InlineData("12 pF ±twenty", Dimension.Capacitance, "cannot read the tolerance")]
    [InlineData("1e999 F", Dimension.Capacitance, "is not a finite number")]
    [InlineData("47k", Dimension.Resistance, "\"47k\" has no unit; write \"47 kΩ\"")]
    [InlineData("4k7", Dimension.Capacitance, "the RKM letter 'k' does not fit a capacitance")]
    [InlineData("fast", Dimension.Frequency, "is not a number with a unit")]
    public void Rejects_bad_input_with_a_message_that_says_how_to_fix_it(string text, Dimension dimension, string fragment)
    {
        var e = Assert.Throws<QuantityParseException>(() => QuantityParser.Parse(text, dimension));

        Assert.Contains(fragment, e.Message, StringComparison.Ordinal);
    }

    // F = ±1 % at and above 10 pF and for resistors (references.md §3.5, [IEC60062], from memory): 4.7 kΩ − 1 % = 4653 Ω.
    [Fact]
    public void Letter_code_F_after_an_rkm_code_is_a_tolerance_not_farads()
    {
        var q = QuantityParser.Parse("4k7 F", Dimension.Resistance);

        Assert.Equal(ToleranceForm.LetterCode, q.Form);
        Assert.Equal(4653, q.Min, 1e-9);
    }
}
