using SpecLint.Core.Config;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests.Engine;

public sealed class ConfigurationValidationTests
{
    private static (MarkedText Text, Finding Problem) Validate(string markedConfig)
    {
        var text = MarkedText.Parse(markedConfig);
        var loaded = RepoConfigLoader.LoadText(text.Text, Lint.ConfigFile);
        Assert.True(loaded.IsValid, string.Join("; ", loaded.Diagnostics));
        var problem = Assert.Single(ConfigurationBinding.Validate(loaded.Config, RuleCatalog.BuiltIn, Lint.ConfigFile));
        Assert.Equal(RuleIds.ConfigInvalid, problem.RuleId);
        Assert.Equal(Severity.Error, problem.Severity);
        Assert.Equal(Lint.ConfigFile, problem.File);
        Assert.Equal(text.Mark, (problem.Line, problem.Column));
        return (text, problem);
    }

    [Fact]
    public void Accepts_the_configuration_of_the_design()
    {
        // references.md §D8's example.
        Lint.LoadConfig("""
            include: ["**/*.tia.yaml"]
            fail-on: error
            monte-carlo: { samples: 1000, seed: 1 }
            rules:
              phase-margin: { severity: error, floor: 50 deg }
              output-headroom: { margin: 100 mV }
              standard-values: { severity: off }
            """);
    }

    [Fact]
    public void Flags_an_unknown_rule_id_at_its_key_with_a_suggestion()
    {
        var (_, p) = Validate("""
            rules:
              [|phase-margn|]: { floor: 50 deg }
            """);

        Assert.Contains("did you mean 'phase-margin'?", p.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Flags_an_unknown_option_at_its_key_with_a_suggestion()
    {
        var (_, p) = Validate("""
            rules:
              phase-margin:
                [|flor|]: 50 deg
            """);

        Assert.Contains("did you mean 'floor'?", p.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Flags_an_option_for_a_rule_that_has_none()
    {
        var (_, p) = Validate("""
            rules:
              bandwidth: { [|min|]: 10 kHz }
            """);

        Assert.Contains("no options besides severity", p.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("phase-margin: { floor: [|50 mV|] }")]
    [InlineData("output-headroom: { margin: [|100 mV ±10%|] }")]
    [InlineData("feedback-capacitor-size: { min: [|0.5|] }")]
    public void Flags_an_option_in_the_wrong_unit_or_form_at_its_value(string entry)
    {
        var (_, p) = Validate("rules:\n  " + entry);

        Assert.Contains("write e.g.", p.Message, StringComparison.Ordinal);
    }
}
