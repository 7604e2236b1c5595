using System.Collections.Immutable;
using System.Reflection;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.Diagnostics;
using SpecLint.Analyzers.Units;

namespace SpecLint.Analyzers.Tests;

public sealed class OwnSourceTests
{
    private static string RepoRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "SpecLint.sln")))
        {
            dir = dir.Parent;
        }

        return dir?.FullName ?? throw new InvalidOperationException("repository root not found");
    }

    [Fact]
    public async Task The_built_in_rules_compile_with_no_unit_diagnostics()
    {
        var files = Directory.GetFiles(Path.Combine(RepoRoot(), "rules"), "*.cs", SearchOption.AllDirectories);
        Assert.NotEmpty(files);
        var trees = files.Select(f => CSharpSyntaxTree.ParseText(File.ReadAllText(f), path: f)).ToList();
        trees.Add(CSharpSyntaxTree.ParseText("global using System; global using System.Collections.Generic; global using System.Linq;"));
        var refs = ((string)AppContext.GetData("TRUSTED_PLATFORM_ASSEMBLIES")!).Split(Path.PathSeparator)
            .Select(p => MetadataReference.CreateFromFile(p)).ToList();
        var compilation = CSharpCompilation.Create("BuiltInRules", trees, refs,
            new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary, nullableContextOptions: NullableContextOptions.Enable));

        // The rules must compile, or the analyzers would see a half-bound tree and prove nothing.
        Assert.Empty(compilation.GetDiagnostics().Where(d => d.Severity == DiagnosticSeverity.Error));
        var diagnostics = await compilation.WithAnalyzers(UnitAnalyzers.All).GetAnalyzerDiagnosticsAsync();
        Assert.Empty(diagnostics.Select(d => d.ToString()));
    }

    [Fact]
    public async Task A_caught_mistake_in_rule_code_is_reported_by_the_same_harness()
    {
        // Guards the test above: the same compilation setup does report when the code is wrong.
        var tree = CSharpSyntaxTree.ParseText("""
            using SpecLint.Core.Units;
            static class Bad { public static Capacitance Cf => new Capacitance(2.2); }
            """);
        var refs = ((string)AppContext.GetData("TRUSTED_PLATFORM_ASSEMBLIES")!).Split(Path.PathSeparator)
            .Select(p => MetadataReference.CreateFromFile(p)).ToList();
        var compilation = CSharpCompilation.Create("Bad", [tree], refs, new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary));
        var diagnostics = await compilation.WithAnalyzers(UnitAnalyzers.All).GetAnalyzerDiagnosticsAsync();
        Assert.Equal(DiagnosticIds.ImplausibleMagnitude, Assert.Single(diagnostics).Id);
    }

    [Fact]
    public void The_unit_catalog_names_only_members_the_library_has()
    {
        var asm = typeof(SpecLint.Core.Units.Capacitance).Assembly;
        foreach (var q in UnitCatalog.All)
        {
            var type = asm.GetType(UnitCatalog.Namespace + "." + q.Name);
            Assert.True(type is not null, q.Name);
            foreach (var u in q.Units)
            {
                if (u.Accessor is { } a)
                {
                    Assert.True(type!.GetProperty(a, BindingFlags.Public | BindingFlags.Instance)?.PropertyType == typeof(double), q.Name + "." + a);
                }

                if (u.Factory is { } f)
                {
                    Assert.True(type!.GetMethod(f, BindingFlags.Public | BindingFlags.Static, [typeof(double)])?.ReturnType == type, q.Name + "." + f);
                    if (!double.IsNaN(u.Scale))
                    {
                        // The analyzer's scale must be the library's: build 1 unit and compare in SI.
                        var built = type.GetMethod(f, [typeof(double)])!.Invoke(null, [1.0])!;
                        var si = (double)type.GetProperty("Si")!.GetValue(built)!;
                        Assert.Equal(u.ToSi(1), si, 1e-9 * Math.Max(1, Math.Abs(si)));
                    }
                }
            }

            foreach (var f in q.FixOrder)
            {
                Assert.NotNull(q.ByFactory(f));
            }
        }
    }

    [Fact]
    public void Every_id_has_a_page_a_release_entry_and_one_analyzer()
    {
        var root = RepoRoot();
        var ids = typeof(DiagnosticIds).GetFields().Where(f => f.IsLiteral && f.Name != nameof(DiagnosticIds.HelpBase)).Select(f => (string)f.GetRawConstantValue()!).ToList();
        var supported = UnitAnalyzers.All.SelectMany(a => a.SupportedDiagnostics).ToList();
        var unshipped = File.ReadAllText(Path.Combine(root, "src", "SpecLint.Analyzers", "AnalyzerReleases.Unshipped.md"));
        Assert.Equal(ids.Order(), supported.Select(d => d.Id).Order());
        foreach (var d in supported)
        {
            Assert.Matches("^SLU[0-9]{4}$", d.Id);
            Assert.Contains(d.Id + " |", unshipped, StringComparison.Ordinal);
            var page = Path.Combine(root, "docs", "analyzers", d.Id + ".md");
            Assert.True(File.Exists(page), page);
            Assert.StartsWith("# " + d.Id + ":", File.ReadAllText(page), StringComparison.Ordinal);
            Assert.Equal(DiagnosticIds.HelpBase + "/" + d.Id + ".md", d.HelpLinkUri);
        }

        Assert.Equal(ids.Count, Directory.GetFiles(Path.Combine(root, "docs", "analyzers"), "SLU*.md").Length);
    }
}
