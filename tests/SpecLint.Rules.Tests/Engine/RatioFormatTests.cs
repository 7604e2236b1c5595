using SpecLint.Rules.Fixes;

namespace SpecLint.Rules.Tests.Engine;

/// <summary>Ratios in messages are never in E-notation (issue 13 item 5).</summary>
public sealed class RatioFormatTests
{
    [Theory]
    [InlineData(1.95e-11, "1.95 × 10⁻¹¹")]
    [InlineData(51385158242.2, "5.14 × 10¹⁰")]
    [InlineData(1e-6, "10⁻⁶")]
    [InlineData(0.00195, "0.00195")]
    [InlineData(51.38, "51.4")]
    public void Very_small_and_large_ratios_are_written_as_powers_of_ten(double ratio, string text)
    {
        Assert.Equal(text, Fmt.Ratio(ratio));
        Assert.DoesNotContain("E", Fmt.Ratio(ratio), StringComparison.Ordinal);
    }
}
