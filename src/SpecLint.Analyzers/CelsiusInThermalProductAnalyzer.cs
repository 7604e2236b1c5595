using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Operations;
using SpecLint.Analyzers.Units;

namespace SpecLint.Analyzers;

/// <summary>
/// Flags a Celsius reading multiplied with the Boltzmann constant (<c>k * t.Celsius</c>): kT and
/// 4kTR need absolute temperature, so 25 °C would give a noise power about twelve times too small.
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class CelsiusInThermalProductAnalyzer : DiagnosticAnalyzer
{
    // k = 1.380649e-23 J/K (exact since the 2019 SI); a literal within 0.1 % of it is taken as k.
    private const double Boltzmann = 1.380649e-23;

    internal static readonly DiagnosticDescriptor Rule = Descriptors.Warning(
        DiagnosticIds.CelsiusInThermalProduct,
        "Celsius temperature in a kT product",
        "'{0}' is in °C, but a product with the Boltzmann constant needs kelvin",
        "Thermal noise and the thermal voltage use absolute temperature. A Celsius figure in kT understates the noise power by (T + 273.15)/T and is zero or negative near 0 °C.");

    /// <inheritdoc />
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics => ImmutableArray.Create(Rule);

    /// <inheritdoc />
    public override void Initialize(AnalysisContext context)
    {
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.None);
        context.EnableConcurrentExecution();
        context.RegisterOperationAction(Check, OperationKind.PropertyReference);
    }

    private static void Check(OperationAnalysisContext context)
    {
        if (Reading.Of(context.Operation) is not { Unit.Symbol: "°C", Quantity.Name: "Temperature" } reading)
        {
            return;
        }

        // Climb to the top of the product (a·b/c·…) the reading sits in, then look at every factor.
        IOperation top = context.Operation;
        while (top.Parent is IConversionOperation or IBinaryOperation { OperatorKind: BinaryOperatorKind.Multiply or BinaryOperatorKind.Divide, OperatorMethod: null })
        {
            top = top.Parent;
        }

        var factors = new List<IOperation>();
        Factors(top, factors);
        foreach (var f in factors)
        {
            if (IsBoltzmann(f))
            {
                context.ReportDiagnostic(Diagnostic.Create(Rule, reading.Property.Syntax.GetLocation(),
                    new[] { reading.AccessorLocation }, Fixes.Of(("Use kelvin: .Kelvin", "Kelvin")), reading.Text));
                return;
            }
        }
    }

    private static void Factors(IOperation op, List<IOperation> into)
    {
        var u = Operations.Unwrap(op)!;
        if (u is IBinaryOperation { OperatorKind: BinaryOperatorKind.Multiply or BinaryOperatorKind.Divide, OperatorMethod: null } b)
        {
            Factors(b.LeftOperand, into);
            Factors(b.RightOperand, into);
        }
        else
        {
            into.Add(u);
        }
    }

    private static bool IsBoltzmann(IOperation op)
    {
        if (Operations.Constant(op) is { } v && Math.Abs(v / Boltzmann - 1) < 1e-3)
        {
            return true;
        }

        var name = Operations.ReferencedName(op);
        return name is not null && (name.IndexOf("boltzmann", StringComparison.OrdinalIgnoreCase) >= 0
            || name == "kB" || name == "k_B" || name == "KB" || name == "kb");
    }
}
