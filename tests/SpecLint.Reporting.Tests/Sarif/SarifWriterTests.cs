using System.Text.Json;
using Json.Schema;
using SpecLint.Reporting.Sarif;
using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Tests.Sarif;

public sealed class SarifWriterTests
{
    private static readonly Lazy<JsonSchema> Schema = new(() =>
        JsonSchema.FromText(File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "Schemas", "sarif-2.1.0-rtm.5.draft-07.json"))));

    private static readonly RuleDescriptor PhaseMargin = new("phase-margin", "The loop keeps enough phase margin at nominal and at every tolerance corner", Severity.Error);
    private static readonly RuleDescriptor Peaking = new("peaking", "Gain peaking stays below the limit", Severity.Warning);

    private static readonly Finding[] Findings =
    [
        new("phase-margin", Severity.Error, "hw/rx/ch2.tia.yaml", "/feedback/capacitance", 31, 15,
            "phase margin 31° is below the floor of 45°; Cf = 3.3 pF restores it", new FixSuggestion("/feedback/capacitance", "3.3 pF")),
        new("peaking", Severity.Warning, "hw/rx/ch2.tia.yaml", "/feedback/capacitance", 31, 15, "gain peaking 2.1 dB exceeds 1 dB", Waived: true, WaiverReason: "accepted for the prototype run"),
        new(RuleIds.SpecInvalid, Severity.Error, "hw\\rx\\old ch1.tia.yaml", "/amplifier/gbw", 7, 8, "'8 MHZ' is not a quantity: unknown unit 'MHZ'"),
        new(RuleIds.WaiverUnmatched, Severity.Warning, "./hw/rx/ch2.tia.yaml", "/waivers/1/rule", 52, 11, "the waiver of 'slew-rate' matches no finding"),
        new("medical-margin", Severity.Note, "hw/rx/ch3.tia.yaml", "", 0, 0, "house rule says hello"),
    ];

    private static string Sample() => SarifWriter.Write(
        [PhaseMargin, Peaking],
        Findings,
        new SarifOptions("1.2.3") { RulePages = new Dictionary<string, string> { ["phase-margin"] = RepositoryFiles.RulePage("phase-margin") } });

    private static EvaluationResults Validate(string sarif)
    {
        using var doc = JsonDocument.Parse(sarif);
        return Schema.Value.Evaluate(doc.RootElement, new EvaluationOptions { OutputFormat = OutputFormat.List });
    }

    private static string Errors(EvaluationResults results) => string.Join(
        "\n",
        new[] { results }.Concat(results.Details ?? []).Where(r => !r.IsValid && r.Errors is not null)
            .SelectMany(r => r.Errors!.Select(e => $"{r.InstanceLocation}: {e.Key} {e.Value}")));

    [Fact]
    public void Output_validates_against_the_SARIF_2_1_0_schema()
    {
        var results = Validate(Sample());

        Assert.True(results.IsValid, Errors(results));
    }

    [Fact]
    public void The_schema_copy_really_rejects_a_broken_log()
    {
        var broken = Sample().Replace("\"startLine\": 31", "\"startLine\": 0", StringComparison.Ordinal).Replace("\"level\": \"warning\"", "\"level\": \"severe\"", StringComparison.Ordinal);

        Assert.False(Validate(broken).IsValid);
    }

    [Fact]
    public void Results_carry_levels_locations_and_rule_indexes()
    {
        using var doc = JsonDocument.Parse(Sample());
        var run = doc.RootElement.GetProperty("runs")[0];
        var rules = run.GetProperty("tool").GetProperty("driver").GetProperty("rules").EnumerateArray().Select(r => r.GetProperty("id").GetString()).ToList();
        var results = run.GetProperty("results").EnumerateArray().ToList();

        Assert.Equal(["medical-margin", "peaking", "phase-margin", "spec-invalid", "waiver-unmatched"], rules);
        Assert.All(results, r => Assert.Equal(r.GetProperty("ruleId").GetString(), rules[r.GetProperty("ruleIndex").GetInt32()]));
        var pm = results.Single(r => r.GetProperty("ruleId").GetString() == "phase-margin");
        Assert.Equal("error", pm.GetProperty("level").GetString());
        var location = pm.GetProperty("locations")[0].GetProperty("physicalLocation");
        Assert.Equal("hw/rx/ch2.tia.yaml", location.GetProperty("artifactLocation").GetProperty("uri").GetString());
        Assert.Equal(31, location.GetProperty("region").GetProperty("startLine").GetInt32());
        Assert.Equal(15, location.GetProperty("region").GetProperty("startColumn").GetInt32());
        Assert.Equal("note", results.Single(r => r.GetProperty("ruleId").GetString() == "medical-margin").GetProperty("level").GetString());
    }

    [Fact]
    public void Paths_become_relative_uris_with_forward_slashes()
    {
        using var doc = JsonDocument.Parse(Sample());
        var uris = doc.RootElement.GetProperty("runs")[0].GetProperty("results").EnumerateArray()
            .Select(r => r.GetProperty("locations")[0].GetProperty("physicalLocation").GetProperty("artifactLocation").GetProperty("uri").GetString())
            .ToList();

        Assert.Contains("hw/rx/old%20ch1.tia.yaml", uris);
        Assert.DoesNotContain(uris, u => u!.Contains('\\', StringComparison.Ordinal) || u.StartsWith("./", StringComparison.Ordinal));
        var root = Path.Combine(Path.GetTempPath(), "repo");
        Assert.Equal("hw/ch1.tia.yaml", SarifWriter.ArtifactUri(Path.Combine(root, "hw", "ch1.tia.yaml"), root));
        Assert.StartsWith("file:///", SarifWriter.ArtifactUri("/elsewhere/ch1.tia.yaml", root), StringComparison.Ordinal);
    }

    [Fact]
    public void A_waived_finding_is_an_in_source_suppression_with_the_waiver_reason()
    {
        using var doc = JsonDocument.Parse(Sample());
        var results = doc.RootElement.GetProperty("runs")[0].GetProperty("results").EnumerateArray().ToList();

        var suppression = results.Single(r => r.GetProperty("ruleId").GetString() == "peaking").GetProperty("suppressions")[0];
        Assert.Equal("inSource", suppression.GetProperty("kind").GetString());
        Assert.Equal("accepted for the prototype run", suppression.GetProperty("justification").GetString());
        Assert.Single(results, r => r.TryGetProperty("suppressions", out _));
    }

    [Fact]
    public void Rules_take_their_description_and_help_from_the_rule_page()
    {
        using var doc = JsonDocument.Parse(Sample());
        var rules = doc.RootElement.GetProperty("runs")[0].GetProperty("tool").GetProperty("driver").GetProperty("rules").EnumerateArray().ToList();

        var pm = rules.Single(r => r.GetProperty("id").GetString() == "phase-margin");
        Assert.Equal("PhaseMargin", pm.GetProperty("name").GetString());
        Assert.StartsWith("PM = 180° + ∠T(f_c) ≥ floor, where T = A·β is the loop gain", pm.GetProperty("fullDescription").GetProperty("text").GetString(), StringComparison.Ordinal);
        Assert.StartsWith("# phase-margin", pm.GetProperty("help").GetProperty("markdown").GetString(), StringComparison.Ordinal);
        Assert.DoesNotContain("##", pm.GetProperty("help").GetProperty("text").GetString(), StringComparison.Ordinal);
        Assert.Equal("https://speclint.invalid/rules/phase-margin/phase-margin.md", pm.GetProperty("helpUri").GetString());
        Assert.Equal("error", pm.GetProperty("defaultConfiguration").GetProperty("level").GetString());
        var unmatched = rules.Single(r => r.GetProperty("id").GetString() == RuleIds.WaiverUnmatched);
        Assert.Equal("warning", unmatched.GetProperty("defaultConfiguration").GetProperty("level").GetString());
        Assert.False(unmatched.GetProperty("help").TryGetProperty("markdown", out _));
    }

    [Fact]
    public void The_message_leads_with_a_capitalised_sentence_and_names_the_fix()
    {
        Assert.Equal(
            "Phase margin 31° is below the floor of 45°; Cf = 3.3 pF restores it. Suggested fix: set /feedback/capacitance to 3.3 pF.",
            SarifWriter.MessageText(Findings[0]));
    }

    [Fact]
    public void Output_is_byte_identical_whatever_the_order_of_findings_and_rules()
    {
        var options = new SarifOptions("1.2.3");
        var a = SarifWriter.Write([PhaseMargin, Peaking], Findings, options);
        var b = SarifWriter.Write([Peaking, PhaseMargin], Findings.Reverse().ToArray(), options);

        Assert.Equal(a, b);
        Assert.DoesNotContain("\r", a, StringComparison.Ordinal);
        Assert.Contains("µ", SarifWriter.Write([], [Findings[0] with { Message = "slew 3 V/µs" }], options), StringComparison.Ordinal);
    }

    [Fact]
    public void Fingerprints_follow_the_key_not_the_line_and_stay_distinct()
    {
        static List<string> Prints(IReadOnlyList<Finding> findings)
        {
            using var doc = JsonDocument.Parse(SarifWriter.Write([], findings, new SarifOptions("1")));
            return doc.RootElement.GetProperty("runs")[0].GetProperty("results").EnumerateArray()
                .Select(r => r.GetProperty("partialFingerprints").GetProperty(SarifWriter.FingerprintKey).GetString()!).ToList();
        }

        var moved = Findings.Select(f => f with { Line = f.Line + 10 }).ToArray();
        Assert.Equal(Prints(Findings), Prints(moved));
        Assert.Equal(Findings.Length, Prints(Findings).Distinct().Count());
        var twice = Prints([Findings[0], Findings[0] with { Message = "a second corner" }]);
        Assert.NotEqual(twice[0], twice[1]);
    }

    [Theory]
    [InlineData("phase-margin", "PhaseMargin")]
    [InlineData("thermal-vs-shot-noise", "ThermalVsShotNoise")]
    [InlineData("spec-invalid", "SpecInvalid")]
    public void Rule_names_are_the_pascal_case_of_the_id(string id, string name) => Assert.Equal(name, SarifWriter.PascalName(id));

    [Fact]
    public void An_empty_run_is_still_a_valid_log()
    {
        var sarif = SarifWriter.Write([], [], new SarifOptions("0.1.0"));

        var results = Validate(sarif);
        Assert.True(results.IsValid, Errors(results));
    }
}
