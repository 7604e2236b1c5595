namespace SpecLint.Analyzers.Tests;

public sealed class UnitNameMismatchTests
{
    [Fact]
    public Task Flags_readings_stored_passed_or_compared_under_another_unit() => Verify.Analyzer<UnitNameMismatchAnalyzer>("""
        class C
        {
            double bandwidthMHz;
            static void Use(double capacitance) { }
            void M(Capacitance cf, Frequency gbw, Resistance rf, Angle pm, double maxPf)
            {
                double cfPf = {|SLU0002:cf.Farads|};
                bandwidthMHz = {|SLU0002:gbw.Hertz|};
                Use({|SLU0002:rf.Ohms|});
                double phaseDeg = {|SLU0002:pm.Radians|};
                if ({|SLU0002:cf.Farads|} > maxPf) { }
            }
        }
        """);

    [Fact]
    public Task Stays_silent_on_matching_names_scaled_readings_and_look_alikes() => Verify.Analyzer<UnitNameMismatchAnalyzer>("""
        class C
        {
            static void Use(double capacitance) { }
            void M(Capacitance cf, Frequency gbw, VoltageNoiseDensity vn, double maxPf)
            {
                double cfPf = cf.Picofarads;
                double cfPf2 = cf.Farads * 1e12;
                double bwMHz = gbw.Megahertz;
                double capacitance = cf.Farads;
                double vnPerRootHz = vn.VoltsPerRootHertz;
                double update = gbw.Hertz;
                double shape = cf.Farads;
                Use(cf.Nanofarads);
                if (cf.Picofarads > maxPf) { }
            }
        }
        """);

    [Fact]
    public Task Fix_reads_the_quantity_in_the_unit_the_name_says() => Verify.Fix<UnitNameMismatchAnalyzer>(
        "class C { void M(Capacitance cf) { double cfPf = {|SLU0002:cf.Farads|}; } }",
        "class C { void M(Capacitance cf) { double cfPf = cf.Picofarads; } }");
}
