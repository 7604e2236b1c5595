using System.Globalization;
using System.Text.RegularExpressions;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Tests.Support;

namespace SpecLint.Rules.Tests.Docs;

/// <summary>
/// The two designs on every rule page are complete specs that the tests run as the tool does (with tolerance
/// corners). The flagged one must be flagged by the page's rule, the revised one must not (a waived finding
/// counts as passing: it is how a reviewed caution is recorded). Figures written in their comments are
/// recomputed: "phase margin 23.4°", "peaking 8.1 dB", "bandwidth 97.7 kHz", "input noise 4.1 pA" and
/// "noise gain 6" against the nominal analysis, to half a unit of the last digit written; text in double
/// quotes in a comment must appear in the rule's finding message.
/// </summary>
public sealed partial class RulePageDesignTests
{
    public static TheoryData<string> Ids() => [.. RuleCatalog.BuiltIn.Rules.Select(r => r.Descriptor.Id)];

    private static string Design(string id, string heading) =>
        Assert.Single(RulePageSections.YamlBlocks(RulePageSections.Section(Assert.IsType<string>(RuleDocs.Page(id)), heading)));

    [Theory]
    [MemberData(nameof(Ids))]
    public void The_flagged_design_is_flagged_with_the_figures_it_quotes(string id)
    {
        var yaml = Design(id, RulePageSections.FlaggedDesign);
        var r = Lint.CheckWithCorners(yaml);

        var found = r.Of(id);
        Assert.True(found.Count > 0, $"{id}: the flagged design is not flagged:\n{string.Join("\n", r.Findings)}");
        foreach (var quote in Quotes(yaml))
        {
            Assert.True(found.Any(f => f.Message.Contains(quote, StringComparison.Ordinal)), $"{id}: no finding says \"{quote}\":\n{string.Join("\n", found.Select(f => f.Message))}");
        }

        AssertFigures(id, yaml, r);
    }

    [Theory]
    [MemberData(nameof(Ids))]
    public void The_revised_design_passes_with_the_figures_it_states(string id)
    {
        var yaml = Design(id, RulePageSections.RevisedDesign);
        var r = Lint.CheckWithCorners(yaml);

        var open = r.Of(id).Where(f => !f.Waived).ToList();
        Assert.True(open.Count == 0, $"{id}: the revised design is still flagged:\n{string.Join("\n", open)}");
        var errors = r.Findings.Where(f => f.Severity == Severity.Error && !f.Waived).ToList();
        Assert.True(errors.Count == 0, $"{id}: the revised design has errors:\n{string.Join("\n", errors)}");
        AssertFigures(id, yaml, r);
    }

    [Theory]
    [MemberData(nameof(Ids))]
    public void Every_design_states_at_least_one_figure_or_quote(string id)
    {
        var flagged = Design(id, RulePageSections.FlaggedDesign);
        Assert.True(Quotes(flagged).Any() || Figure().IsMatch(Comments(flagged)), $"{id}: the flagged design names no figure");
    }

    private static void AssertFigures(string id, string yaml, LintResult r)
    {
        var a = Assert.IsType<Core.Analysis.AnalysisResult>(r.Outcome.Analysis);
        foreach (Match m in Figure().Matches(Comments(yaml)))
        {
            var what = m.Groups["what"].Value;
            var text = m.Groups["value"].Value.Trim();
            var digits = NumberPart().Match(text).Value;
            var decimals = digits.Contains('.', StringComparison.Ordinal) ? digits.Split('.')[1].Length : 0;
            // The size of one written unit (1 pA, 1 kHz, 1 dB) in SI, so the half-unit tolerance scales with the prefix.
            var scale = QuantityOf(what, "1" + text[digits.Length..]);
            var halfUnit = 0.5 * Math.Pow(10, -decimals) * scale;
            var actual = what switch
            {
                "phase margin" => a.PhaseMargin?.Degrees ?? double.NaN,
                "peaking" => a.PeakingDb,
                "bandwidth" => a.Bandwidth?.Hertz ?? double.NaN,
                "input noise" => a.Noise?.InputRms.Amperes ?? double.NaN,
                "noise gain" => a.NoiseGainHighFrequency,
                _ => throw new InvalidOperationException(what),
            };
            var expected = QuantityOf(what, text);
            Assert.True(Math.Abs(actual - expected) <= halfUnit * (1 + 1e-9), $"{id}: the page says {what} {text}; the analysis gives {actual.ToString("G6", CultureInfo.InvariantCulture)}");
        }
    }

    private static double QuantityOf(string what, string text) => what switch
    {
        "phase margin" => double.Parse(text.TrimEnd('°'), CultureInfo.InvariantCulture),
        "peaking" => double.Parse(text.Replace("dB", "", StringComparison.Ordinal), CultureInfo.InvariantCulture),
        "noise gain" => double.Parse(text, CultureInfo.InvariantCulture),
        "bandwidth" => QuantityParser.ParseSingle(text, Dimension.Frequency),
        _ => QuantityParser.ParseSingle(text, Dimension.Current),
    };

    private static string Comments(string yaml) =>
        string.Join('\n', yaml.Split('\n').Where(l => l.Contains('#', StringComparison.Ordinal)).Select(l => l[l.IndexOf('#', StringComparison.Ordinal)..]));

    private static IEnumerable<string> Quotes(string yaml) => Quote().Matches(Comments(yaml)).Select(m => m.Groups[1].Value);

    [GeneratedRegex(@"(?<what>phase margin|peaking|bandwidth|input noise|noise gain) (?<value>-?\d+(?:\.\d+)?(?: ?°| dB| [kMG]?Hz| [fpnµu]A)?)")]
    private static partial Regex Figure();

    [GeneratedRegex(@"-?\d+(?:\.\d+)?")]
    private static partial Regex NumberPart();

    [GeneratedRegex("\"([^\"]+)\"")]
    private static partial Regex Quote();
}
