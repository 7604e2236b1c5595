using System.Collections.Immutable;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Diagnostics;

namespace SpecLint.HouseRules.Compiling;

/// <summary>
/// Runs in the same compilation as the house rules and refuses every use of an API outside the
/// <see cref="AllowList"/>, and the language features that escape it (unsafe code, P/Invoke, dynamic, await,
/// lock, finalizers), at the position of the offending name.
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
internal sealed class ForbiddenApiAnalyzer : DiagnosticAnalyzer
{
    // Roslyn ids must be identifiers; the finding is reported under house-rule-forbidden.
    public const string DiagnosticId = "SpecLintForbiddenApi";

    public static readonly DiagnosticDescriptor Forbidden = new(
        DiagnosticId,
        "An API a house rule may not use",
        "{0} is not allowed in a house rule ({1}); a house rule reads the spec and its analysis through RuleContext and reports findings, nothing else",
        "HouseRules",
        DiagnosticSeverity.Error,
        isEnabledByDefault: true);

    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics => [Forbidden];

    public override void Initialize(AnalysisContext context)
    {
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.Analyze | GeneratedCodeAnalysisFlags.ReportDiagnostics);
        context.EnableConcurrentExecution();
        context.RegisterSyntaxNodeAction(OnName, SyntaxKind.IdentifierName, SyntaxKind.GenericName);
        context.RegisterSyntaxNodeAction(OnCreation, SyntaxKind.ImplicitObjectCreationExpression, SyntaxKind.ObjectCreationExpression);
        context.RegisterSyntaxNodeAction(c => Report(c, c.Node.GetFirstToken().GetLocation(), "unsafe code", ApiFamily.Unsafe),
            SyntaxKind.UnsafeStatement, SyntaxKind.PointerType, SyntaxKind.FunctionPointerType, SyntaxKind.FixedStatement,
            SyntaxKind.AddressOfExpression, SyntaxKind.PointerIndirectionExpression, SyntaxKind.PointerMemberAccessExpression,
            SyntaxKind.ArgListExpression, SyntaxKind.MakeRefExpression, SyntaxKind.RefTypeExpression, SyntaxKind.RefValueExpression);
        context.RegisterSyntaxNodeAction(c => Report(c, c.Node.GetFirstToken().GetLocation(), "'await'", ApiFamily.Threading), SyntaxKind.AwaitExpression);
        context.RegisterSyntaxNodeAction(c => Report(c, c.Node.GetFirstToken().GetLocation(), "'lock'", ApiFamily.Threading), SyntaxKind.LockStatement);
        context.RegisterSyntaxNodeAction(c => Report(c, ((DestructorDeclarationSyntax)c.Node).Identifier.GetLocation(), "a finalizer", ApiFamily.Finalizers), SyntaxKind.DestructorDeclaration);
        context.RegisterSyntaxNodeAction(OnModifiers,
            SyntaxKind.MethodDeclaration, SyntaxKind.ClassDeclaration, SyntaxKind.StructDeclaration, SyntaxKind.RecordDeclaration,
            SyntaxKind.RecordStructDeclaration, SyntaxKind.FieldDeclaration, SyntaxKind.PropertyDeclaration, SyntaxKind.LocalFunctionStatement,
            SyntaxKind.ConstructorDeclaration, SyntaxKind.OperatorDeclaration, SyntaxKind.IndexerDeclaration, SyntaxKind.InterfaceDeclaration);
    }

    private static void OnModifiers(SyntaxNodeAnalysisContext context)
    {
        var modifiers = context.Node switch
        {
            MemberDeclarationSyntax m => m.Modifiers,
            LocalFunctionStatementSyntax l => l.Modifiers,
            _ => default,
        };
        foreach (var token in modifiers)
        {
            if (token.IsKind(SyntaxKind.UnsafeKeyword))
            {
                Report(context, token.GetLocation(), "'unsafe'", ApiFamily.Unsafe);
            }
            else if (token.IsKind(SyntaxKind.ExternKeyword))
            {
                Report(context, token.GetLocation(), "'extern'", ApiFamily.Native);
            }
        }
    }

    // The constructor, not only the type name: `new Random()` differs from `new Random(42)`.
    private static void OnCreation(SyntaxNodeAnalysisContext context)
    {
        var info = context.SemanticModel.GetSymbolInfo(context.Node, context.CancellationToken);
        if ((info.Symbol ?? info.CandidateSymbols.FirstOrDefault()) is IMethodSymbol ctor)
        {
            Judge(context, ctor, context.Node.GetFirstToken().GetLocation());
        }
    }

    private static void OnName(SyntaxNodeAnalysisContext context)
    {
        var name = (SimpleNameSyntax)context.Node;
        if (name.IsVar || name.Parent is UsingDirectiveSyntax || name.Parent is QualifiedNameSyntax { Parent: UsingDirectiveSyntax })
        {
            return;
        }

        var info = context.SemanticModel.GetSymbolInfo(name, context.CancellationToken);
        var symbol = info.Symbol ?? info.CandidateSymbols.FirstOrDefault();
        if (symbol is null)
        {
            return;
        }

        Judge(context, symbol, name.Identifier.GetLocation());
    }

    private static void Judge(SyntaxNodeAnalysisContext context, ISymbol symbol, Location at)
    {
        if (symbol is IAliasSymbol alias)
        {
            symbol = alias.Target;
        }

        if (symbol is INamespaceSymbol or ILocalSymbol or IParameterSymbol or ILabelSymbol or IRangeVariableSymbol or IDiscardSymbol or ITypeParameterSymbol)
        {
            return;
        }

        if (symbol is IDynamicTypeSymbol || (symbol is IMethodSymbol { ReturnType: IDynamicTypeSymbol }))
        {
            Report(context, at, "'dynamic'", ApiFamily.Dynamic);
            return;
        }

        var type = symbol switch
        {
            IArrayTypeSymbol a => a.ElementType as INamedTypeSymbol,
            INamedTypeSymbol t => t,
            _ => symbol.ContainingType,
        };
        if (type is null)
        {
            return;
        }

        while (type.ContainingType is { } outer)
        {
            type = outer;
        }

        type = type.OriginalDefinition;
        if (SymbolEqualityComparer.Default.Equals(type.ContainingAssembly, context.Compilation.Assembly))
        {
            return;
        }

        var ns = type.ContainingNamespace is { IsGlobalNamespace: false } n ? n.ToDisplayString() : "";
        var full = ns.Length == 0 ? type.MetadataName : ns + "." + type.MetadataName;
        var member = symbol is INamedTypeSymbol ? null : symbol.Name;
        if (member is not null && symbol is IMethodSymbol { MethodKind: MethodKind.Constructor, Parameters.Length: 0 } && full == "System.Random")
        {
            Report(context, at, "'new Random()' without a seed", ApiFamily.Nondeterminism);
            return;
        }

        if (AllowList.Judge(ns, full, member) is { } family)
        {
            var shown = member is null || symbol is IMethodSymbol { MethodKind: MethodKind.Constructor } ? $"'{Display(type)}'" : $"'{Display(type)}.{member}'";
            Report(context, at, shown, family);
        }
    }

    private static string Display(INamedTypeSymbol type) => type.ToDisplayString(SymbolDisplayFormat.CSharpErrorMessageFormat);

    private static void Report(SyntaxNodeAnalysisContext context, Location at, string what, string family) =>
        context.ReportDiagnostic(Diagnostic.Create(Forbidden, at, what, family));
}
