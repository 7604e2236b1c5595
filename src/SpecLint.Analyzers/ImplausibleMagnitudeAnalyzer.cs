using System.Collections.Immutable;
using System.Globalization;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Operations;
using SpecLint.Analyzers.Units;

namespace SpecLint.Analyzers;

/// <summary>
/// Flags a bare number passed to a quantity's SI constructor or a From&lt;Unit&gt; factory when the
/// value it builds is decades away from any real part (<c>new Capacitance(2.2)</c> is 2.2 F).
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class ImplausibleMagnitudeAnalyzer : DiagnosticAnalyzer
{
    internal static readonly DiagnosticDescriptor Rule = Descriptors.Warning(
        DiagnosticIds.ImplausibleMagnitude,
        "Literal magnitude implausible for the unit",
        "'{0}' builds {1} {2}, which is not plausible for {3}{4}",
        "The constructor and FromSi take SI units, and each From<Unit> factory takes its own unit. A number written with a prefix in mind (2.2 meaning 2.2 pF) lands decades away from the intended value.");

    /// <inheritdoc />
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics => ImmutableArray.Create(Rule);

    /// <inheritdoc />
    public override void Initialize(AnalysisContext context)
    {
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.None);
        context.EnableConcurrentExecution();
        context.RegisterOperationAction(c => Check(c, ((IObjectCreationOperation)c.Operation).Constructor, ((IObjectCreationOperation)c.Operation).Arguments), OperationKind.ObjectCreation);
        context.RegisterOperationAction(c => Check(c, ((IInvocationOperation)c.Operation).TargetMethod, ((IInvocationOperation)c.Operation).Arguments), OperationKind.Invocation);
    }

    private static void Check(OperationAnalysisContext context, IMethodSymbol? method, ImmutableArray<IArgumentOperation> arguments)
    {
        if (method is null || arguments.Length != 1 || method.Parameters.Length != 1
            || method.Parameters[0].Type.SpecialType != SpecialType.System_Double)
        {
            return;
        }

        var quantity = UnitCatalog.Of(method.ContainingType);
        if (quantity is null || !quantity.ChecksMagnitude)
        {
            return;
        }

        var unit = method.MethodKind == MethodKind.Constructor ? quantity.SiUnit
            : method.IsStatic && SymbolEqualityComparer.Default.Equals(method.ReturnType, method.ContainingType) ? quantity.ByFactory(method.Name)
            : null;
        if (unit is null || double.IsNaN(unit.Scale) || !TryLiteral(arguments[0].Value, out var literal, out var negative))
        {
            return;
        }

        var value = Operations.Constant(arguments[0].Value);
        if (value is null || quantity.IsPlausible(unit.ToSi(value.Value)))
        {
            return;
        }

        var number = MagnitudeFixes.NumberText(literal.Syntax.ToString(), negative);
        var candidates = MagnitudeFixes.Candidates(quantity, unit, number);
        var hint = candidates.Count > 0
            ? string.Format(CultureInfo.InvariantCulture, "; did you mean {0} {1} ({2}.{3})?", number, candidates[0].Symbol, quantity.Name, candidates[0].Factory)
            : "";
        // The type as the user wrote it (or would write it), so the fix compiles under the same usings.
        var typeText = method.ContainingType.ToMinimalDisplayString(context.Operation.SemanticModel!, context.Operation.Syntax.SpanStart);
        var props = Fixes.Of(candidates.Select(c => (
            string.Format(CultureInfo.InvariantCulture, "Read {0} as {1}: {2}.{3}({0})", number, c.Symbol, typeText, c.Factory),
            string.Format(CultureInfo.InvariantCulture, "{0}.{1}({2})", typeText, c.Factory, number))).ToArray());
        context.ReportDiagnostic(Diagnostic.Create(Rule, context.Operation.Syntax.GetLocation(), props,
            context.Operation.Syntax.ToString(), value.Value.ToString("R", CultureInfo.InvariantCulture), unit.Symbol,
            quantity.WithArticle, hint));
    }

    // Only literals: a computed value may be in any unit on purpose, and its magnitude is not visible.
    private static bool TryLiteral(IOperation operation, out ILiteralOperation literal, out bool negative)
    {
        var op = Operations.Unwrap(operation);
        negative = false;
        if (op is IUnaryOperation { OperatorKind: UnaryOperatorKind.Minus } u)
        {
            negative = true;
            op = Operations.Unwrap(u.Operand);
        }

        literal = (op as ILiteralOperation)!;
        return literal is not null;
    }
}
