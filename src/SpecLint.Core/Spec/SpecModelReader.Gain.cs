using System.Collections.Immutable;
using System.Globalization;
using System.Text.Json.Nodes;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Spec.Yaml;
using SpecLint.Core.Units;

namespace SpecLint.Core.Spec;

/// <summary>The keys of channels with more than one gain (references.md §D7), and the requirements block they share.</summary>
internal sealed partial class SpecModelReader
{
    // A real part's tolerance: beyond ±50 % or a max/min ratio of 3 a spread is a range of settings, not a tolerance.
    private const double WidestTolerance = 0.5;
    private const double WidestRatio = 3;

    private enum PartKind
    {
        FeedbackResistor,
        FeedbackCapacitor,
        Sensor,
        Amplifier,
    }

    private Spread<Resistance>? FeedbackResistance(string pointer) =>
        SpreadOf<Resistance>(pointer, (p, q) =>
        {
            CheckPositive(p, q, "the feedback resistance", "1 MΩ ±1%");
            CheckPartSpread(p, q, "the feedback resistance", PartKind.FeedbackResistor);
        });

    private Spread<Capacitance>? FeedbackCapacitance(string pointer) =>
        SpreadOf<Capacitance>(pointer, (p, q) =>
        {
            CheckCapacitance(p, q, "the feedback capacitance", inFeedback: true);
            CheckPartSpread(p, q, "the feedback capacitance", PartKind.FeedbackCapacitor);
        });

    /// <summary>A spread wider than any real part's tolerance is a set of gains written as a tolerance: refused, with the way to write it.</summary>
    private void CheckPartSpread(string pointer, ParsedQuantity q, string what, PartKind kind)
    {
        if (q.Form == ToleranceForm.None || q.Typ <= 0 || q.Min <= 0)
        {
            return;
        }

        var ratio = q.Max / q.Min;
        var relative = Math.Max(Math.Abs((q.Min / q.Typ) - 1), Math.Abs((q.Max / q.Typ) - 1));
        if (ratio <= WidestRatio * (1 + 1e-12) && relative <= WidestTolerance * (1 + 1e-12))
        {
            return;
        }

        var spread = ratio > WidestRatio
            ? $"spans a factor of {ratio.ToString("0.###", CultureInfo.InvariantCulture)} ({Format(q.Min, q.Dimension)} .. {Format(q.Max, q.Dimension)})"
            : $"is a ±{(relative * 100).ToString("0.#", CultureInfo.InvariantCulture)} % spread";
        var low = Format(q.Min, q.Dimension);
        var high = Format(q.Max, q.Dimension);
        var how = kind switch
        {
            PartKind.FeedbackResistor =>
                $"if a potentiometer sets it, write \"resistance: {{ adjustable: {low} .. {high} }}\"; if a switch selects resistors, list each one under feedback.settings",
            PartKind.FeedbackCapacitor =>
                "if a switch selects capacitors, list each setting with its own Rf and Cf under feedback.settings",
            PartKind.Sensor =>
                "write the part's own tolerance, and check each sensor variant as a spec of its own",
            _ =>
                "write the datasheet's own spread, and check each op-amp choice as a spec of its own",
        };
        sink.AtValue(pointer, $"{Written(pointer)} {spread}, wider than any real part's tolerance (at most ±50 %, or max/min 3), so {what} cannot be read as one part; {how}");
    }

    private Spread<Resistance>? SeriesResistance(SensorType type)
    {
        const string pointer = "/input/series-resistance";
        var rs = SpreadOf<Resistance>(pointer, (p, q) =>
        {
            CheckNonNegative(p, q, "the series resistance");
            CheckPartSpread(p, q, "the series resistance", PartKind.Sensor);
        });
        if (rs is not null && type != SensorType.Electrode)
        {
            sink.AtValue(pointer, "series-resistance is an electrode's access resistance; write \"type: electrode\", or leave the key out");
            return null;
        }

        return rs;
    }

