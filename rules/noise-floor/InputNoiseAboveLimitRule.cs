using System.Globalization;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Fixes;

namespace SpecLint.Rules.BuiltIn;

/// <summary>Flags input-referred rms noise over the band above <c>requirements.noise.max-input</c>.</summary>
public sealed class InputNoiseAboveLimitRule : IRule
{
    /// <summary>The descriptor.</summary>
    public static RuleDescriptor Info { get; } = new(
        "noise-floor", "Input-referred rms noise over the band stays under requirements.noise.max-input", Severity.Error);

    /// <inheritdoc />
    public RuleDescriptor Descriptor => Info;

    /// <inheritdoc />
    public IEnumerable<Finding> Check(RuleContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        if (context.Spec.Requirements.Noise?.MaxInput is not { } limit || context.Analysis.Noise is not { } n)
        {
            yield break;
        }

        if (n.InputRms <= limit)
        {
            yield break;
        }

        var o = n.Output;
        var total = o.Total.Volts * o.Total.Volts;
        var sources = new (string Name, Voltage V)[]
        {
            ("Rf thermal", o.RfThermal), ("shunt-resistance thermal", o.RshThermal), ("shot", o.Shot),
            ("op-amp current noise", o.CurrentNoise), ("op-amp voltage noise × noise gain", o.VoltageNoise),
        };
        var ranked = sources.Where(s => s.V.Volts > 0).OrderByDescending(s => s.V.Volts).Take(2)
            .Select(s => string.Create(CultureInfo.InvariantCulture, $"{s.Name} {100 * s.V.Volts * s.V.Volts / total:0}%"));
        yield return context.Report("/requirements/noise/max-input", string.Create(CultureInfo.InvariantCulture,
            $"input-referred noise is {Fmt.Q(n.InputRms)} rms over {Fmt.Hz(n.BandLow)} .. {Fmt.Hz(n.BandHigh)} at {n.Temperature.Celsius:0.#} °C, above the {Fmt.Q(limit)} limit. Largest shares of the output noise power: {string.Join(", ", ranked)}. ")
            + Advice(sources.OrderByDescending(s => s.V.Volts).First().Name));
    }

    private static string Advice(string dominant) => dominant switch
    {
        "Rf thermal" => "Rf's noise dominates: a larger Rf lowers the input-referred noise (its current noise falls as 1/√Rf), within the headroom.",
        "shot" => "the shot noise of the signal and dark current dominates: the channel is at the physical limit for this band; narrow the band or lower the dark current.",
        "op-amp voltage noise × noise gain" => "the op-amp's voltage noise, multiplied by 1 + Cin/Cf at high frequency, dominates: reduce the input capacitance, narrow the band, or use a lower-noise op-amp.",
        "op-amp current noise" => "the op-amp's current noise dominates: use an op-amp with a lower input current noise (a FET input).",
        _ => "the sensor's shunt resistance dominates: a sensor with a higher shunt resistance, or cooling it, lowers the noise.",
    };
}
