using SpecLint.Rules.Changes;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests.Settings;

/// <summary>
/// How pull-request mode pairs the gain settings of a spec's base and head: by name, head order first and then the
/// ones only the base has, so that the output depends on the two files alone.
/// </summary>
public sealed class SettingChangeTests
{
    private const string Head = SwitchedChannel.TwoSettings;

    private static string Base => Head.Replace("name: low,", "name: bright,", StringComparison.Ordinal);

    [Fact]
    public void Settings_pair_by_name_with_added_ones_in_head_order_and_removed_ones_after()
    {
        var before = Lint.Check(Base).Outcome;
        var after = Lint.Check(Head).Outcome;

        var pairs = SettingChange.Pair(before, after);

        Assert.Equal(["low added", "mid -", "bright removed"], pairs.Select(p => $"{p.Name} {p.Status ?? "-"}"));
        var mid = pairs.Single(p => p.Name == "mid");
        Assert.Equal(MetricSnapshot.Of(before.Settings.Single(s => s.Name == "mid")), mid.MetricsBefore);
        Assert.Equal(MetricSnapshot.Of(after.Settings.Single(s => s.Name == "mid")), mid.MetricsAfter);
        Assert.Null(pairs.Single(p => p.Name == "low").MetricsBefore);
        Assert.Null(pairs.Single(p => p.Name == "bright").MetricsAfter);
    }

    [Fact]
    public void A_spec_with_one_version_has_no_added_or_removed_settings_and_one_gain_has_no_settings()
    {
        var after = Lint.Check(Head).Outcome;
        Assert.All(SettingChange.Pair(null, after), p => Assert.Null(p.Status));
        Assert.All(SettingChange.Pair(after, null), p => Assert.Null(p.Status));

        var single = Lint.Check(Head.Replace("""
              settings:
                - { name: low, resistance: 20 kΩ, capacitance: 22 pF, input: { current: { min: 1 µA, max: 200 µA } } }
                - { name: mid, resistance: 2 MΩ, capacitance: 2.2 pF, input: { current: { min: 10 nA, max: 2 µA } } }
            """, "  resistance: 20 kΩ\n  capacitance: 22 pF", StringComparison.Ordinal)).Outcome;
        Assert.Empty(single.Settings);
        Assert.Empty(SettingChange.Pair(single, single));
    }
}
