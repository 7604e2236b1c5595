using System.Globalization;
using SpecLint.Rules.Engine;

namespace SpecLint.Cli.Scaffold;

/// <summary>The files <c>speclint new-rule &lt;id&gt;</c> writes: a working rule, its page and two cases that pass <c>test-rules</c>.</summary>
internal static class RuleScaffold
{
    /// <summary>"guard-ring-note" → "GuardRingNote".</summary>
    public static string PascalName(string id) =>
        string.Concat(id.Split('-', StringSplitOptions.RemoveEmptyEntries).Select(p => char.ToUpper(p[0], CultureInfo.InvariantCulture) + p[1..]));

    public static string ClassFile(string id) => $$"""
        namespace HouseRules;

        /// <summary>
        /// Replace this with what your team checks. As written it flags a feedback resistor above `max`:
        /// read the spec and its analysis from the context, compare with an option, report at the key.
        /// </summary>
        public sealed class {{PascalName(id)}}Rule : IRule
        {
            public static readonly RuleOption Max = new("max", Dimension.Resistance, "100 MΩ", "Largest feedback resistor this rule accepts");

            public RuleDescriptor Descriptor { get; } = new("{{id}}", "Feedback resistor at most 100 MΩ (replace with what your team checks)", Severity.Warning, [Max]);

            public IEnumerable<Finding> Check(RuleContext context)
            {
                var rf = context.Spec.Feedback.Resistance.Typ;
                var max = context.Option<Resistance>(Max.Key);
                if (rf > max)
                {
                    yield return context.Report("/feedback/resistance", $"Rf = {rf} is above {max}; (say why that matters and what to do)");
                }
            }
        }

        """;

    /// <summary>The page, in the same sections as the built-in rules' pages, with the cases as its designs.</summary>
    public static string Page(string id) => $"""
        # {id}: feedback resistor at most 100 MΩ

        A house rule. Replace the text below with what your team checks and why.

        {RulePageSections.Line(RulePageSections.Condition)}

        `feedback.resistance` ≤ `max` (default 100 MΩ).

        {RulePageSections.Line(RulePageSections.OnTheBench)}

        What goes wrong on a real board when this is not met.

        {RulePageSections.Line(RulePageSections.FlaggedDesign)}

        ```yaml
        feedback:
          resistance: 1 GΩ
        ```

        {RulePageSections.Line(RulePageSections.RevisedDesign)}

        ```yaml
        feedback:
          resistance: 10 MΩ
        ```

        {RulePageSections.Line(RulePageSections.Settings)}

        | key | default | meaning |
        |---|---|---|
        | `max` | 100 MΩ | the largest feedback resistor accepted |

        {RulePageSections.Line(RulePageSections.Sources)}

        - Where the limit comes from (a standard, a handbook, the team's own measurements).

        """;

    public static string Case(string id, bool flagged) => $"""
        # A case for the house rule '{id}': 'speclint test-rules' checks that every line whose
        # comment reads "expect:" and the rule id is flagged by it, and that no other line is.
        spec: 1
        kind: transimpedance
        name: {id}-{(flagged ? "flagged" : "clean")}
        conditions:
          temperature: 25 °C
          supply: {"{"} positive: 5 V, negative: -5 V {"}"}
        bias: 0 V
        input:
          type: photodiode
          capacitance: 10 pF
          current: {"{"} min: 1 pA, max: 1 nA {"}"}
        amplifier:
          gbw: 10 MHz
          voltage-noise: 10 nV/√Hz
          current-noise: 1 fA/√Hz
          input-capacitance: {"{"} common-mode: 3 pF, differential: 2 pF {"}"}
          bias-current: 1 pA
          offset-voltage: 0.5 mV
          output-swing: {"{"} to-negative: 50 mV, to-positive: 50 mV {"}"}
        feedback:
          resistance: {(flagged ? $"1 GΩ   # expect: {id}" : "10 MΩ")}
          capacitance: {(flagged ? "1 pF" : "2.2 pF")}

        """;
}
