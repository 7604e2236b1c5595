using System.Globalization;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Fixes;

namespace SpecLint.Rules.BuiltIn;

/// <summary>Flags an op-amp that cannot slew a full-scale step at the channel's bandwidth (needs 2π·f·ΔV).</summary>
public sealed class SlewRateTooLowRule : IRule
{
    /// <summary>The descriptor.</summary>
    public static RuleDescriptor Info { get; } = new(
        "slew-rate", "The op-amp can slew a full-scale output at the channel's bandwidth", Severity.Warning);

    /// <inheritdoc />
    public RuleDescriptor Descriptor => Info;

    /// <inheritdoc />
    public IEnumerable<Finding> Check(RuleContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var spec = context.Spec;
        if (spec.Amplifier.SlewRate is not { } sr)
        {
            yield break;
        }

        var bandwidth = spec.Requirements.Bandwidth ?? context.Analysis.Bandwidth;
        if (bandwidth is not { } f)
        {
            yield break;
        }

        var o = context.Analysis.Output;
        var swing = Math.Abs(o.FullScale.Volts - o.Idle.Volts);
        var needed = new SlewRate(2 * Math.PI * f.Hertz * swing);
        if (sr >= needed)
        {
            yield break;
        }

        var which = spec.Requirements.Bandwidth is null ? "computed" : "required";
        yield return context.Report("/amplifier/slew-rate", string.Create(CultureInfo.InvariantCulture,
            $"a full-scale step of {Fmt.Q(new Voltage(swing))} at the {which} {Fmt.Hz(f)} bandwidth needs {Fmt.Q(needed)} (2π·f·ΔV); the op-amp slews {Fmt.Q(sr)}, so large steps are slew-limited and slower than small ones. Use an op-amp with at least {Fmt.Q(needed)}, or reduce the full-scale swing."));
    }
}
