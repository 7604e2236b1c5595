using System.Diagnostics;
using System.Globalization;
using System.Text;
using System.Text.Json;
using System.Text.RegularExpressions;
using CsCheck;

namespace SpecLint.Cli.Tests.Hostile;

/// <summary>
/// A seeded mutation fuzzer over the spec and configuration grammar (issue 14). Each input is a valid file
/// with a few mutations drawn from what hostile or careless files contain: overflowing and underflowing
/// numbers, wild tolerances, control characters, odd line breaks, tags, aliases, broken nesting, unknown
/// and duplicated keys. Every input must give exit code 0, 1 or 2 within a time bound, every finding
/// must be located inside the file, and no output may contain NaN, an infinity or an unbounded digit run.
/// The generator is driven by a fixed PCG seed, so CI sees the same inputs on every run.
/// </summary>
public sealed partial class SpecFuzzTests
{
    private const int SpecInputs = 1500;
    private const int ConfigInputs = 400;
    private static readonly TimeSpan PerInput = TimeSpan.FromSeconds(5);

    private static readonly string[] HostileValues =
    [
        "1e308", "1e-320", "-1e308", "7000 dB", "-7000 dB", "1e296 A", "0.5 pA ±1e308%", "1e308 Hz", "1e300 V", "1e-320 MΩ",
        "1e308 deg", "-5 deg", "0", "-0", "0 pF", "1 pF ±100%", "1 pF +1e308%/-1e308%", "1e308 .. 1e309", "1 .. 0", ".inf", ".nan",
        "\"\"", "true", "[1, 2]", "{ min: 1e308 A, max: 1e309 A }", "4k7", "1e-30 F", "999999999999999999999999999999 Ω",
        "\"a\\nb.tia.yaml:1:1: error forged\"", "\"\\e[31mred\"", "!!str 5 V", "*alias", "&a 5 V", "1 MΩ\u2028", "\"\\0\"",
    ];

    private static readonly string[] Fragments =
    [
        "\u0000", "\u001b[2J", "\u0085", "\u2028", "\u2029", "\u007f", "\t", "\r", "{", "[", "]", "}", ": ", "- ", "? ", "!tag ", "&a ", "*a ",
        "<<: {}", "---\n", "%YAML 1.1\n", "#", "'", "\"", "\\", "µ", "Ω", "\uFEFF",
    ];

    private static readonly string[] Keys =
    [
        "open-loop-gain", "dark-current", "bias-current", "gbw", "resistance", "capacitance", "bias", "temperature", "second-pole",
        "voltage-noise-corner", "slew-rate", "min-stable-gain", "peaking", "phase-margin", "bandwidth", "unknown-key", "Gbw",
        "series-resistance", "on-resistance", "off-capacitance", "adjustable", "steps", "wiper-resistance", "tolerance", "setting", "name",
    ];

    private static readonly string[] ConfigValues =
    [
        "50 kg", "true", "\"\"", "-5 deg", "1e308 deg", "1e300 pF", "[1]", "{}", "0 deg", "180 deg", "1e-320 mV", "NaN", "-1", "1e30 %",
    ];

    [GeneratedRegex(@"(?m)^(?<file>[^\n]*?\.(?:tia\.yaml|speclint\.yaml)):(?<line>\d+):(?<col>\d+): ", RegexOptions.CultureInvariant)]
    private static partial Regex LocatedLineRegex();

    /// <summary>One mutation: what to do, where (a fraction of the file), and what to put there.</summary>
    private readonly record struct Mutation(int Kind, double Where, int Pick);

    private static readonly Gen<Mutation[]> Plan =
        Gen.Select(Gen.Int[0, 7], Gen.Double[0, 1], Gen.Int[0, 1000], (k, w, p) => new Mutation(k, w, p)).Array[1, 4];

    [Fact]
    public void Mutated_specs_end_in_a_clear_result_within_bounds()
    {
        var stopwatch = Stopwatch.StartNew();
        using var cli = new CliHarness();
        cli.Write(".git/HEAD", "ref: refs/heads/main\n");
        var pcg = new PCG(14, 20261202);
        for (var i = 0; i < SpecInputs; i++)
        {
            var text = Mutate(Specs.Clean, Plan.Generate(pcg, null, out _));
            var path = cli.WriteBytes("fuzz.tia.yaml", Encoding.UTF8.GetBytes(text));
            Check(cli, text, i, "check", "fuzz.tia.yaml", "--nominal-only", "--format", i % 2 == 0 ? "json" : "text");
        }

        Assert.True(stopwatch.Elapsed < TimeSpan.FromSeconds(50), $"{SpecInputs} spec inputs took {stopwatch.Elapsed.TotalSeconds:0.0} s");
    }

