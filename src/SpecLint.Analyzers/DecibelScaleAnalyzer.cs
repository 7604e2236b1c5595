using System.Collections.Immutable;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Operations;
using SpecLint.Analyzers.Units;

namespace SpecLint.Analyzers;

/// <summary>
/// Flags decibels converted with the wrong factor (10 for a voltage gain, 20 for a power) and a dB figure
/// and a linear ratio used in each other's place, where the operand's origin shows which it is.
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class DecibelScaleAnalyzer : DiagnosticAnalyzer
{
    internal static readonly DiagnosticDescriptor Rule = Descriptors.Warning(
        DiagnosticIds.DecibelScale,
        "Decibels and ratios confused",
        "'{0}' {1}",
        "A voltage or current ratio is 20·log10 in dB, a power ratio 10·log10. Using the other factor halves or doubles every figure in dB; feeding a dB figure where a ratio is expected is wrong by orders of magnitude.");

    private enum Kind
    {
        None,
        Amplitude,
        Power,
    }

    /// <inheritdoc />
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics => ImmutableArray.Create(Rule);

    /// <inheritdoc />
    public override void Initialize(AnalysisContext context)
    {
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.None);
        context.EnableConcurrentExecution();
        context.RegisterOperationAction(CheckInvocation, OperationKind.Invocation);
        context.RegisterOperationAction(CheckLogScale, OperationKind.Binary);
        context.RegisterOperationAction(CheckGainCreation, OperationKind.ObjectCreation);
    }

    // Math.Pow(10, g.Decibels / 10): a voltage gain in dB converted as a power. And Gain.FromDecibels(g.Linear).
    private static void CheckInvocation(OperationAnalysisContext context)
    {
        var call = (IInvocationOperation)context.Operation;
        var m = call.TargetMethod;
        if (m.Name == "Pow" && IsMath(m) && call.Arguments.Length == 2 && Operations.Constant(call.Arguments[0].Value) == 10
            && Operations.Unwrap(call.Arguments[1].Value) is IBinaryOperation { OperatorKind: BinaryOperatorKind.Divide, OperatorMethod: null } div
            && Operations.Constant(div.RightOperand) == 10 && Reading.Of(div.LeftOperand) is { Unit.Symbol: "dB" } r)
        {
            context.ReportDiagnostic(Diagnostic.Create(Rule, div.Syntax.GetLocation(), new[] { Operations.Unwrap(div.RightOperand)!.Syntax.GetLocation() },
                Fixes.Of(("Convert as a voltage ratio: / 20", "20")), div.Syntax.ToString(),
                "converts '" + r.Text + "', a voltage-gain dB figure (20·log10), with the power factor 10; the ratio comes out squared"));
            return;
        }

        if (m.Name == "FromDecibels" && UnitCatalog.Of(m.ContainingType) is { Name: "Gain" } && call.Arguments.Length == 1
            && Reading.Of(call.Arguments[0].Value) is { } lin && lin.Unit.Symbol != "dB")
        {
            var typeText = m.ContainingType.ToMinimalDisplayString(call.SemanticModel!, call.Syntax.SpanStart);
            context.ReportDiagnostic(Diagnostic.Create(Rule, lin.Property.Syntax.GetLocation(), new[] { call.Syntax.GetLocation() },
                Fixes.Of(("Build from the ratio: new " + typeText + "(…)", "new " + typeText + "(" + lin.Text + ")")), lin.Text,
                "is a linear ratio, but FromDecibels takes dB"));
        }
    }

    // new Gain(g.Decibels): a dB figure where the linear V/V ratio is expected.
    private static void CheckGainCreation(OperationAnalysisContext context)
    {
        var o = (IObjectCreationOperation)context.Operation;
        if (UnitCatalog.Of(o.Type) is not { Name: "Gain" } || o.Arguments.Length != 1
            || Reading.Of(o.Arguments[0].Value) is not { Unit.Symbol: "dB" } r)
        {
            return;
        }

        var typeText = o.Type!.ToMinimalDisplayString(o.SemanticModel!, o.Syntax.SpanStart);
        context.ReportDiagnostic(Diagnostic.Create(Rule, r.Property.Syntax.GetLocation(), new[] { o.Syntax.GetLocation() },
            Fixes.Of(("Build from dB: " + typeText + ".FromDecibels(…)", typeText + ".FromDecibels(" + r.Text + ")")), r.Text,
            "is in dB, but the constructor takes the linear ratio V/V"));
    }

    // 20·log10 of a power, or 10·log10 of a voltage, current or gain.
    private static void CheckLogScale(OperationAnalysisContext context)
    {
        var b = (IBinaryOperation)context.Operation;
        if (b.OperatorKind != BinaryOperatorKind.Multiply || b.OperatorMethod is not null)
        {
            return;
        }

        var (factorOp, logOp) = Operations.Constant(b.LeftOperand) is not null ? (b.LeftOperand, b.RightOperand) : (b.RightOperand, b.LeftOperand);
        var factor = Operations.Constant(factorOp);
        if (factor is not (10 or 20) || Operations.Unwrap(logOp) is not IInvocationOperation { TargetMethod.Name: "Log10", Arguments.Length: 1 } log
            || !IsMath(log.TargetMethod))
        {
            return;
        }

        var kind = KindOf(log.Arguments[0].Value);
        var (wrong, right, what) = kind switch
        {
            Kind.Power => (20.0, "10", "a power"),
            Kind.Amplitude => (10.0, "20", "a voltage, current or gain"),
            _ => (0.0, "", ""),
        };
        if (factor != wrong)
        {
            return;
        }

        context.ReportDiagnostic(Diagnostic.Create(Rule, b.Syntax.GetLocation(), new[] { Operations.Unwrap(factorOp)!.Syntax.GetLocation() },
            Fixes.Of(("Use " + right + "·log10", right)), b.Syntax.ToString(),
            "takes " + factor + "·log10 of " + what + "; that needs " + right + "·log10"));
    }

    private static Kind KindOf(IOperation op)
    {
        var u = Operations.Unwrap(op);
        if (Operations.DimensionOf(u) is { } d)
        {
            return Classify(d.Quantity, d.Unit);
        }

        switch (u)
        {
            // Power / Power and Voltage / Voltage through the quantities' own operators.
            case IBinaryOperation { OperatorKind: BinaryOperatorKind.Divide, OperatorMethod: { } method }
                when UnitCatalog.Of(method.Parameters[0].Type) is { } q && SymbolEqualityComparer.Default.Equals(method.Parameters[0].Type, method.Parameters[1].Type):
                return Classify(q, null);
            case IBinaryOperation { OperatorKind: BinaryOperatorKind.Divide, OperatorMethod: null } b:
                var l = KindOf(b.LeftOperand);
                return l == KindOf(b.RightOperand) ? l : Kind.None;
            // v·v and Math.Pow(v, 2) of an amplitude are powers.
            case IBinaryOperation { OperatorKind: BinaryOperatorKind.Multiply, OperatorMethod: null } m
                when KindOf(m.LeftOperand) == Kind.Amplitude && KindOf(m.RightOperand) == Kind.Amplitude:
                return Kind.Power;
            case IInvocationOperation { TargetMethod.Name: "Pow", Arguments.Length: 2 } p
                when IsMath(p.TargetMethod) && Operations.Constant(p.Arguments[1].Value) == 2 && KindOf(p.Arguments[0].Value) == Kind.Amplitude:
                return Kind.Power;
            default:
                return Kind.None;
        }
    }

    private static Kind Classify(QuantityDef q, UnitDef? unit) => q.Name switch
    {
        "Power" => Kind.Power,
        "Voltage" or "Current" or "VoltageNoiseDensity" or "CurrentNoiseDensity" => Kind.Amplitude,
        "Gain" when unit?.Symbol == "V/V" => Kind.Amplitude,
        _ => Kind.None,
    };

    private static bool IsMath(IMethodSymbol m) => m.ContainingType?.ToDisplayString() is "System.Math" or "System.MathF";
}
