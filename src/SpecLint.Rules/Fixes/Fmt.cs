using SpecLint.Core.Units;

namespace SpecLint.Rules.Fixes;

/// <summary>Short engineering formatting of figures inside rule messages (3 significant digits).</summary>
public static class Fmt
{
    /// <summary>A frequency such as "1.23 MHz", or "n/a".</summary>
    public static string Hz(Frequency? f) => f is { } v ? QuantityFormat.FormatRounded(v.Hertz, Dimension.Frequency) : "n/a";

    /// <summary>Any quantity to 3 significant digits.</summary>
    public static string Q<T>(T value)
        where T : struct, IQuantity<T> => QuantityFormat.FormatRounded(value.Si, T.Dimension);
}
