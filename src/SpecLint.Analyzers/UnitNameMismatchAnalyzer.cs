using System.Collections.Immutable;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Operations;
using SpecLint.Analyzers.Units;

namespace SpecLint.Analyzers;

/// <summary>
/// Flags a raw reading in one unit stored in, passed to or compared with something whose name says
/// another unit or dimension (<c>double cfPf = cf.Farads;</c>): the name is the only unit check a raw
/// double has, and here it is wrong.
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class UnitNameMismatchAnalyzer : DiagnosticAnalyzer
{
    internal static readonly DiagnosticDescriptor Rule = Descriptors.Warning(
        DiagnosticIds.UnitNameMismatch,
        "Raw reading in one unit under a name that says another",
        "'{0}' is in {1}, but '{2}' says {3}",
        "A raw double carries its unit only in its name. Reading a quantity in one unit into a name that says another unit or dimension makes every later use of the name wrong by that factor.");

    /// <inheritdoc />
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics => ImmutableArray.Create(Rule);

    /// <inheritdoc />
    public override void Initialize(AnalysisContext context)
    {
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.None);
        context.EnableConcurrentExecution();
        context.RegisterOperationAction(c =>
        {
            var d = (IVariableDeclaratorOperation)c.Operation;
            Check(c, d.Initializer?.Value, d.Symbol.Name);
        }, OperationKind.VariableDeclarator);
        context.RegisterOperationAction(c =>
        {
            var a = (IAssignmentOperation)c.Operation;
            Check(c, a.Value, Operations.ReferencedName(a.Target));
        }, OperationKind.SimpleAssignment, OperationKind.CompoundAssignment);
        context.RegisterOperationAction(c =>
        {
            var a = (IArgumentOperation)c.Operation;
            Check(c, a.Value, a.Parameter?.Name);
        }, OperationKind.Argument);
        context.RegisterOperationAction(c =>
        {
            var b = (IBinaryOperation)c.Operation;
            if (b.OperatorMethod is null && Operations.IsComparison(b.OperatorKind))
            {
                Check(c, b.LeftOperand, Operations.ReferencedName(b.RightOperand));
                Check(c, b.RightOperand, Operations.ReferencedName(b.LeftOperand));
            }
        }, OperationKind.Binary);
    }

    private static void Check(OperationAnalysisContext context, IOperation? value, string? name)
    {
        if (name is null || Reading.Of(value) is not { } reading || NameUnits.Read(name) is not { } said)
        {
            return;
        }

        if (said.Quantity != reading.Quantity)
        {
            Report(context, reading, name, said, null);
        }
        else if (said.Unit is not null && said.Unit != reading.Unit)
        {
            Report(context, reading, name, said, said.Unit.Accessor);
        }
    }

    private static void Report(OperationAnalysisContext context, Reading reading, string name, NameUnit said, string? accessor)
    {
        // The fix reads the same quantity in the unit the name says; across dimensions there is none.
        var props = accessor is null ? ImmutableDictionary<string, string?>.Empty
            : Fixes.Of(("Read it in " + said.Describe() + ": ." + accessor, accessor));
        context.ReportDiagnostic(Diagnostic.Create(Rule, reading.Property.Syntax.GetLocation(),
            new[] { reading.AccessorLocation }, props,
            reading.Text, reading.Unit.Symbol, name, said.Describe()));
    }
}
