using System.Globalization;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Fixes;

namespace SpecLint.Rules.BuiltIn;

/// <summary>
/// Adds one safety caution per spec when any voltage on the board reaches the hazardous-voltage threshold:
/// a rail, the bias, or the difference between the rails or between the bias and either rail (±35 V rails
/// put 70 V across the board although neither rail reaches 60 V on its own).
/// </summary>
public sealed class HazardousVoltageRule : IRule
{
    /// <summary>The threshold.</summary>
    public static readonly RuleOption Threshold = new("threshold", Dimension.Voltage, "60 V", "voltage magnitude at or above which the caution is given");

    /// <summary>The descriptor.</summary>
    public static RuleDescriptor Info { get; } = new(
        "high-voltage", "A voltage on the board at or above the hazardous-voltage threshold gets a caution to follow local codes and licensed practice", Severity.Warning, [Threshold]);

    /// <inheritdoc />
    public RuleDescriptor Descriptor => Info;

    /// <inheritdoc />
    public IEnumerable<Finding> Check(RuleContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var spec = context.Spec;
        var limit = context.Option<Voltage>(Threshold.Key);
        var ground = Spread<Voltage>.Exact(Voltage.Zero);
        var nodes = new (string Pointer, string Name, Spread<Voltage> Value)[]
        {
            ("/conditions/supply/positive", "the positive rail", spec.Conditions.SupplyPositive),
            ("/conditions/supply/negative", "the negative rail", spec.Conditions.SupplyNegative),
            ("/bias", "the bias", spec.Bias),
        };
        var pairs = new (string Pointer, string Name, Spread<Voltage> A, Spread<Voltage> B)[]
        {
            (nodes[0].Pointer, "the positive rail to ground", nodes[0].Value, ground),
            (nodes[1].Pointer, "the negative rail to ground", nodes[1].Value, ground),
            (nodes[2].Pointer, "the bias to ground", nodes[2].Value, ground),
            (RailPointer(nodes[0], nodes[1]), "rail to rail", nodes[0].Value, nodes[1].Value),
            (nodes[2].Pointer, "the bias to the positive rail", nodes[2].Value, nodes[0].Value),
            (nodes[2].Pointer, "the bias to the negative rail", nodes[2].Value, nodes[1].Value),
        };
        // The largest difference over the tolerance range of both ends: the worst the board can see.
        var over = pairs
            .Select(p => (p.Pointer, p.Name, Volts: Math.Max(Math.Abs(p.A.Max.Volts - p.B.Min.Volts), Math.Abs(p.A.Min.Volts - p.B.Max.Volts))))
            .Where(p => p.Volts >= limit.Volts)
            .ToList();
        if (over.Count == 0)
        {
            yield break;
        }

        var worst = over.MaxBy(p => p.Volts);
        var list = string.Join(", ", over.Select(p => $"{p.Name} {Fmt.Q(new Voltage(p.Volts))}"));
        yield return context.Report(worst.Pointer, string.Create(CultureInfo.InvariantCulture,
            $"this board has voltages at or above {Fmt.Q(limit)} DC ({list}), the range equipment safety standards treat as hazardous. SpecLint checks the signal path only; have the high-voltage design (insulation, creepage and clearance, enclosure, interlocks, discharge) reviewed by a qualified person under local codes and licensed practice, and take care on the bench."));
    }

    // Between the rails, the finding points at the rail further from ground: the one a reviewer would change.
    private static string RailPointer((string Pointer, string Name, Spread<Voltage> Value) positive, (string Pointer, string Name, Spread<Voltage> Value) negative) =>
        Math.Abs(negative.Value.WorstMagnitude.Volts) > Math.Abs(positive.Value.WorstMagnitude.Volts) ? negative.Pointer : positive.Pointer;
}
