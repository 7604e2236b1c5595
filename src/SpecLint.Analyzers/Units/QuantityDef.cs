using System.Collections.Immutable;

namespace SpecLint.Analyzers.Units;

/// <summary>What the analyzers know about one quantity type of SpecLint.Core.Units.</summary>
internal sealed class QuantityDef
{
    public QuantityDef(string name, double plausibleMin, double plausibleMax, ImmutableArray<UnitDef> units, ImmutableArray<string> fixOrder)
    {
        Name = name;
        PlausibleMin = plausibleMin;
        PlausibleMax = plausibleMax;
        Units = units;
        FixOrder = fixOrder;
    }

    /// <summary>The type name, which is also its dimension's name (the Dimension enum uses the same names).</summary>
    public string Name { get; }

    /// <summary>Smallest SI magnitude that a real part or signal in a receiver front end has (0 means: no check).</summary>
    public double PlausibleMin { get; }

    /// <summary>Largest plausible SI magnitude.</summary>
    public double PlausibleMax { get; }

    /// <summary>Units; the first is the SI unit that the constructor, FromSi and Si use.</summary>
    public ImmutableArray<UnitDef> Units { get; }

    /// <summary>Factories a fix offers for an implausible literal, most usual first.</summary>
    public ImmutableArray<string> FixOrder { get; }

    public UnitDef SiUnit => Units[0];

    /// <summary>The dimension in words for messages: "voltage noise density".</summary>
    public string Words => System.Text.RegularExpressions.Regex.Replace(Name, "(?<=[a-z])(?=[A-Z])", " ").ToLowerInvariant();

    /// <summary>The dimension with its article: "an angle", "a capacitance".</summary>
    public string WithArticle => ("aeiou".IndexOf(char.ToLowerInvariant(Name[0])) >= 0 ? "an " : "a ") + Words;

    public bool ChecksMagnitude => PlausibleMax > 0;

    public bool IsPlausible(double si)
    {
        var m = System.Math.Abs(si);
        return m == 0 || (m >= PlausibleMin && m <= PlausibleMax);
    }

    public UnitDef? ByAccessor(string name)
    {
        if (name == "Si")
        {
            return SiUnit;
        }

        foreach (var u in Units)
        {
            if (u.Accessor == name)
            {
                return u;
            }
        }

        return null;
    }

    public UnitDef? ByFactory(string name)
    {
        if (name == "FromSi")
        {
            return SiUnit;
        }

        foreach (var u in Units)
        {
            if (u.Factory == name)
            {
                return u;
            }
        }

        return null;
    }

    public UnitDef? BySymbol(string symbol)
    {
        foreach (var u in Units)
        {
            if (u.Symbol == symbol)
            {
                return u;
            }
        }

        return null;
    }
}