    private ImmutableArray<GainSetting> Settings()
    {
        const string at = "/feedback/settings";
        if (!Has(at) || Node(at) is not JsonArray items)
        {
            return [];
        }

        var list = ImmutableArray.CreateBuilder<GainSetting>();
        var names = new HashSet<string>(StringComparer.Ordinal);
        for (var i = 0; i < items.Count; i++)
        {
            var p = JsonPointerText.Append(at, i);
            var name = Str(p + "/name");
            if (name is not null && !names.Add(name))
            {
                sink.AtValue(p + "/name", $"a second setting is named '{name}'; give each setting its own name");
            }

            var rf = FeedbackResistance(p + "/resistance");
            var cf = FeedbackCapacitance(p + "/capacitance");
            var cpar = SpreadOf<Capacitance>(p + "/parasitic-capacitance", (k, q) => CheckCapacitance(k, q, "the parasitic capacitance", inFeedback: true));
            var dielectric = Str(p + "/dielectric");
            var min = SingleOf<Current>(p + "/input/current/min", (k, q) => CheckNonNegative(k, q, "the smallest signal current"));
            var max = SingleOf<Current>(p + "/input/current/max", (k, q) => CheckPositive(k, q, "the full-scale current", "200 nA"));
            if (min is { } lo && max is { } hi && lo.Si > hi.Si)
            {
                sink.AtValue(p + "/input/current/min", $"min ({Show(lo)}) is above max ({Show(hi)}); min is the smallest signal to resolve, max the full scale");
            }

            var requirements = Has(p + "/requirements") ? ReadRequirements(p + "/requirements") : null;
            if (name is not null && rf is { } r)
            {
                list.Add(new GainSetting(name, r, cf, dielectric, cpar ?? Spread<Capacitance>.Exact(Capacitance.Zero), min, max, requirements, p));
            }
        }

        return list.ToImmutable();
    }

    private GainSwitch? Switch(ImmutableArray<GainSetting> settings)
    {
        const string at = "/feedback/switch";
        if (!Has(at))
        {
            return null;
        }

        var ron = SingleOf<Resistance>(at + "/on-resistance", (p, q) => CheckNonNegative(p, q, "the on-resistance"));
        var coff = SingleOf<Capacitance>(at + "/off-capacitance", (p, q) => CheckCapacitance(p, q, "the off-capacitance", inFeedback: false));
        if (settings.IsDefaultOrEmpty && !Has("/feedback/settings"))
        {
            sink.AtValue(at, "a gain switch selects between settings; list them under feedback.settings, or leave the switch out");
            return null;
        }

        return ron is { } r && coff is { } c ? new GainSwitch(r, c) : null;
    }

    private AdjustableResistance? Adjustable()
    {
        const string at = "/feedback/resistance";
        if (!Has(at) || Node(at) is not JsonObject o)
        {
            return null;
        }

        var keys = o.Select(kv => kv.Key).ToList();
        var hasAdjustable = keys.Contains("adjustable");
        var adjustableOnly = keys.Where(k => k is "steps" or "wiper-resistance" or "tolerance").ToList();
        if (!hasAdjustable)
        {
            foreach (var k in adjustableOnly)
            {
                sink.AtValue(JsonPointerText.Append(at, k), $"'{k}' belongs to an adjustable resistance; add \"adjustable: low .. high\", or leave it out");
            }

            if (!keys.Contains("min") || !keys.Contains("max"))
            {
                sink.AtValue(at, "write a resistance as \"1 MΩ ±1%\", as { min, typ, max }, or as { adjustable: 10 kΩ .. 1 MΩ } for a potentiometer");
            }

            return null;
        }

        foreach (var k in keys.Where(k => k is "min" or "typ" or "max"))
        {
            sink.AtValue(JsonPointerText.Append(at, k), "an adjustable resistance takes its range from 'adjustable'; give its own tolerance as 'tolerance', not min/typ/max");
        }

        var range = Parse(at + "/adjustable", Dimension.Resistance, single: false);
        if (range is null || !Finite(at + "/adjustable", range))
        {
            return null;
        }

        if (range.Form != ToleranceForm.Range || !(range.Min > 0) || !(range.Max > range.Min))
        {
            sink.AtValue(at + "/adjustable", "the adjustment range runs from the lowest to the highest setting; write e.g. \"10 kΩ .. 1 MΩ\"");
            return null;
        }

        if (!WithinLimits(at + "/adjustable", range))
        {
            return null;
        }

        var steps = Int(at + "/steps");
        var wiper = SingleOf<Resistance>(at + "/wiper-resistance", (p, q) => CheckNonNegative(p, q, "the wiper resistance"));
        var tolerance = ElementTolerance(at + "/tolerance");
        return new AdjustableResistance(Resistance.FromSi(range.Min), Resistance.FromSi(range.Max), steps, wiper ?? Resistance.Zero, tolerance ?? 0);
    }

