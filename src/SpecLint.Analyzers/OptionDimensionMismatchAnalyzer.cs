using System.Collections.Immutable;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Operations;
using SpecLint.Analyzers.Units;

namespace SpecLint.Analyzers;

/// <summary>
/// Flags <c>context.Option&lt;T&gt;("key")</c> when the rule's own descriptor, in the same class, declares
/// the option with another dimension: the configured "0.5 pF" would be read as volts.
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class OptionDimensionMismatchAnalyzer : DiagnosticAnalyzer
{
    private const string EngineNamespace = "SpecLint.Rules.Engine";

    internal static readonly DiagnosticDescriptor Rule = Descriptors.Warning(
        DiagnosticIds.OptionDimensionMismatch,
        "Option read as another dimension than declared",
        "Option '{0}' is declared as {1} but read as {2}",
        "An option's value is parsed and checked against the dimension its RuleOption declares, then handed over in SI. Reading it as another quantity type reinterprets that SI number in the wrong unit.");

    /// <inheritdoc />
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics => ImmutableArray.Create(Rule);

    /// <inheritdoc />
    public override void Initialize(AnalysisContext context)
    {
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.None);
        context.EnableConcurrentExecution();
        context.RegisterOperationAction(Check, OperationKind.Invocation);
    }

    private static void Check(OperationAnalysisContext context)
    {
        var call = (IInvocationOperation)context.Operation;
        var m = call.TargetMethod;
        if (m.Name != "Option" || m.TypeArguments.Length != 1 || call.Arguments.Length != 1
            || m.ContainingType?.ContainingNamespace?.ToDisplayString() != EngineNamespace
            || UnitCatalog.Of(m.TypeArguments[0]) is not { } read
            || context.ContainingSymbol.ContainingType is not { } ruleClass)
        {
            return;
        }

        var key = KeyOf(call.Arguments[0].Value, call.SemanticModel!);
        if (key is null || DeclaredDimension(ruleClass, key, call.SemanticModel!) is not { } declared || declared == read.Name)
        {
            return;
        }

        var typeArg = (call.Syntax as InvocationExpressionSyntax)?.Expression switch
        {
            MemberAccessExpressionSyntax { Name: GenericNameSyntax g } => g.TypeArgumentList.Arguments[0],
            GenericNameSyntax g => g.TypeArgumentList.Arguments[0],
            _ => null,
        };
        var props = typeArg is null || UnitCatalog.Named(declared) is null ? ImmutableDictionary<string, string?>.Empty
            : Fixes.Of(("Read it as " + declared, declared));
        context.ReportDiagnostic(Diagnostic.Create(Rule, (typeArg ?? call.Syntax).GetLocation(),
            typeArg is null ? null : new[] { typeArg.GetLocation() }, props,
            key, UnitCatalog.Named(declared)?.WithArticle ?? declared, read.WithArticle));
    }

    // The key as a string constant, or Field.Key where Field is a RuleOption of this class.
    private static string? KeyOf(IOperation value, SemanticModel model)
    {
        var op = Operations.Unwrap(value);
        if (op?.ConstantValue is { HasValue: true, Value: string s })
        {
            return s;
        }

        if (op is not IPropertyReferenceOperation { Property.Name: "Key", Instance: IFieldReferenceOperation field })
        {
            return null;
        }

        foreach (var reference in field.Field.DeclaringSyntaxReferences)
        {
            if (reference.SyntaxTree == model.SyntaxTree
                && reference.GetSyntax() is VariableDeclaratorSyntax { Initializer.Value: { } init }
                && model.GetOperation(init) is IObjectCreationOperation creation
                && creation.Arguments.FirstOrDefault(a => a.Parameter?.Ordinal == 0)?.Value.ConstantValue is { HasValue: true, Value: string k })
            {
                return k;
            }
        }

        return null;
    }

    // Finds `new RuleOption("key", Dimension.X, …)` (or target-typed `new(...)`) in the class's own syntax.
    private static string? DeclaredDimension(INamedTypeSymbol ruleClass, string key, SemanticModel model)
    {
        foreach (var reference in ruleClass.DeclaringSyntaxReferences)
        {
            if (reference.SyntaxTree != model.SyntaxTree)
            {
                continue; // another part of a partial class: its semantic model is not ours to ask for
            }

            foreach (var node in reference.GetSyntax().DescendantNodes().OfType<BaseObjectCreationExpressionSyntax>())
            {
                if (model.GetOperation(node) is not IObjectCreationOperation { Type.Name: "RuleOption" } creation
                    || creation.Type!.ContainingNamespace?.ToDisplayString() != EngineNamespace || creation.Arguments.Length < 2)
                {
                    continue;
                }

                var args = creation.Arguments.OrderBy(a => a.Parameter?.Ordinal ?? 0).ToList();
                if (args[0].Value.ConstantValue is { HasValue: true, Value: string k } && k == key
                    && Operations.Unwrap(args[1].Value) is IFieldReferenceOperation { Field.ContainingType.Name: "Dimension" } dim)
                {
                    return dim.Field.Name;
                }
            }
        }

        return null;
    }
}
