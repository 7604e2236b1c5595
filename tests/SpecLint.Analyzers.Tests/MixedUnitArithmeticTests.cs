namespace SpecLint.Analyzers.Tests;

public sealed class MixedUnitArithmeticTests
{
    [Fact]
    public Task Flags_sums_and_comparisons_across_dimensions_and_units() => Verify.Analyzer<MixedUnitArithmeticAnalyzer>("""
        class C
        {
            void M(Resistance rf, Capacitance cf, Capacitance cd, Voltage v)
            {
                var a = {|SLU0003:rf.Ohms + cf.Farads|};
                var b = {|SLU0003:cf.Farads + cd.Picofarads|};
                var c = {|SLU0003:v.Millivolts > 2 * rf.Ohms|};
            }
        }
        """);

    [Fact]
    public Task Stays_silent_on_consistent_units_products_and_plain_numbers() => Verify.Analyzer<MixedUnitArithmeticAnalyzer>("""
        class C
        {
            void M(Resistance rf, Capacitance cf, Capacitance cd, double x)
            {
                var a = cf.Farads + cd.Farads;
                var b = rf.Ohms * cf.Farads;
                var c = cf.Picofarads + x;
                var d = cf.Picofarads > 0.5;
                var e = cf + cd;
                var f = cf.Farads * 1e12 + cd.Picofarads;
            }
        }
        """);

    [Fact]
    public Task Fix_reads_the_right_side_in_the_left_sides_unit() => Verify.Fix<MixedUnitArithmeticAnalyzer>(
        "class C { double M(Capacitance cf, Capacitance cd) => {|SLU0003:cf.Farads + cd.Picofarads|}; }",
        "class C { double M(Capacitance cf, Capacitance cd) => cf.Farads + cd.Farads; }");
}
