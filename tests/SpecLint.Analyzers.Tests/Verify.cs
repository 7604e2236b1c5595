using Microsoft.CodeAnalysis.CSharp.Testing;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Testing;
using SpecLint.Analyzers.CodeFixes;

namespace SpecLint.Analyzers.Tests;

/// <summary>Runs one analyzer (and the fix provider) over code that references the SpecLint library.</summary>
internal static class Verify
{
    public static readonly ReferenceAssemblies Net10 = new ReferenceAssemblies(
            "net10.0", new PackageIdentity("Microsoft.NETCore.App.Ref", "10.0.12"), Path.Combine("ref", "net10.0"))
        .WithNuGetConfigFilePath(Path.Combine(AppContext.BaseDirectory, "offline.nuget.config"));

    private const string Usings = "using System;\nusing SpecLint.Core.Units;\nusing SpecLint.Core.Analysis;\nusing SpecLint.Rules.Engine;\n";

    /// <summary>Markup uses {|SLU0001:…|}; every marked span must be reported and nothing else.</summary>
    public static Task Analyzer<TAnalyzer>(string body)
        where TAnalyzer : DiagnosticAnalyzer, new()
    {
        var test = new CSharpAnalyzerTest<TAnalyzer, DefaultVerifier> { TestCode = Usings + body, ReferenceAssemblies = Net10 };
        AddLibrary(test.TestState);
        return test.RunAsync();
    }

    public static Task Fix<TAnalyzer>(string before, string after, int actionIndex = 0)
        where TAnalyzer : DiagnosticAnalyzer, new()
    {
        var test = new CSharpCodeFixTest<TAnalyzer, ReplacementCodeFixProvider, DefaultVerifier>
        {
            TestCode = Usings + before,
            FixedCode = Usings + after,
            ReferenceAssemblies = Net10,
            CodeActionIndex = actionIndex,
        };
        AddLibrary(test.TestState);
        AddLibrary(test.FixedState);
        return test.RunAsync();
    }

    private static void AddLibrary(SolutionState state)
    {
        state.AdditionalReferences.Add(typeof(SpecLint.Core.Units.Capacitance).Assembly.Location);
        state.AdditionalReferences.Add(typeof(SpecLint.Rules.Engine.IRule).Assembly.Location);
    }
}
