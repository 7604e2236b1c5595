namespace SpecLint.Cli.Tests.Hostile;

/// <summary>Issue 14: configuration values are checked like spec values: type, unit and range, at their key.</summary>
public sealed class HostileConfigTests
{
    [Fact]
    public void Floor_in_kilograms_is_config_invalid() =>
        Hostile.AssertConfigRefused("rules:\n  phase-margin: { floor: 50 kg }\n", "2:26", "unknown unit \"kg\"");

    [Fact]
    public void Floor_true_is_config_invalid() =>
        Hostile.AssertConfigRefused("rules:\n  phase-margin: { floor: true }\n", "2:26", "rules.phase-margin.floor");

    [Fact]
    public void Empty_floor_is_config_invalid() =>
        Hostile.AssertConfigRefused("rules:\n  phase-margin: { floor: \"\" }\n", "2:26", "rules.phase-margin.floor");

    [Fact]
    public void Negative_floor_cannot_switch_the_gate_off() =>
        Hostile.AssertConfigRefused("rules:\n  phase-margin: { floor: -5 deg }\n", "2:26", "0 deg .. 180 deg");

    [Fact]
    public void Floor_of_1e308_deg_is_refused_not_printed_as_infinity() =>
        Hostile.AssertConfigRefused("rules:\n  phase-margin: { floor: 1e308 deg }\n", "2:26", "0 deg .. 180 deg");

    [Fact]
    public void Minimum_Cf_of_1e300_pF_is_refused() =>
        Hostile.AssertConfigRefused("rules:\n  feedback-capacitor-size: { min: 1e300 pF }\n", "2:35", "0 F .. 1 µF");

    [Fact]
    public void Negative_peaking_limit_is_refused() =>
        Hostile.AssertConfigRefused("rules:\n  peaking: { max: -3 dB }\n", "2:19", "0 dB .. 100 dB");

    [Fact]
    public void Number_in_include_is_config_invalid_at_the_entry() =>
        Hostile.AssertConfigRefused("include: [1]\n", "1:11", "expected text");

    [Fact]
    public void Rule_id_in_the_wrong_case_gets_a_did_you_mean() =>
        Hostile.AssertConfigRefused("rules:\n  Phase-Margin: { floor: 50 deg }\n", "2:3", "did you mean 'phase-margin'?");

    [Fact]
    public void Zero_Monte_Carlo_samples_are_refused() =>
        Hostile.AssertConfigRefused("monte-carlo: { samples: 0 }\n", "1:25", "monte-carlo.samples");
}
