using System.Collections.Immutable;
using System.Text;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Emit;
using Microsoft.CodeAnalysis.Text;
using SpecLint.HouseRules.Discovery;
using SpecLint.Rules.Engine;

namespace SpecLint.HouseRules.Compiling;

/// <summary>
/// Compiles house-rule sources in memory with Roslyn against reference assemblies of .NET and SpecLint's rule
/// API, with nullable analysis on, the allow-list analyzer in the same compilation, and the budget
/// instrumentation applied to what is emitted. Only this class touches Roslyn, so a cached load never pays
/// for loading the compiler.
/// </summary>
internal static class HouseRuleCompiler
{
    /// <summary>The usings every house-rule file gets, as a project with implicit usings would.</summary>
    public const string ImplicitUsings =
        "global using System; global using System.Collections.Generic; global using System.Linq; " +
        "global using SpecLint.Core.Units; global using SpecLint.Core.Spec.Model; global using SpecLint.Core.Analysis; " +
        "global using SpecLint.Core.Analysis.Tolerance; global using SpecLint.Rules.Engine; global using SpecLint.Rules.Fixes;";

    private const string ImplicitUsingsFile = "<speclint-implicit-usings>.cs";

    /// <summary>Analyzers run over house rules besides the allow-list: the units analyzer, whose diagnostics become warnings at the .cs line.</summary>
    public static ImmutableArray<DiagnosticAnalyzer> ExtraAnalyzers { get; } = SpecLint.Analyzers.UnitAnalyzers.All;

    /// <summary>A text that changes whenever the compile options or analyzers change (part of the cache key).</summary>
    public static string OptionsFingerprint =>
        $"roslyn {typeof(CSharpCompilation).Assembly.GetName().Version}; C# {LanguageVersion.Latest.MapSpecifiedToEffectiveVersion()}; nullable; release; " +
        $"usings {ImplicitUsings}; analyzers {string.Join(",", ExtraAnalyzers.Select(a => a.GetType().Assembly.ManifestModule.ModuleVersionId).Distinct().Order())}";

    private static readonly CSharpParseOptions ParseOptions = new(LanguageVersion.Latest);

    /// <summary>Compiles <paramref name="files"/> into one assembly named <paramref name="assemblyName"/>.</summary>
    public static CompiledRules Compile(IReadOnlyList<SourceFile> files, string assemblyName)
    {
        ArgumentNullException.ThrowIfNull(files);
        var trees = files.Select(f => CSharpSyntaxTree.ParseText(SourceText.From(f.Text, Encoding.UTF8), ParseOptions, f.RelativePath)).ToList();
        var usings = CSharpSyntaxTree.ParseText(SourceText.From(ImplicitUsings, Encoding.UTF8), ParseOptions, ImplicitUsingsFile);
        var options = new CSharpCompilationOptions(
            OutputKind.DynamicallyLinkedLibrary,
            optimizationLevel: OptimizationLevel.Release,
            nullableContextOptions: NullableContextOptions.Enable,
            allowUnsafe: false,
            deterministic: true,
            concurrentBuild: false);
        var compilation = CSharpCompilation.Create(assemblyName, [usings, .. trees], References.All, options);

        var analyzers = ImmutableArray.Create<DiagnosticAnalyzer>(new ForbiddenApiAnalyzer()).AddRange(ExtraAnalyzers);
        var withAnalyzers = compilation.WithAnalyzers(analyzers, new CompilationWithAnalyzersOptions(
            new AnalyzerOptions([]), onAnalyzerException: null, concurrentAnalysis: false, logAnalyzerExecutionTime: false));
        var diagnostics = withAnalyzers.GetAllDiagnosticsAsync().GetAwaiter().GetResult();
        var problems = diagnostics
            .Where(d => d.Severity >= DiagnosticSeverity.Warning && !d.IsSuppressed && d.Location.SourceTree != usings)
            .Select(d => ToProblem(d, files[0].RelativePath))
            .Distinct()
            .OrderBy(p => p.Path, StringComparer.Ordinal).ThenBy(p => p.Line).ThenBy(p => p.Column).ThenBy(p => p.Message, StringComparer.Ordinal)
            .ToList();

        var rules = DeclaredRules(compilation, trees, problems);
        if (problems.Any(p => p.Severity == Severity.Error))
        {
            return new CompiledRules(null, null, [.. problems], rules);
        }

        var instrumented = compilation;
        foreach (var tree in trees)
        {
            var rewritten = new BudgetRewriter(compilation.GetSemanticModel(tree)).Visit(tree.GetRoot());
            instrumented = instrumented.ReplaceSyntaxTree(tree, CSharpSyntaxTree.Create((CSharpSyntaxNode)rewritten, ParseOptions, tree.FilePath, Encoding.UTF8));
        }

        instrumented = instrumented.AddSyntaxTrees(CSharpSyntaxTree.ParseText(SourceText.From(BudgetRuntime.Source, Encoding.UTF8), ParseOptions, BudgetRuntime.FileName));
        using var pe = new MemoryStream();
        using var pdb = new MemoryStream();
        var emitted = instrumented.Emit(pe, pdb, options: new EmitOptions(debugInformationFormat: DebugInformationFormat.PortablePdb));
        if (!emitted.Success)
        {
            // The sources compiled on their own, so this is SpecLint's instrumentation failing: say so plainly.
            var first = emitted.Diagnostics.First(d => d.Severity == DiagnosticSeverity.Error);
            var p = ToProblem(first, files[0].RelativePath);
            problems.Add(p with { Message = "SpecLint could not instrument this code for its time budget (a SpecLint bug; please report it): " + p.Message });
            return new CompiledRules(null, null, [.. problems], rules);
        }

        return new CompiledRules(pe.ToArray(), pdb.ToArray(), [.. problems], rules);
    }

