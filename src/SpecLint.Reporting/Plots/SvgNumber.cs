using System.Globalization;

namespace SpecLint.Reporting.Plots;

/// <summary>Fixed-decimal, culture-free numbers for SVG attributes, so equal charts are equal bytes.</summary>
internal static class SvgNumber
{
    public static string Px(double v)
    {
        var text = v.ToString("F1", CultureInfo.InvariantCulture);
        return text == "-0.0" ? "0.0" : text;
    }
}
