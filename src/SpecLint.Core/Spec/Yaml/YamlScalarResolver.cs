using System.Globalization;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;

namespace SpecLint.Core.Spec.Yaml;

/// <summary>
/// Types plain scalars by the YAML 1.2 core schema. YAML 1.1 spellings such as <c>yes</c>, <c>on</c> or
/// <c>0777</c> octal stay text, and infinities and NaN are refused because no spec value may be one.
/// </summary>
internal static partial class YamlScalarResolver
{
    /// <summary>
    /// No bare number in a spec or configuration is anywhere near this; beyond it the schema library's exact
    /// (decimal) comparison fails, so larger values are refused here with a message instead.
    /// </summary>
    private const double LargestNumber = 1e28;

    [GeneratedRegex(@"^[-+]?[0-9]+$", RegexOptions.CultureInvariant)]
    private static partial Regex IntRegex();

    [GeneratedRegex(@"^0o[0-7]+$", RegexOptions.CultureInvariant)]
    private static partial Regex OctalRegex();

    [GeneratedRegex(@"^0x[0-9a-fA-F]+$", RegexOptions.CultureInvariant)]
    private static partial Regex HexRegex();

    [GeneratedRegex(@"^[-+]?(\.[0-9]+|[0-9]+(\.[0-9]*)?)([eE][-+]?[0-9]+)?$", RegexOptions.CultureInvariant)]
    private static partial Regex FloatRegex();

    [GeneratedRegex(@"^([-+]?\.(inf|Inf|INF)|\.nan|\.NaN|\.NAN)$", RegexOptions.CultureInvariant)]
    private static partial Regex SpecialFloatRegex();

    /// <summary>Resolves a plain scalar; returns false with a message for the values the core schema has but specs refuse.</summary>
    public static bool TryResolvePlain(string text, out JsonNode? value, out string? error)
    {
        error = null;
        value = null;
        switch (text)
        {
            case "" or "~" or "null" or "Null" or "NULL":
                return true;
            case "true" or "True" or "TRUE":
                value = JsonValue.Create(true);
                return true;
            case "false" or "False" or "FALSE":
                value = JsonValue.Create(false);
                return true;
        }

        if (IntRegex().IsMatch(text) && text.TrimStart('+', '-').TrimStart('0').Length > 28)
        {
            error = $"\"{text}\" is too large a number";
            return false;
        }

        if (IntRegex().IsMatch(text))
        {
            value = long.TryParse(text, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var l)
                ? JsonValue.Create(l)
                : JsonValue.Create(double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture));
            return true;
        }

        if (OctalRegex().IsMatch(text) || HexRegex().IsMatch(text))
        {
            var isHex = text[1] == 'x';
            try
            {
                value = JsonValue.Create(Convert.ToInt64(text[2..], isHex ? 16 : 8));
                return true;
            }
            catch (OverflowException)
            {
                error = $"\"{text}\" is too large a number";
                return false;
            }
        }

        if (FloatRegex().IsMatch(text))
        {
            var d = double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);
            if (double.IsInfinity(d) || Math.Abs(d) > LargestNumber)
            {
                error = $"\"{text}\" is too large a number";
                return false;
            }

            value = JsonValue.Create(d);
            return true;
        }

        if (SpecialFloatRegex().IsMatch(text))
        {
            error = $"\"{text}\" is not a finite number; a spec value must be finite, e.g. \"10 MHz\"";
            return false;
        }

        value = JsonValue.Create(text);
        return true;
    }
}
