using System;
using System.Collections.Immutable;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Operations;
using SpecLint.Analyzers.Units;

namespace SpecLint.Analyzers;

/// <summary>
/// Flags degrees fed to Math.Sin/Cos/Tan (which take radians), and a radian reading compared with a
/// number that can only be a degree threshold (<c>pm.Radians &lt; 45</c>).
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class DegreesAsRadiansAnalyzer : DiagnosticAnalyzer
{
    internal static readonly DiagnosticDescriptor Rule = Descriptors.Warning(
        DiagnosticIds.DegreesAsRadians,
        "Degrees and radians mixed",
        "'{0}' {1}",
        "Math.Sin, Cos and Tan take radians; phase margins and thresholds are written in degrees. Mixing them is off by 57.3 and turns a 45° margin check into one that always passes or always fails.");

    /// <inheritdoc />
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics => ImmutableArray.Create(Rule);

    /// <inheritdoc />
    public override void Initialize(AnalysisContext context)
    {
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.None);
        context.EnableConcurrentExecution();
        context.RegisterOperationAction(CheckTrig, OperationKind.Invocation);
        context.RegisterOperationAction(CheckComparison, OperationKind.Binary);
    }

    private static void CheckTrig(OperationAnalysisContext context)
    {
        var call = (IInvocationOperation)context.Operation;
        var m = call.TargetMethod;
        if (m.Name is not ("Sin" or "Cos" or "Tan") || call.Arguments.Length != 1
            || m.ContainingType?.ToDisplayString() is not ("System.Math" or "System.MathF"))
        {
            return;
        }

        var arg = call.Arguments[0].Value;
        if (Reading.Of(arg) is { Unit.Symbol: "deg" } r)
        {
            context.ReportDiagnostic(Diagnostic.Create(Rule, r.Property.Syntax.GetLocation(), new[] { r.AccessorLocation },
                Fixes.Of(("Pass radians: .Radians", "Radians")), r.Text, "is in degrees, but Math." + m.Name + " takes radians"));
        }
        else if (Operations.ReferencedName(arg) is { } name && NameUnits.Read(name) is { Unit.Symbol: "deg" })
        {
            // A raw double named in degrees: the conversion is the fix, written where the value is used.
            var text = Operations.Unwrap(arg)!.Syntax.ToString();
            context.ReportDiagnostic(Diagnostic.Create(Rule, Operations.Unwrap(arg)!.Syntax.GetLocation(),
                Fixes.Of(("Convert to radians: " + text + " * Math.PI / 180", text + " * Math.PI / 180")),
                text, "is in degrees, but Math." + m.Name + " takes radians"));
        }
    }

    private static void CheckComparison(OperationAnalysisContext context)
    {
        var b = (IBinaryOperation)context.Operation;
        if (b.OperatorMethod is not null || !Operations.IsComparison(b.OperatorKind))
        {
            return;
        }

        Compare(context, b.LeftOperand, b.RightOperand);
        Compare(context, b.RightOperand, b.LeftOperand);
    }

    // No phase in radians exceeds two turns, so a larger constant is a degree figure. A named constant
    // that says its unit is UnitNameMismatch's finding, not this one.
    private static void Compare(OperationAnalysisContext context, IOperation side, IOperation other)
    {
        if (Reading.Of(side) is not { Unit.Symbol: "rad", Quantity.Name: "Angle" } r
            || Operations.Constant(other) is not { } threshold || Math.Abs(threshold) <= 2 * Math.PI
            || (Operations.ReferencedName(other) is { } n && NameUnits.Read(n) is not null))
        {
            return;
        }

        context.ReportDiagnostic(Diagnostic.Create(Rule, r.Property.Syntax.GetLocation(), new[] { r.AccessorLocation },
            Fixes.Of(("Compare in degrees: .Degrees", "Degrees")), r.Text,
            "is in radians, but it is compared with " + other.Syntax + ", a threshold in degrees"));
    }
}
