using System.Text.Json;
using System.Text.Json.Nodes;

namespace SpecLint.Core.Spec.Schema.Quick;

/// <summary>Node kinds and values as the quick check reads them from the YAML tree.</summary>
internal static class QuickKinds
{
    // Whole numbers up to 2^53 print and parse the same everywhere; larger ones are left to the library.
    private const double LargestSafeWhole = 9007199254740992;

    public static QuickKind Of(JsonNode? node)
    {
        switch (node)
        {
            case null:
                return QuickKind.Null;
            case JsonObject:
                return QuickKind.Object;
            case JsonArray:
                return QuickKind.Array;
            case JsonValue v:
                switch (v.GetValueKind())
                {
                    case JsonValueKind.String:
                        return QuickKind.String;
                    case JsonValueKind.True or JsonValueKind.False:
                        return QuickKind.Boolean;
                    case JsonValueKind.Number:
                        if (v.TryGetValue<long>(out var whole))
                        {
                            return Math.Abs((double)whole) < LargestSafeWhole ? QuickKind.Integer : QuickKind.Unsure;
                        }

                        if (v.TryGetValue<double>(out var d) && double.IsFinite(d) && Math.Abs(d) < LargestSafeWhole)
                        {
                            return Math.Floor(d) == d ? QuickKind.Integer : QuickKind.Number;
                        }

                        return QuickKind.Unsure;
                    default:
                        return QuickKind.Unsure;
                }

            default:
                return QuickKind.Unsure;
        }
    }

    /// <summary>The value of a node that <see cref="Of"/> called a number.</summary>
    public static double Number(JsonNode node) =>
        node.AsValue().TryGetValue<long>(out var whole) ? whole : node.AsValue().GetValue<double>();

    /// <summary>True when the list's entries are all text and all different; anything else is left to the library.</summary>
    public static bool CertainlyDistinct(JsonArray list)
    {
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var item in list)
        {
            if (Of(item) != QuickKind.String || !seen.Add(item!.GetValue<string>()))
            {
                return false;
            }
        }

        return true;
    }
}
