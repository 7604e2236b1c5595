using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Fixes;

namespace SpecLint.Rules.BuiltIn;

/// <summary>Adds a safety caution when a bias or supply is at or above the hazardous-voltage threshold.</summary>
public sealed class HazardousVoltageRule : IRule
{
    /// <summary>The threshold.</summary>
    public static readonly RuleOption Threshold = new("threshold", Dimension.Voltage, "60 V", "voltage magnitude at or above which the caution is given");

    /// <summary>The descriptor.</summary>
    public static RuleDescriptor Info { get; } = new(
        "high-voltage", "A bias or supply at a hazardous voltage gets a caution to follow local codes and licensed practice", Severity.Warning, [Threshold]);

    /// <inheritdoc />
    public RuleDescriptor Descriptor => Info;

    /// <inheritdoc />
    public IEnumerable<Finding> Check(RuleContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var spec = context.Spec;
        var limit = context.Option<Voltage>(Threshold.Key);
        var candidates = new (string Pointer, string Name, Spread<Voltage> Value)[]
        {
            ("/bias", "the bias voltage", spec.Bias),
            ("/conditions/supply/positive", "the positive supply", spec.Conditions.SupplyPositive),
            ("/conditions/supply/negative", "the negative supply", spec.Conditions.SupplyNegative),
        };
        foreach (var (pointer, name, value) in candidates)
        {
            var magnitude = new Voltage(Math.Max(Math.Abs(value.Min.Volts), Math.Abs(value.Max.Volts)));
            if (magnitude >= limit)
            {
                yield return context.Report(pointer,
                    $"{name} reaches {Fmt.Q(magnitude)}, at or above {Fmt.Q(limit)} DC: this is a hazardous voltage. SpecLint checks the signal path only; have the high-voltage design (insulation, creepage and clearance, enclosure, interlocks, discharge) reviewed by a qualified person under local codes and licensed practice, and take care on the bench.");
            }
        }
    }
}
