namespace SpecLint.HouseRules.Tests;

/// <summary>Spec and rule texts shared by the tests (an invented channel; values chosen to be clean for the built-in rules).</summary>
internal static class Sources
{
    public const string Spec = """
        spec: 1
        kind: transimpedance
        name: hr-clean
        tags: [bench]
        conditions:
          temperature: 25 °C
          supply: { positive: 5 V ±5%, negative: 0 V }
        bias: 0.2 V
        input:
          type: photodiode
          capacitance: 20 pF
          current: { min: 80 nA, max: 3 µA }
        amplifier:
          gbw: 10 MHz
          voltage-noise: 8 nV/√Hz
          current-noise: 1 fA/√Hz
          input-capacitance: { common-mode: 3 pF, differential: 2 pF }
          bias-current: 2 pA
          offset-voltage: 0.5 mV
          output-swing: { to-negative: 20 mV, to-positive: 40 mV }
        feedback:
          resistance: 1 MΩ ±1%
          capacitance: 3.3 pF ±10%
          dielectric: C0G
        """;

    /// <summary>A rule class with <paramref name="body"/> as the Check body and <paramref name="id"/> as its id.</summary>
    public static string Rule(string id, string body, string className = "ProbeRule", string members = "", string options = "") => $$"""
        namespace Team.Rules;

        public sealed class {{className}} : IRule
        {
            {{members}}
            public RuleDescriptor Descriptor { get; } = new("{{id}}", "A probe rule for tests", Severity.Error, [{{options}}]);

            public IEnumerable<Finding> Check(RuleContext context)
            {
                {{body}}
            }
        }
        """;

    /// <summary>A rule that flags Rf above an option <c>max</c> (default 100 kΩ, so the clean spec's 1 MΩ is flagged).</summary>
    public static string RfMaxRule(string id = "rf-max") => Rule(id, """
                var max = context.Option<Resistance>("max");
                if (context.Spec.Feedback.Resistance.Typ > max)
                {
                    yield return context.Report("/feedback/resistance", $"Rf is above {max}");
                }
        """, "RfMaxRule", options: """new RuleOption("max", Dimension.Resistance, "100 kΩ", "largest Rf")""");
}
