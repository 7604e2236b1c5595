using System.Collections.Immutable;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Operations;
using SpecLint.Analyzers.Units;

namespace SpecLint.Analyzers;

/// <summary>
/// Flags a sum, difference or comparison of raw doubles read from different dimensions
/// (<c>rf.Ohms + cf.Farads</c>) or from one dimension in different units (<c>a.Farads + b.Picofarads</c>).
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class MixedUnitArithmeticAnalyzer : DiagnosticAnalyzer
{
    internal static readonly DiagnosticDescriptor Rule = Descriptors.Warning(
        DiagnosticIds.MixedUnitArithmetic,
        "Sum or comparison of raw readings in different units",
        "'{0}' {1} {2} and {3}",
        "Once a quantity is read into a double the compiler no longer checks units. Adding or comparing ohms with farads has no physical meaning; adding farads to picofarads is off by 10^12.");

    /// <inheritdoc />
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics => ImmutableArray.Create(Rule);

    /// <inheritdoc />
    public override void Initialize(AnalysisContext context)
    {
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.None);
        context.EnableConcurrentExecution();
        context.RegisterOperationAction(Check, OperationKind.Binary);
    }

    private static void Check(OperationAnalysisContext context)
    {
        var b = (IBinaryOperation)context.Operation;
        if (b.OperatorMethod is not null || !Operations.IsSumOrComparison(b.OperatorKind)
            || Operations.DimensionOf(b.LeftOperand) is not { } left || Operations.DimensionOf(b.RightOperand) is not { } right)
        {
            return;
        }

        var verb = Operations.IsComparison(b.OperatorKind) ? "compares" : "adds";
        if (left.Quantity != right.Quantity)
        {
            context.ReportDiagnostic(Diagnostic.Create(Rule, b.Syntax.GetLocation(), b.Syntax.ToString(), verb,
                left.Quantity.WithArticle, right.Quantity.WithArticle));
            return;
        }

        if (left.Unit is null || right.Unit is null || left.Unit == right.Unit)
        {
            return;
        }

        // Same dimension, two units: reading the right side in the left side's unit makes it consistent.
        var props = ImmutableDictionary<string, string?>.Empty;
        Location[]? where = null;
        if (Reading.Of(b.RightOperand) is { } r && left.Unit.Accessor is { } accessor)
        {
            props = Fixes.Of(("Read '" + r.Text + "' in " + left.Unit.Symbol + ": ." + accessor, accessor));
            where = new[] { r.AccessorLocation };
        }

        context.ReportDiagnostic(Diagnostic.Create(Rule, b.Syntax.GetLocation(), where, props, b.Syntax.ToString(), verb,
            left.Unit.Symbol, right.Unit.Symbol));
    }
}