    [Fact]
    public void Mutated_configurations_end_in_a_clear_result_within_bounds()
    {
        using var cli = new CliHarness();
        cli.Write(".git/HEAD", "ref: refs/heads/main\n");
        cli.Write("hw/ch.tia.yaml", Specs.Clean);
        const string config = "include: [\"**/*.tia.yaml\"]\nfail-on: error\nmonte-carlo: { samples: 10, seed: 1 }\nrules:\n  phase-margin: { severity: error, floor: 50 deg }\n  feedback-capacitor-size: { min: 0.5 pF }\n  peaking: { max: 1 dB }\n";
        var pcg = new PCG(14, 4242);
        var choice = Gen.Select(Gen.Int[0, ConfigValues.Length - 1], Gen.Int[0, 2]);
        for (var i = 0; i < ConfigInputs; i++)
        {
            var (value, slot) = choice.Generate(pcg, null, out _);
            var text = slot switch
            {
                0 => config.Replace("50 deg", ConfigValues[value], StringComparison.Ordinal),
                1 => config.Replace("0.5 pF", ConfigValues[value], StringComparison.Ordinal),
                _ => config.Replace("1 dB", ConfigValues[value], StringComparison.Ordinal),
            };
            text = Mutate(text, Plan.Generate(pcg, null, out _));
            cli.WriteBytes(".speclint.yaml", Encoding.UTF8.GetBytes(text));
            Check(cli, text, i, "check", "--nominal-only", "--format", i % 2 == 0 ? "json" : "text");
        }
    }

    private static void Check(CliHarness cli, string input, int index, params string[] args)
    {
        var started = Stopwatch.StartNew();
        var (exit, output, error) = cli.Run(args);
        var shown = $"input {index.ToString(CultureInfo.InvariantCulture)}:\n{input}\n--- output:\n{output}\n--- error:\n{error}";
        Assert.True(started.Elapsed < PerInput, $"took {started.Elapsed.TotalSeconds:0.0} s; {shown}");
        Assert.True(exit is 0 or 1 or 2, $"exit {exit}; {shown}");
        OutputScan.AssertFinite(output + error, shown);
        OutputScan.AssertNoControlCharacters(output + error, shown);
        var lines = input.Split(["\r\n", "\n", "\r"], StringSplitOptions.None);
        if (args.Contains("json"))
        {
            using var doc = JsonDocument.Parse(output);
            var fuzzed = doc.RootElement.GetProperty("specs").EnumerateArray()
                .Where(s => s.GetProperty("file").GetString()!.EndsWith("fuzz.tia.yaml", StringComparison.Ordinal));
            foreach (var f in fuzzed.SelectMany(s => s.GetProperty("findings").EnumerateArray()))
            {
                AssertInside(f.GetProperty("line").GetInt32(), f.GetProperty("column").GetInt32(), lines, shown);
            }
        }
        else
        {
            foreach (Match m in LocatedLineRegex().Matches(output))
            {
                if (m.Groups["file"].Value.EndsWith("fuzz.tia.yaml", StringComparison.Ordinal) || m.Groups["file"].Value.EndsWith(".speclint.yaml", StringComparison.Ordinal))
                {
                    AssertInside(int.Parse(m.Groups["line"].Value, CultureInfo.InvariantCulture), int.Parse(m.Groups["col"].Value, CultureInfo.InvariantCulture), lines, shown);
                }
            }
        }
    }

    private static void AssertInside(int line, int column, string[] lines, string shown)
    {
        Assert.True(line >= 1 && line <= Math.Max(1, lines.Length), $"line {line} is outside the file; {shown}");
        Assert.True(column >= 1 && column <= lines[line - 1].Length + 2, $"column {column} is outside line {line}; {shown}");
    }

    private static string Mutate(string text, Mutation[] plan)
    {
        foreach (var m in plan)
        {
            var lines = text.Split('\n').ToList();
            var at = Math.Min(lines.Count - 1, (int)(m.Where * lines.Count));
            var line = lines[at];
            var colon = line.IndexOf(": ", StringComparison.Ordinal);
            switch (m.Kind)
            {
                case 0 or 1 when colon > 0:
                    lines[at] = line[..(colon + 2)] + HostileValues[m.Pick % HostileValues.Length];
                    break;
                case 2:
                    var pos = (int)(m.Where * 7919 % Math.Max(1, line.Length + 1));
                    lines[at] = line[..Math.Min(pos, line.Length)] + Fragments[m.Pick % Fragments.Length] + line[Math.Min(pos, line.Length)..];
                    break;
                case 3:
                    lines.RemoveAt(at);
                    break;
                case 4:
                    lines.Insert(at, line);
                    break;
                case 5:
                    lines.Insert(at, new string(' ', (m.Pick % 3) * 2) + Keys[m.Pick % Keys.Length] + ": " + HostileValues[(m.Pick / 7) % HostileValues.Length]);
                    break;
                case 6:
                    lines[at] = new string(' ', m.Pick % 5) + line.TrimStart();
                    break;
                default:
                    text = string.Join('\n', lines);
                    return text[..Math.Min(text.Length, (int)(m.Where * text.Length) + 1)];
            }

            text = string.Join('\n', lines);
        }

        return text;
    }
}
