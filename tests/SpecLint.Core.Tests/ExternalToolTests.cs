using SpecLint.Tests.Shared;

namespace SpecLint.Core.Tests;

public sealed class ExternalToolTests
{
    [Theory]
    [InlineData("true", true)]
    [InlineData("TRUE", true)]
    [InlineData("1", true)]
    [InlineData("yes", true)]
    [InlineData("github-actions", true)]
    [InlineData(null, false)]
    [InlineData("", false)]
    [InlineData("0", false)]
    [InlineData("false", false)]
    [InlineData("no", false)]
    [InlineData("off", false)]
    public void Any_truthy_CI_value_counts_as_CI(string? value, bool expected)
    {
        Assert.Equal(expected, ExternalTool.IsTruthy(value));
    }

    [Fact]
    public void A_program_is_found_on_PATH_by_name_and_a_missing_one_is_null()
    {
        Assert.NotNull(ExternalTool.OnPath("no-such-program-speclint", "dotnet"));
        Assert.Null(ExternalTool.OnPath("no-such-program-speclint"));
    }
}
