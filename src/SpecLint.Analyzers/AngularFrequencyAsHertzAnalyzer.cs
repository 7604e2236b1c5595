using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Operations;
using SpecLint.Analyzers.Units;

namespace SpecLint.Analyzers;

/// <summary>
/// Flags 1/(R·C) or 1/√(L·C) used as a frequency in hertz: both are angular frequencies in rad/s, and
/// the corner in hertz is 2π smaller.
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class AngularFrequencyAsHertzAnalyzer : DiagnosticAnalyzer
{
    internal static readonly DiagnosticDescriptor Rule = Descriptors.Warning(
        DiagnosticIds.AngularFrequencyAsHertz,
        "Angular frequency used as hertz",
        "'{0}' is an angular frequency in rad/s, but it is used as {1} in hertz; divide by 2π",
        "The pole of an RC network is at ω = 1/(R·C) rad/s, which is f = 1/(2π·R·C) Hz. Using ω as hertz puts the feedback pole, and with it bandwidth and stability, 6.28 times too high.");

    /// <inheritdoc />
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics => ImmutableArray.Create(Rule);

    /// <inheritdoc />
    public override void Initialize(AnalysisContext context)
    {
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.None);
        context.EnableConcurrentExecution();
        context.RegisterOperationAction(CheckConstruction, OperationKind.ObjectCreation, OperationKind.Invocation);
        context.RegisterOperationAction(c =>
        {
            var d = (IVariableDeclaratorOperation)c.Operation;
            CheckNamed(c, d.Initializer?.Value, d.Symbol.Name);
        }, OperationKind.VariableDeclarator);
        context.RegisterOperationAction(c =>
        {
            var a = (ISimpleAssignmentOperation)c.Operation;
            CheckNamed(c, a.Value, Operations.ReferencedName(a.Target));
        }, OperationKind.SimpleAssignment);
    }

    private static void CheckConstruction(OperationAnalysisContext context)
    {
        var (method, args) = context.Operation switch
        {
            IObjectCreationOperation o => (o.Constructor, o.Arguments),
            IInvocationOperation i => (i.TargetMethod, i.Arguments),
            _ => (null, ImmutableArray<IArgumentOperation>.Empty),
        };
        if (method is null || args.Length != 1 || UnitCatalog.Of(method.ContainingType) is not { Name: "Frequency" } q)
        {
            return;
        }

        var unit = method.MethodKind == MethodKind.Constructor ? q.SiUnit : method.IsStatic ? q.ByFactory(method.Name) : null;
        if (unit is null || unit.Symbol == "rad/s" || !IsAngular(args[0].Value))
        {
            return;
        }

        var expr = Operations.Unwrap(args[0].Value)!.Syntax.ToString();
        var typeText = method.ContainingType.ToMinimalDisplayString(context.Operation.SemanticModel!, context.Operation.Syntax.SpanStart);
        var fixes = new List<(string, string)>();
        if (method.ContainingType.GetMembers("FromRadiansPerSecond").Any())
        {
            fixes.Add(("Build it from rad/s: " + typeText + ".FromRadiansPerSecond", typeText + ".FromRadiansPerSecond(" + expr + ")"));
        }

        var call = context.Operation.Syntax.ToString();
        var argSpan = args[0].Syntax.Span;
        var start = context.Operation.Syntax.SpanStart;
        fixes.Add(("Divide by 2π", call.Substring(0, argSpan.Start - start) + expr + " / (2 * Math.PI)" + call.Substring(argSpan.End - start)));
        context.ReportDiagnostic(Diagnostic.Create(Rule, args[0].Syntax.GetLocation(), new[] { context.Operation.Syntax.GetLocation() },
            Fixes.Of(fixes.ToArray()), expr, "a frequency"));
    }

    private static void CheckNamed(OperationAnalysisContext context, IOperation? value, string? name)
    {
        if (value is null || name is null || NameUnits.Read(name) is not { Quantity.Name: "Frequency" } said
            || said.Unit?.Symbol == "rad/s" || !IsAngular(value))
        {
            return;
        }

        var expr = Operations.Unwrap(value)!.Syntax;
        context.ReportDiagnostic(Diagnostic.Create(Rule, expr.GetLocation(),
            Fixes.Of(("Divide by 2π", expr + " / (2 * Math.PI)")), expr.ToString(), "'" + name + "'"));
    }

    // 1/(…R…C…), 1/√(…C…) or √(1/(…C…)) with no 2π among the factors.
    private static bool IsAngular(IOperation value)
    {
        var op = Operations.Unwrap(value);
        if (IsSqrt(op, out var radicand) && IsReciprocal(radicand, out var inner))
        {
            return HasCapacitanceAndNoPi(inner, needResistance: false);
        }

        if (!IsReciprocal(op, out var denominator))
        {
            return false;
        }

        return IsSqrt(Operations.Unwrap(denominator), out var under)
            ? HasCapacitanceAndNoPi(under, needResistance: false)
            : HasCapacitanceAndNoPi(denominator, needResistance: true);
    }

    private static bool IsReciprocal(IOperation? op, out IOperation denominator)
    {
        denominator = null!;
        if (Operations.Unwrap(op) is IBinaryOperation { OperatorKind: BinaryOperatorKind.Divide, OperatorMethod: null } b
            && Operations.Constant(b.LeftOperand) == 1)
        {
            denominator = b.RightOperand;
            return true;
        }

        return false;
    }

    private static bool IsSqrt(IOperation? op, out IOperation radicand)
    {
        radicand = null!;
        if (op is IInvocationOperation { TargetMethod.Name: "Sqrt", Arguments.Length: 1 } call
            && call.TargetMethod.ContainingType?.ToDisplayString() is "System.Math" or "System.MathF")
        {
            radicand = call.Arguments[0].Value;
            return true;
        }

        return false;
    }

    private static bool HasCapacitanceAndNoPi(IOperation product, bool needResistance)
    {
        var factors = new List<IOperation>();
        Factors(product, factors);
        if (factors.Any(IsPi))
        {
            return false;
        }

        var dims = factors.Select(f => Operations.DimensionOf(f)?.Quantity.Name).ToList();
        return dims.Contains("Capacitance") && (!needResistance || dims.Contains("Resistance"));
    }

    private static void Factors(IOperation op, List<IOperation> into)
    {
        var u = Operations.Unwrap(op)!;
        if (u is IBinaryOperation { OperatorKind: BinaryOperatorKind.Multiply, OperatorMethod: null } b)
        {
            Factors(b.LeftOperand, into);
            Factors(b.RightOperand, into);
        }
        else
        {
            into.Add(u);
        }
    }

    // π or 2π as a constant (Math.PI, Math.Tau, 6.2832…) or a name that says it (TwoPi, tau).
    private static bool IsPi(IOperation op)
    {
        if (Operations.Constant(op) is { } v && (Math.Abs(v - Math.PI) < 1e-3 || Math.Abs(v - 2 * Math.PI) < 2e-3))
        {
            return true;
        }

        var name = Operations.ReferencedName(op);
        return name is not null && (name.IndexOf("pi", StringComparison.OrdinalIgnoreCase) >= 0 || name.IndexOf("tau", StringComparison.OrdinalIgnoreCase) >= 0);
    }
}
