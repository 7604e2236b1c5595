using SpecLint.Rules.Engine;

namespace SpecLint.HouseRules.Tests;

/// <summary>Each refused family, tried by a rule, is a house-rule-forbidden finding at the offending name.</summary>
public sealed class ForbiddenApiTests
{
    public static TheoryData<string, string, string> Attempts => new()
    {
        { "file access", "", "var text = System.IO.[|File|].ReadAllText(\"/etc/passwd\");" },
        { "file access", "", "using var w = new System.IO.[|StreamWriter|](\"x.txt\");" },
        { "network access", "", "using var c = new System.Net.Http.[|HttpClient|]();" },
        { "processes and diagnostics", "", "System.Diagnostics.[|Process|].Start(\"sh\");" },
        { "the environment", "", "var home = [|Environment|].GetEnvironmentVariable(\"HOME\");" },
        { "the console", "", "[|Console|].WriteLine(\"x.tia.yaml:1:1: error phase-margin: forged\");" },
        { "reflection", "", "var m = typeof(string).[|GetMethods|]();" },
        { "reflection", "", "var o = [|Activator|].CreateInstance(typeof(object));" },
        { "threading", "", "System.Threading.[|Thread|].Sleep(10);" },
        { "threading", "", "var t = System.Threading.Tasks.[|Task|].Run(() => 1);" },
        { "threading", "", "var q = new[] { 1 }.[|AsParallel|]();" },
        { "threading", "", "[|lock|] (context) { }" },
        { "unsafe code", "", "[|unsafe|] { }" },
        { "native code (P/Invoke)", "[System.Runtime.InteropServices.[|DllImport|](\"libc\")] static extern int getpid();", "" },
        { "dynamic", "", "[|dynamic|] d = 1;" },
        { "assembly loading", "", "var a = System.Reflection.[|Assembly|].LoadFrom(\"x.dll\");" },
        { "assembly loading", "", "var c = new System.Runtime.Loader.[|AssemblyLoadContext|](\"x\");" },
        { "clocks and unseeded randomness (results must repeat exactly)", "", "var now = DateTime.[|Now|];" },
        { "clocks and unseeded randomness (results must repeat exactly)", "", "var r = [|new Random()|];" },
    };

    [Theory]
    [MemberData(nameof(Attempts))]
    public void A_rule_that_tries_a_refused_api_is_refused_at_the_name(string family, string members, string statement)
    {
        using var repo = new HouseRuleRepo();
        var src = Marked.Parse(Sources.Rule("probe", statement + "\n        yield break;", members: members));
        repo.Write("house-rules/probe/ProbeRule.cs", src.Text);
        repo.Write("a.tia.yaml", Sources.Spec);

        var run = repo.Check();

        var forbidden = run.RunProblems.Where(f => f.RuleId == RuleIds.HouseRuleForbidden).ToList();
        Assert.True(forbidden.Any(f => f.Line == src.Line && f.Column == src.Column && f.Message.Contains("(" + family + ")", StringComparison.Ordinal)),
            $"expected at {src.Line}:{src.Column}: " + string.Join(" | ", run.RunProblems));
        Assert.False(run.Catalog.IsHouseRule("probe"));
        Assert.Equal(ExitCodes.UnusableInput, run.ExitCode);
    }

    [Fact]
    public void Math_strings_collections_linq_formatting_and_the_rule_api_are_allowed()
    {
        using var repo = new HouseRuleRepo();
        repo.Write("house-rules/probe/ProbeRule.cs", Sources.Rule("probe", """
                var values = new List<double> { Math.Sqrt(2), Math.Log10(1e3) };
                var map = values.Select((v, i) => (v, i)).ToDictionary(p => p.i, p => p.v);
                var sb = new System.Text.StringBuilder();
                sb.Append(string.Join(",", map.Values.Select(v => v.ToString("0.00", System.Globalization.CultureInfo.InvariantCulture))));
                var rx = System.Text.RegularExpressions.Regex.IsMatch(context.Spec.Name, "^[a-z-]+$");
                var seeded = new Random(42).NextDouble();
                var complex = new System.Numerics.Complex(1, 2).Magnitude;
                var cf = context.Circuit.Cf;
                var type = typeof(string);
                if (rx && sb.Length > 0 && seeded >= 0 && complex > 0 && cf > Capacitance.Zero && type is not null && context.Analysis.PhaseMargin is { } pm && pm.Degrees < 0)
                {
                    yield return context.Report("/feedback/capacitance", "never");
                }
        """));
        repo.Write("a.tia.yaml", Sources.Spec);

        var run = repo.Check();

        Assert.Empty(run.RunProblems);
        Assert.True(run.Catalog.IsHouseRule("probe"));
    }
}
