using System.Globalization;

namespace LarkspurTarn.HouseRules;

/// <summary>The weakest signal the channel must resolve has to stand clear of the noise in the band.</summary>
public sealed class SnrAtMinimumBelowFloorRule : IRule
{
    public static readonly RuleOption Min = new("min", Dimension.Gain, "20 dB", "Smallest signal-to-noise ratio at input.current.min");

    public RuleDescriptor Descriptor { get; } = new(
        "snr-at-minimum", "The smallest signal current stands at least 20 dB above the input noise in the band", Severity.Warning, [Min]);

    public IEnumerable<Finding> Check(RuleContext context)
    {
        if (context.Analysis.Noise is not { SnrAtMinimumDb: { } snr } noise)
        {
            yield break;
        }

        var min = context.Option<Gain>(Min.Key);
        if (snr >= min.Decibels)
        {
            yield break;
        }

        yield return context.Report("/input/current/min", string.Create(CultureInfo.InvariantCulture,
            $"the smallest signal is {snr:0.#} dB above the {Fmt.Q(noise.InputRms)} rms input noise in {Fmt.Hz(noise.BandLow)} .. {Fmt.Hz(noise.BandHigh)}, below the team's {min.Decibels:0.#} dB; narrow the band, raise Rf or choose a quieter op-amp"));
    }
}
