namespace SpecLint.Analyzers.Tests;

public sealed class OptionDimensionMismatchTests
{
    private const string Rule = """
        public sealed class CfRule : IRule
        {
            public static readonly RuleOption Min = new("min", Dimension.Capacitance, "0.5 pF", "smallest Cf");
            public static RuleDescriptor Info { get; } = new("cf-rule", "Cf", Severity.Warning, [Min, new RuleOption("margin", Dimension.Voltage, "100 mV", "room")]);
            public RuleDescriptor Descriptor => Info;
            public System.Collections.Generic.IEnumerable<Finding> Check(RuleContext context)
            {
                BODY
                yield break;
            }
        }
        """;

    [Fact]
    public Task Flags_an_option_read_as_another_dimension() => Verify.Analyzer<OptionDimensionMismatchAnalyzer>(Rule.Replace("BODY", """
        var a = context.Option<{|SLU0008:Voltage|}>(Min.Key);
                var b = context.Option<{|SLU0008:Capacitance|}>("margin");
        """, StringComparison.Ordinal));

    [Fact]
    public Task Stays_silent_on_matching_and_unknown_options() => Verify.Analyzer<OptionDimensionMismatchAnalyzer>(Rule.Replace("BODY", """
        var a = context.Option<Capacitance>(Min.Key);
                var b = context.Option<Voltage>("margin");
                var c = context.Option<Voltage>("declared-elsewhere");
        """, StringComparison.Ordinal));

    [Fact]
    public Task Fix_reads_the_declared_dimension() => Verify.Fix<OptionDimensionMismatchAnalyzer>(
        Rule.Replace("BODY", "var a = context.Option<{|SLU0008:Voltage|}>(Min.Key);", StringComparison.Ordinal),
        Rule.Replace("BODY", "var a = context.Option<Capacitance>(Min.Key);", StringComparison.Ordinal));
}
