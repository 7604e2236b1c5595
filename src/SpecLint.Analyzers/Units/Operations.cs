using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace SpecLint.Analyzers.Units;

/// <summary>Small helpers over IOperation shared by the analyzers.</summary>
internal static class Operations
{
    /// <summary>Looks through implicit/explicit numeric conversions and parentheses.</summary>
    public static IOperation? Unwrap(IOperation? op)
    {
        while (true)
        {
            switch (op)
            {
                case IConversionOperation c when c.Conversion.IsNumeric || c.Conversion.IsIdentity:
                    op = c.Operand;
                    break;
                case IParenthesizedOperation p:
                    op = p.Operand;
                    break;
                default:
                    return op;
            }
        }
    }

    /// <summary>The numeric constant an operation folds to, if any.</summary>
    public static double? Constant(IOperation? op)
    {
        if (op is null)
        {
            return null;
        }

        var cv = op.ConstantValue;
        if (!cv.HasValue || cv.Value is null)
        {
            return null;
        }

        return cv.Value switch
        {
            double d => d,
            float f => f,
            int i => i,
            long l => l,
            decimal m => (double)m,
            _ => null,
        };
    }

    /// <summary>
    /// The dimension and, when known, the unit of a raw double: a reading, or a reading scaled by a
    /// constant (which keeps the dimension but loses the unit).
    /// </summary>
    public static (QuantityDef Quantity, UnitDef? Unit)? DimensionOf(IOperation? operation)
    {
        var op = Unwrap(operation);
        if (Reading.Of(op) is { } r)
        {
            return (r.Quantity, r.Unit);
        }

        switch (op)
        {
            case IUnaryOperation { OperatorKind: UnaryOperatorKind.Minus or UnaryOperatorKind.Plus } u:
                return DimensionOf(u.Operand);
            case IBinaryOperation { OperatorKind: BinaryOperatorKind.Multiply or BinaryOperatorKind.Divide, OperatorMethod: null } b:
                if (Constant(b.RightOperand) is not null)
                {
                    return DimensionOf(b.LeftOperand) is { } l ? (l.Quantity, null) : null;
                }

                if (b.OperatorKind == BinaryOperatorKind.Multiply && Constant(b.LeftOperand) is not null)
                {
                    return DimensionOf(b.RightOperand) is { } rr ? (rr.Quantity, null) : null;
                }

                return null;
            case IBinaryOperation { OperatorKind: BinaryOperatorKind.Add or BinaryOperatorKind.Subtract, OperatorMethod: null } s:
                // A sum keeps its operands' dimension (and unit, when both agree); a mixed sum is SLU0003's finding.
                var left = DimensionOf(s.LeftOperand);
                var right = DimensionOf(s.RightOperand);
                if (left is null || right is null || left.Value.Quantity != right.Value.Quantity)
                {
                    return null;
                }

                return (left.Value.Quantity, left.Value.Unit == right.Value.Unit ? left.Value.Unit : null);
            default:
                return null;
        }
    }

    /// <summary>The name of the local, parameter, field or property an operation refers to, else null.</summary>
    public static string? ReferencedName(IOperation? operation) => Unwrap(operation) switch
    {
        ILocalReferenceOperation l => l.Local.Name,
        IParameterReferenceOperation p => p.Parameter.Name,
        IFieldReferenceOperation f => f.Field.Name,
        IPropertyReferenceOperation pr when UnitCatalog.Of(pr.Property.ContainingType) is null => pr.Property.Name,
        _ => null,
    };

    public static bool IsComparison(BinaryOperatorKind k) => k is BinaryOperatorKind.LessThan or BinaryOperatorKind.LessThanOrEqual
        or BinaryOperatorKind.GreaterThan or BinaryOperatorKind.GreaterThanOrEqual or BinaryOperatorKind.Equals or BinaryOperatorKind.NotEquals;

    public static bool IsSumOrComparison(BinaryOperatorKind k) => k is BinaryOperatorKind.Add or BinaryOperatorKind.Subtract || IsComparison(k);
}
