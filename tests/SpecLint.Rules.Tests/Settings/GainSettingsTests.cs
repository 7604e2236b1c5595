using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests.Settings;

/// <summary>
/// Channels with more than one gain (references.md §D8): each setting is checked on its own, and its findings sit on
/// its own lines and name it.
/// </summary>
public sealed class GainSettingsTests
{
    private const string Channel = SwitchedChannel.TwoSettings + """

            - name: high
              resistance: 200 MΩ
              capacitance: [|0.3 pF|]
              input: { current: { min: 100 pA, max: 20 nA } }
              requirements: { bandwidth: 2 kHz }
          switch: { on-resistance: 35 Ω, off-capacitance: 4 pF }
        """;

    [Fact]
    public void Each_setting_is_analysed_with_the_open_switches_of_the_others()
    {
        var r = Lint.Check(Channel);
        Assert.Equal(["low", "mid", "high"], r.Outcome.Settings.Select(s => s.Name));

        // Against the feedback network written out by hand with an ideal op-amp (Vo/I = −1/Yf): the selected
        // 200 MΩ ∥ 0.3 pF behind 35 Ω, and the 20 kΩ ∥ 22 pF and 2 MΩ ∥ 2.2 pF branches each behind 4 pF. Near
        // 96 Hz they add about 8 pF, and the 2 MΩ branch a little conductance (0.2 % of 1/Rf). The loop gain there is
        // about 10⁴, so the two agree to ~1e-4.
        var high = r.Outcome.Settings.Single(s => s.Name == "high").Analysis!;
        var expected = IdealOpAmpBandwidth();
        Assert.Equal(expected, high.Bandwidth!.Value.Hertz, 3e-4 * expected);
        Assert.Equal(1 / (2 * Math.PI * 200e6 * 8.3e-12), expected, 0.005 * expected);

        // The low setting sees 20 kΩ + 35 Ω at DC (the switch's on-resistance in series), from the circuit itself.
        var low = r.Outcome.Settings.Single(s => s.Name == "low").Analysis!;
        Assert.Equal(20_035, low.Transimpedance.Ohms, 0.05);
    }

    [Fact]
    public void A_setting_finding_sits_on_its_lines_and_names_it()
    {
        var r = Lint.Check(Channel);
        var bandwidth = r.Single("bandwidth");
        Assert.Equal("high", bandwidth.Setting);
        Assert.Equal("/feedback/settings/2/requirements/bandwidth", bandwidth.Pointer);
        Assert.Equal(28, bandwidth.Line);
        Assert.EndsWith("[setting high]", bandwidth.ToString(), StringComparison.Ordinal);

        var size = r.Single("feedback-capacitor-size");
        Assert.Equal("high", size.Setting);
        Assert.Equal(r.Spec.Mark, (size.Line, size.Column));
        Assert.Equal("/feedback/settings/2/capacitance", size.Pointer);

        // Each setting's own high-setting findings are listed under it, not under the others.
        Assert.Contains(r.Outcome.Settings[2].Findings, f => f.RuleId == "bandwidth");
        Assert.DoesNotContain(r.Outcome.Settings[0].Findings, f => f.RuleId == "bandwidth");
    }

    [Fact]
    public void A_waiver_can_name_one_setting()
    {
        var waived = Lint.Check(Channel + """

            waivers:
              - { rule: bandwidth, reason: high range is a slow survey mode, expires: 2027-01-31, setting: high }
            """);
        Assert.True(waived.Single("bandwidth").Waived);

        var elsewhere = Lint.Check(Channel + """

            waivers:
              - { rule: bandwidth, reason: wrong setting, expires: 2027-01-31, setting: mid }
            """);
        Assert.False(elsewhere.Single("bandwidth").Waived);
        Assert.Single(elsewhere.Of(RuleIds.WaiverUnmatched));
    }

    [Fact]
    public void The_search_finds_an_interior_worst_phase_margin_that_both_ends_pass()
    {
        // With a fixed Cf the loop is safest at both ends (there 1/β is flat where |A| crosses it) and worst where
        // |A| crosses the rising part of 1/β, between the β pole and zero (common practice).
        var r = Lint.Check("""
            spec: 1
            kind: transimpedance
            name: bench
            conditions:
              temperature: 25 °C
              supply: { positive: 5 V, negative: -5 V }
            bias: 0 V
            input:
              type: photodiode
              capacitance: 100 pF
              current: { min: 1 nA, max: 2 µA }
            amplifier:
              gbw: 10 MHz
              voltage-noise: 6 nV/√Hz
              current-noise: 10 fA/√Hz
              input-capacitance: { common-mode: 3 pF, differential: 1 pF }
              bias-current: 2 pA
              offset-voltage: 0.5 mV
              output-swing: { to-negative: 50 mV, to-positive: 50 mV }
            feedback:
              resistance: { adjustable: 100 Ω .. 1 MΩ, tolerance: ±20% }
              capacitance: 4.7 pF
            """);
        var settings = r.Outcome.Settings;
        var lowest = settings[0].Analysis!.PhaseMargin!.Value.Degrees;
        var highest = settings[^1].Analysis!.PhaseMargin!.Value.Degrees;
        Assert.True(lowest > 45 && highest > 45, $"ends {lowest:F1}° and {highest:F1}°");

        var pm = r.Single("phase-margin");
        Assert.Contains("lowest phase margin", pm.Setting, StringComparison.Ordinal);
        Assert.Equal("/feedback/capacitance", pm.Pointer);
        var worst = settings.Single(s => s.Name == pm.Setting);
        var rf = worst.Circuit!.Rf.Ohms;
        Assert.InRange(rf, 200, 500e3);
        Assert.True(worst.Analysis!.PhaseMargin!.Value.Degrees < 45);

        // A fine grid around the found position has nothing lower (the search is a true minimum to 0.01°).
        foreach (var factor in new[] { 0.9, 0.97, 1.03, 1.1 })
        {
            var near = Core.Analysis.TiaAnalyzer.LoopFigures(worst.Circuit with { Rf = new Core.Units.Resistance(rf * factor) });
            Assert.True(near.PhaseMarginDeg >= worst.Analysis.PhaseMargin.Value.Degrees - 0.01);
        }

        // No E-series judgement of a potentiometer's setting.
        r.Clean("standard-values");
    }

    /// <summary>Bisection in ln f for |Yf(jω)| = √2·|Yf(0)| on the hand-written feedback network of the high setting.</summary>
    private static double IdealOpAmpBandwidth()
    {
        static System.Numerics.Complex Yf(double f)
        {
            var s = new System.Numerics.Complex(0, 2 * Math.PI * f);
            System.Numerics.Complex Rc(double r, double c) => r / (1 + (s * r * c));
            var selected = 1 / (35 + Rc(200e6, 0.3e-12));
            var low = 1 / ((1 / (s * 4e-12)) + Rc(20e3, 22e-12));
            var mid = 1 / ((1 / (s * 4e-12)) + Rc(2e6, 2.2e-12));
            return selected + low + mid;
        }

        var target = Math.Sqrt(2) / (200e6 + 35);
        double lo = 1, hi = 1e4;
        for (var i = 0; i < 200; i++)
        {
            var mid = Math.Sqrt(lo * hi);
            if (Yf(mid).Magnitude < target)
            {
                lo = mid;
            }
            else
            {
                hi = mid;
            }
        }

        return Math.Sqrt(lo * hi);
    }
}
