using System.Collections.Immutable;
using SpecLint.Core.Analysis;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;

namespace SpecLint.Core.Spec;

/// <summary>
/// A channel with more than one gain is checked as one view per setting (references.md §D7): each view is an
/// ordinary spec whose feedback, signal range and requirements are that setting's, and whose keys locate at the
/// setting's own lines. A single-gain spec is its own only view.
/// </summary>
internal static class GainViews
{
    /// <summary>Every view of <paramref name="spec"/>: one per switched setting, the searched positions of an adjustable Rf, or the spec itself.</summary>
    public static IReadOnlyList<TiaSpec> All(TiaSpec spec)
    {
        ArgumentNullException.ThrowIfNull(spec);
        var channel = spec.Channel ?? spec;
        if (!channel.Feedback.Settings.IsDefaultOrEmpty)
        {
            return [.. Enumerable.Range(0, channel.Feedback.Settings.Length).Select(i => Select(channel, i))];
        }

        if (channel.Feedback.Adjustable is not null)
        {
            return [.. AdjustableSearch.Positions(channel).Select(p => At(channel, p.Element, p.Label))];
        }

        return [spec];
    }

    /// <summary>The view of switched setting <paramref name="index"/>.</summary>
    public static TiaSpec Select(TiaSpec spec, int index)
    {
        var channel = spec.Channel ?? spec;
        var s = channel.Feedback.Settings[index];
        var aliases = new List<(string View, string File)>
        {
            ("/feedback/resistance", s.Pointer + "/resistance"),
            ("/feedback/capacitance", s.Pointer + "/capacitance"),
            ("/feedback/dielectric", s.Pointer + "/dielectric"),
            ("/feedback/parasitic-capacitance", s.Pointer + "/parasitic-capacitance"),
        };
        if (s.CurrentMin is not null || s.CurrentMax is not null)
        {
            aliases.Add(("/input/current", s.Pointer + "/input/current"));
        }

        var r = s.Requirements;
        if (r is not null)
        {
            foreach (var (key, given) in new[] { ("bandwidth", r.Bandwidth is not null), ("phase-margin", r.PhaseMargin is not null), ("peaking", r.PeakingDb is not null), ("noise", r.Noise is not null) })
            {
                if (given)
                {
                    aliases.Add(("/requirements/" + key, s.Pointer + "/requirements/" + key));
                }
            }
        }

        aliases.Add(("/feedback", s.Pointer));
        var fb = channel.Feedback with
        {
            Resistance = s.Resistance,
            Capacitance = s.Capacitance,
            Dielectric = s.Dielectric,
            ParasiticCapacitance = s.ParasiticCapacitance,
        };
        var input = channel.Input with
        {
            CurrentMin = s.CurrentMin ?? channel.Input.CurrentMin,
            CurrentMax = s.CurrentMax ?? channel.Input.CurrentMax,
        };
        return channel with
        {
            Feedback = fb,
            Input = input,
            Requirements = Merge(channel.Requirements, r),
            Setting = s.Name,
            SettingPointers = [.. aliases],
            Locations = channel.Locations.WithAliases(aliases),
            Channel = channel,
        };
    }

    /// <summary>The view of an adjustable Rf at one position of its element.</summary>
    public static TiaSpec At(TiaSpec channel, Resistance element, string label)
    {
        var a = channel.Feedback.Adjustable!;
        var w = a.WiperResistance.Ohms;
        var r = element.Ohms;
        var spread = a.Tolerance > 0
            ? new Spread<Resistance>(new Resistance(r + w), new Resistance((r * (1 - a.Tolerance)) + w), new Resistance((r * (1 + a.Tolerance)) + w), ToleranceForm.Relative)
            : Spread<Resistance>.Exact(new Resistance(r + w));
        return channel with
        {
            Feedback = channel.Feedback with { Resistance = spread },
            Setting = label,
            SettingPointers = [("/feedback/resistance", "/feedback/resistance/adjustable")],
            Locations = channel.Locations.WithAliases([("/feedback/resistance", "/feedback/resistance/adjustable")]),
            Channel = channel,
        };
    }

    /// <summary>The file's pointer for a key of a view (unchanged for a single-gain spec).</summary>
    public static string ToFilePointer(TiaSpec view, string pointer)
    {
        ArgumentNullException.ThrowIfNull(view);
        foreach (var (v, f) in view.SettingPointers)
        {
            if (pointer == v || (v != "/feedback" && pointer.StartsWith(v + "/", StringComparison.Ordinal)))
            {
                return f + pointer[v.Length..];
            }
        }

        return pointer;
    }

    private static Requirements Merge(Requirements channel, Requirements? setting)
    {
        if (setting is null)
        {
            return channel;
        }

        var noise = (channel.Noise, setting.Noise) switch
        {
            (null, var n) => n,
            (var n, null) => n,
            var (c, s) => new NoiseRequirement(s!.BandLow ?? c!.BandLow, s.BandHigh ?? c!.BandHigh, s.MaxInput ?? c!.MaxInput),
        };
        return new Requirements(
            setting.Bandwidth ?? channel.Bandwidth,
            setting.PhaseMargin ?? channel.PhaseMargin,
            setting.PeakingDb ?? channel.PeakingDb,
            noise);
    }
}