    // A diagnostic without a source position (an analyzer that failed, a missing reference) is shown at the start of the first file.
    private static CompileProblem ToProblem(Diagnostic d, string firstFile)
    {
        var span = d.Location.IsInSource ? d.Location.GetMappedLineSpan() : new FileLinePositionSpan(firstFile, default, default);
        var forbidden = d.Id == ForbiddenApiAnalyzer.DiagnosticId;
        var id = forbidden ? RuleIds.HouseRuleForbidden : RuleIds.HouseRuleInvalid;
        var message = forbidden ? d.GetMessage(System.Globalization.CultureInfo.InvariantCulture)
            : $"{d.Id}: {d.GetMessage(System.Globalization.CultureInfo.InvariantCulture)}";
        // An analyzer that failed (AD0001) leaves the allow-list unchecked: that must not pass as a warning.
        var error = d.Severity == DiagnosticSeverity.Error || d.Id == "AD0001";
        return new CompileProblem(id, error ? Severity.Error : Severity.Warning,
            span.Path, span.StartLinePosition.Line + 1, span.StartLinePosition.Character + 1, message);
    }

    // The classes that implement IRule, and a problem for each *Rule.cs file that declares none.
    private static ImmutableArray<DeclaredType> DeclaredRules(CSharpCompilation compilation, List<SyntaxTree> trees, List<CompileProblem> problems)
    {
        var rule = compilation.GetTypeByMetadataName(typeof(IRule).FullName!);
        var found = ImmutableArray.CreateBuilder<DeclaredType>();
        foreach (var tree in trees)
        {
            var model = compilation.GetSemanticModel(tree);
            var any = false;
            TypeDeclarationSyntax? firstClass = null;
            foreach (var declaration in tree.GetRoot().DescendantNodes().OfType<TypeDeclarationSyntax>())
            {
                firstClass ??= declaration;
                if (model.GetDeclaredSymbol(declaration) is not INamedTypeSymbol symbol || rule is null
                    || !symbol.AllInterfaces.Contains(rule, SymbolEqualityComparer.Default))
                {
                    continue;
                }

                any = true;
                if (symbol.IsAbstract || symbol.TypeKind != TypeKind.Class)
                {
                    continue;
                }

                var at = declaration.Identifier.GetLocation().GetMappedLineSpan();
                found.Add(new DeclaredType(MetadataName(symbol), tree.FilePath, at.StartLinePosition.Line + 1, at.StartLinePosition.Character + 1));
            }

            var fileName = Path.GetFileNameWithoutExtension(tree.FilePath);
            if (!any && fileName.EndsWith("Rule", StringComparison.Ordinal))
            {
                var at = (firstClass?.Identifier.GetLocation() ?? Location.Create(tree, new TextSpan(0, 0))).GetMappedLineSpan();
                var what = firstClass is null ? "declares no class" : $"declares '{firstClass.Identifier.Text}', which does not implement IRule";
                problems.Add(new CompileProblem(RuleIds.HouseRuleInvalid, Severity.Error, tree.FilePath, at.StartLinePosition.Line + 1, at.StartLinePosition.Character + 1,
                    $"{Path.GetFileName(tree.FilePath)} {what}; a house rule is a class implementing IRule (its Descriptor and Check), e.g. 'public sealed class {fileName} : IRule'"));
            }
        }

        return found.ToImmutable();
    }

    private static string MetadataName(INamedTypeSymbol symbol)
    {
        var name = symbol.MetadataName;
        for (var outer = symbol.ContainingType; outer is not null; outer = outer.ContainingType)
        {
            name = outer.MetadataName + "+" + name;
        }

        return symbol.ContainingNamespace is { IsGlobalNamespace: false } ns ? ns.ToDisplayString() + "." + name : name;
    }
}
