using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Operations;

namespace SpecLint.Analyzers.Units;

/// <summary>A raw double read from a quantity in one unit, e.g. <c>cf.Farads</c>.</summary>
internal sealed class Reading
{
    private Reading(IPropertyReferenceOperation property, QuantityDef quantity, UnitDef unit)
    {
        Property = property;
        Quantity = quantity;
        Unit = unit;
    }

    public IPropertyReferenceOperation Property { get; }

    public QuantityDef Quantity { get; }

    public UnitDef Unit { get; }

    /// <summary>The text a message shows, e.g. "cf.Farads".</summary>
    public string Text => Property.Syntax.ToString();

    /// <summary>Where the accessor's name is: the span an accessor fix replaces.</summary>
    public Location AccessorLocation =>
        (Property.Syntax as MemberAccessExpressionSyntax)?.Name.GetLocation() ?? Property.Syntax.GetLocation();

    /// <summary>The reading the operation is, looking through conversions and parentheses; else null.</summary>
    public static Reading? Of(IOperation? operation)
    {
        var op = Operations.Unwrap(operation);
        if (op is not IPropertyReferenceOperation p || p.Instance is null)
        {
            return null;
        }

        var q = UnitCatalog.Of(p.Property.ContainingType);
        var u = q?.ByAccessor(p.Property.Name);
        return q is null || u is null ? null : new Reading(p, q, u);
    }
}