    /// <summary>The element's tolerance: "±20%", "20 %" or a bare number of percent.</summary>
    private double? ElementTolerance(string pointer)
    {
        if (!Has(pointer) || !tree.ScalarText.TryGetValue(pointer, out var text))
        {
            return null;
        }

        var trimmed = text.Trim().TrimStart('±', '+').Trim();
        try
        {
            var q = QuantityParser.Parse(trimmed.EndsWith('%') ? trimmed : trimmed + " %", Dimension.Ratio);
            if (q.Form == ToleranceForm.None && q.Typ >= 0 && q.Typ <= WidestTolerance)
            {
                return q.Typ;
            }
        }
        catch (QuantityParseException)
        {
        }

        sink.AtValue(pointer, $"\"{text.Trim()}\" is not an element tolerance; write a percentage between 0 % and 50 %, e.g. \"±20%\"");
        return null;
    }

    private static Spread<Resistance> AdjustableStart(AdjustableResistance? adjustable) =>
        adjustable is { } a
            ? Spread<Resistance>.Exact(a.At(a.Low))
            : throw new InvalidOperationException("a feedback resistance passed the checks but was not read; the schema and the reader disagree");

    private void CheckFeedbackShape()
    {
        if (Has("/feedback/settings"))
        {
            foreach (var key in new[] { "resistance", "capacitance", "dielectric", "parasitic-capacitance" })
            {
                var p = "/feedback/" + key;
                if (tree.Positions.ContainsKey(p))
                {
                    sink.AtValue(p, $"with feedback.settings each setting has its own {key}; move it into the settings");
                }
            }
        }
        else if (!tree.Positions.ContainsKey("/feedback/resistance") && Has("/feedback"))
        {
            sink.AtValue("/feedback", "the feedback needs a resistance: write \"resistance: 1 MΩ ±1%\", or list switched gains under \"settings\"");
        }
    }

    /// <summary>The requirements block at <paramref name="prefix"/> (the channel's, or one setting's).</summary>
    private Requirements ReadRequirements(string prefix)
    {
        var bandwidth = SingleOf<Frequency>(prefix + "/bandwidth", (p, q) => CheckPositive(p, q, "the bandwidth", "50 kHz"));
        var pm = SingleOf<Angle>(prefix + "/phase-margin", (p, q) =>
        {
            var deg = Angle.FromSi(q.Typ).Degrees;
            if (deg <= 0 || deg >= 180)
            {
                sink.AtValue(p, $"a phase-margin floor must lie between 0 deg and 180 deg; 45 deg to 60 deg is usual, e.g. \"55 deg\"");
            }
        });
        var peaking = GainOf(prefix + "/peaking", "the peaking", "1 dB");
        if (peaking is { } pk && pk.Linear < 1)
        {
            sink.AtValue(prefix + "/peaking", "the peaking limit cannot be below 0 dB; e.g. \"1 dB\"");
        }

        var (bandLow, bandHigh) = NoiseBand(prefix + "/noise/band");
        var maxInput = SingleOf<Current>(prefix + "/noise/max-input", (p, q) => CheckPositive(p, q, "the noise limit", "20 pA"));
        var noise = Has(prefix + "/noise") ? new NoiseRequirement(bandLow, bandHigh, maxInput) : null;
        return new Requirements(bandwidth, pm, peaking?.Decibels, noise);
    }
}
