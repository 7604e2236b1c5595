namespace SpecLint.Analyzers.Tests;

public sealed class DegreesAsRadiansTests
{
    [Fact]
    public Task Flags_degrees_into_trig_and_radians_against_a_degree_threshold() => Verify.Analyzer<DegreesAsRadiansAnalyzer>("""
        class C
        {
            void M(Angle pm, double phaseDeg)
            {
                var a = Math.Sin({|SLU0005:pm.Degrees|});
                var b = Math.Cos({|SLU0005:phaseDeg|});
                var c = {|SLU0005:pm.Radians|} < 45;
            }
        }
        """);

    [Fact]
    public Task Stays_silent_on_radians_in_trig_and_plausible_radian_thresholds() => Verify.Analyzer<DegreesAsRadiansAnalyzer>("""
        class C
        {
            void M(Angle pm, double phase)
            {
                var a = Math.Sin(pm.Radians);
                var b = Math.Cos(phase);
                var c = pm.Radians < Math.PI / 4;
                var d = pm.Degrees < 45;
                var e = Math.Abs(pm.Degrees);
            }
        }
        """);

    [Fact]
    public Task Fix_passes_radians_to_trig() => Verify.Fix<DegreesAsRadiansAnalyzer>(
        "class C { double M(Angle pm) => Math.Sin({|SLU0005:pm.Degrees|}); }",
        "class C { double M(Angle pm) => Math.Sin(pm.Radians); }");

    [Fact]
    public Task Fix_compares_in_degrees() => Verify.Fix<DegreesAsRadiansAnalyzer>(
        "class C { bool M(Angle pm) => {|SLU0005:pm.Radians|} < 45; }",
        "class C { bool M(Angle pm) => pm.Degrees < 45; }");
}
