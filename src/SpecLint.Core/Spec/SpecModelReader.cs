using System.Collections.Immutable;
using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Spec.Yaml;
using SpecLint.Core.Units;

namespace SpecLint.Core.Spec;

/// <summary>
/// Turns a schema-checked tree into a <see cref="TiaSpec"/>: parses every quantity with its dimension, checks the
/// physics is sane, and reports each problem at its value. Keys that already failed are skipped.
/// </summary>
internal sealed partial class SpecModelReader(YamlTree tree, DiagnosticSink sink)
{
    [GeneratedRegex(@"^\s*[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?\s*$", RegexOptions.CultureInvariant)]
    private static partial Regex BareNumberRegex();

    [GeneratedRegex(@"^\s*(?<num>[+-]?(?:\d+(?:\.\d*)?|\.\d+))", RegexOptions.CultureInvariant)]
    private static partial Regex LeadingNumberRegex();

    private const double OneMicrofarad = 1e-6;
    private const double OneMillifarad = 1e-3;

    /// <summary>Reads the whole spec; returns null when anything (now or before) was reported.</summary>
    public TiaSpec? Read(string file)
    {
        var spec = Int("/spec");
        var kind = Str("/kind");
        var name = Str("/name");
        var title = Str("/title");
        var tags = Strings("/tags");

        var temperature = SpreadOf<Temperature>("/conditions/temperature", CheckTemperature);
        var supplyPos = SpreadOf<Voltage>("/conditions/supply/positive");
        var supplyNeg = SpreadOf<Voltage>("/conditions/supply/negative");
        if (supplyPos is { } sp && supplyNeg is { } sn && sp.Typ.Si <= sn.Typ.Si)
        {
            sink.AtValue("/conditions/supply/positive", $"the positive rail ({Show(sp.Typ)}) must be above the negative rail ({Show(sn.Typ)}); e.g. {{ positive: 5 V, negative: 0 V }}");
        }

        var bias = SpreadOf<Voltage>("/bias");

        var sensorType = Str("/input/type") switch
        {
            "phototransistor" => SensorType.Phototransistor,
            "current-source" => SensorType.CurrentSource,
            "electrode" => SensorType.Electrode,
            _ => SensorType.Photodiode,
        };
        var sensorC = SpreadOf<Capacitance>("/input/capacitance", (p, q) =>
        {
            CheckCapacitance(p, q, "the sensor capacitance", inFeedback: false);
            CheckPartSpread(p, q, "the sensor capacitance", PartKind.Sensor);
        });
        var shunt = SpreadOf<Resistance>("/input/shunt-resistance", (p, q) =>
        {
            CheckPositive(p, q, "the shunt resistance", "2 GΩ");
            CheckPartSpread(p, q, "the shunt resistance", PartKind.Sensor);
        });
        var seriesR = SeriesResistance(sensorType);
        var dark = SpreadOf<Current>("/input/dark-current", (p, q) => CheckNonNegative(p, q, "the dark current"));
        var (iMin, iMax) = SignalCurrent();
        var direction = Str("/input/current-direction") == "into-node" ? CurrentDirection.IntoNode : CurrentDirection.OutOfNode;
        var responsivity = SingleOf<Responsivity>("/input/responsivity", (p, q) => CheckPositive(p, q, "the responsivity", "0.42 A/W"));

        var gbw = SpreadOf<Frequency>("/amplifier/gbw", (p, q) =>
        {
            CheckPositive(p, q, "the gain-bandwidth product", "8 MHz");
            CheckPartSpread(p, q, "the gain-bandwidth product", PartKind.Amplifier);
        });
        var aol = GainOf("/amplifier/open-loop-gain", "the open-loop gain", "120 dB");
        if (aol is { } a && a.Linear < 1)
        {
            sink.AtValue("/amplifier/open-loop-gain", $"an open-loop gain of {a.Decibels.ToString("0.#", CultureInfo.InvariantCulture)} dB is below 0 dB; datasheets give about 100 dB to 140 dB, e.g. \"120 dB\"");
        }

        var secondPole = SpreadOf<Frequency>("/amplifier/second-pole", (p, q) => CheckPositive(p, q, "the second pole", "40 MHz"));
        var en = SingleOf<VoltageNoiseDensity>("/amplifier/voltage-noise", (p, q) => CheckNonNegative(p, q, "the voltage noise"));
        var enCorner = SingleOf<Frequency>("/amplifier/voltage-noise-corner", (p, q) => CheckNonNegative(p, q, "the noise corner"));
        var inNoise = SingleOf<CurrentNoiseDensity>("/amplifier/current-noise", (p, q) => CheckNonNegative(p, q, "the current noise"));
        var inCorner = SingleOf<Frequency>("/amplifier/current-noise-corner", (p, q) => CheckNonNegative(p, q, "the noise corner"));
        var ccm = SingleOf<Capacitance>("/amplifier/input-capacitance/common-mode", (p, q) => CheckCapacitance(p, q, "the common-mode capacitance", inFeedback: false));
        var cdiff = SingleOf<Capacitance>("/amplifier/input-capacitance/differential", (p, q) => CheckCapacitance(p, q, "the differential capacitance", inFeedback: false));
        var ib = SpreadOf<Current>("/amplifier/bias-current");
        var vos = SpreadOf<Voltage>("/amplifier/offset-voltage");
        var swingNeg = SingleOf<Voltage>("/amplifier/output-swing/to-negative", (p, q) => CheckNonNegative(p, q, "the output swing limit"));
        var swingPos = SingleOf<Voltage>("/amplifier/output-swing/to-positive", (p, q) => CheckNonNegative(p, q, "the output swing limit"));
        var slew = SingleOf<SlewRate>("/amplifier/slew-rate", (p, q) => CheckPositive(p, q, "the slew rate", "12 V/µs"));
        var minGain = SingleOf<Gain>("/amplifier/min-stable-gain", (p, q) =>
        {
            if (q.Typ < 1)
            {
                sink.AtValue(p, $"a minimum stable gain below 1 (0 dB) means unity-gain stable; leave the key out, or write the datasheet value, e.g. \"5\"");
            }
        });

        var doubling = SingleOf<Temperature>("/amplifier/bias-current-doubling", (p, q) =>
        {
            // A difference, so °C (which adds 273.15) is a mistake here; nobody means a 200 K doubling interval.
            if (q.Typ < 0 || q.Typ > 200)
            {
                sink.AtValue(p, "the bias-current doubling interval is a temperature difference: write it in K, between 0 K and 200 K, e.g. \"10 K\"");
            }
        });

        var settings = Settings();
        var gainSwitch = Switch(settings);
        var adjustable = Adjustable();
        var rf = adjustable is not null ? null : FeedbackResistance("/feedback/resistance");
        var cf = FeedbackCapacitance("/feedback/capacitance");
        var dielectric = Str("/feedback/dielectric");
        var cpar = SpreadOf<Capacitance>("/feedback/parasitic-capacitance", (p, q) => CheckCapacitance(p, q, "the parasitic capacitance", inFeedback: true));
        CheckFeedbackShape();
        var stray = SpreadOf<Capacitance>("/board/stray-capacitance", (p, q) => CheckCapacitance(p, q, "the stray capacitance", inFeedback: false));

        var requirements = ReadRequirements("/requirements");
        var waivers = Waivers(settings, adjustable is not null);

        if (sink.Count > 0)
        {
            return null;
        }

        var first = settings.IsDefaultOrEmpty ? null : settings[0];
        var read = new TiaSpec(
            file,
            Req(spec),
            Req(kind),
            Req(name),
            title,
            tags,
            new Conditions(Req(temperature), Req(supplyPos), Req(supplyNeg)),
            Req(bias),
            new SensorInput(sensorType, Req(sensorC), shunt, dark ?? Spread<Current>.Exact(Current.FromSi(0)), Req(iMin), Req(iMax), direction, responsivity)
            {
                SeriesResistance = seriesR,
            },
            new Amplifier(Req(gbw), aol ?? Gain.FromDecibels(120), secondPole, Req(en), enCorner, Req(inNoise), inCorner,
                Req(ccm), Req(cdiff), Req(ib), Req(vos), Req(swingNeg), Req(swingPos), slew, minGain) { BiasCurrentDoubling = doubling },
            new Feedback(
                first?.Resistance ?? rf ?? AdjustableStart(adjustable),
                first is null ? cf : first.Capacitance,
                first is null ? dielectric : first.Dielectric,
                first?.ParasiticCapacitance ?? cpar ?? Spread<Capacitance>.Exact(Capacitance.Zero))
            {
                Settings = settings.IsDefault ? [] : settings,
                Switch = gainSwitch,
                Adjustable = adjustable,
            },
            new Board(stray ?? Spread<Capacitance>.Exact(Capacitance.Zero)),
            requirements ?? Requirements.None,
            waivers,
            tree.ToSourceMap());
        return first is null ? read : GainViews.Select(read, 0);
    }

    private static T Req<T>(T? value)
        where T : struct =>
        value ?? throw new InvalidOperationException($"a required {typeof(T).Name} passed the schema but was not read; the schema and the reader disagree");

    private static string Req(string? value) =>
        value ?? throw new InvalidOperationException("a required text key passed the schema but was not read; the schema and the reader disagree");

    private JsonNode? Node(string pointer)
    {
        JsonNode? node = tree.Root;
        foreach (var token in JsonPointerText.Split(pointer))
        {
            node = node switch
            {
                JsonObject o => o[token],
                JsonArray a when int.TryParse(token, NumberStyles.None, CultureInfo.InvariantCulture, out var i) && i < a.Count => a[i],
                _ => null,
            };
        }

        return node;
    }

    private bool Has(string pointer) => tree.Positions.ContainsKey(pointer) && !sink.HasFailed(pointer);

    private string? Str(string pointer) =>
        Has(pointer) && Node(pointer) is JsonValue v && v.GetValueKind() == JsonValueKind.String ? v.GetValue<string>() : null;

    private int? Int(string pointer) =>
        Has(pointer) && Node(pointer) is JsonValue v && v.GetValueKind() == JsonValueKind.Number
            ? v.TryGetValue<long>(out var l) ? (int)l : (int)v.GetValue<double>()
            : null;

    private ImmutableArray<string> Strings(string pointer) =>
        Has(pointer) && Node(pointer) is JsonArray a
            ? [.. a.OfType<JsonValue>().Where(v => v.GetValueKind() == JsonValueKind.String).Select(v => v.GetValue<string>())]
            : [];

    /// <summary>Parses a value that may vary: a tolerance, a range "a .. b" or a map { min, typ, max }.</summary>
    private Spread<T>? SpreadOf<T>(string pointer, Action<string, ParsedQuantity>? check = null)
        where T : struct, IQuantity<T>
    {
        var parsed = Parse(pointer, T.Dimension, single: false);
        if (parsed is null || !Finite(pointer, parsed))
        {
            return null;
        }

        var before = sink.Count;
        check?.Invoke(pointer, parsed);
        return sink.Count == before && WithinLimits(pointer, parsed) ? Spread<T>.From(parsed) : null;
    }

    /// <summary>Parses a key that takes exactly one value.</summary>
    private T? SingleOf<T>(string pointer, Action<string, ParsedQuantity>? check = null)
        where T : struct, IQuantity<T>
    {
        var parsed = Parse(pointer, T.Dimension, single: true);
        if (parsed is null || !Finite(pointer, parsed))
        {
            return null;
        }

        var before = sink.Count;
        check?.Invoke(pointer, parsed);
        return sink.Count == before && WithinLimits(pointer, parsed) ? T.FromSi(parsed.Typ) : null;
    }

    /// <summary>A gain where a bare number would be ambiguous (dB or V/V?), so the unit is required.</summary>
    private Gain? GainOf(string pointer, string what, string example)
    {
        if (Has(pointer) && tree.ScalarText.TryGetValue(pointer, out var text) && BareNumberRegex().IsMatch(text))
        {
            sink.AtValue(pointer, $"\"{text.Trim()}\" has no unit; write {what} in dB, e.g. \"{example}\" (or as a ratio with V/V)");
            return null;
        }

        return SingleOf<Gain>(pointer);
    }

    private ParsedQuantity? Parse(string pointer, Dimension dimension, bool single)
    {
        if (!Has(pointer))
        {
            return null;
        }

        if (Node(pointer) is JsonObject)
        {
            return single ? null : ParseMap(pointer, dimension);
        }

        if (!tree.ScalarText.TryGetValue(pointer, out var text))
        {
            return null;
        }

        try
        {
            var parsed = QuantityParser.Parse(text, dimension);
            if (single && parsed.Form != ToleranceForm.None)
            {
                sink.AtValue(pointer, $"\"{text.Trim()}\" has a tolerance or range, but this key takes one value; write e.g. \"{UnitTable.Example(dimension)}\"");
                return null;
            }

            return parsed;
        }
        catch (QuantityParseException e)
        {
            sink.AtValue(pointer, e.Message);
            return null;
        }
    }

    private ParsedQuantity? ParseMap(string pointer, Dimension dimension)
    {
        var min = Parse(JsonPointerText.Append(pointer, "min"), dimension, single: true);
        var typ = Parse(JsonPointerText.Append(pointer, "typ"), dimension, single: true);
        var max = Parse(JsonPointerText.Append(pointer, "max"), dimension, single: true);
        if (min is null || max is null || (typ is null && Has(JsonPointerText.Append(pointer, "typ"))))
        {
            return null;
        }

        var finite = Finite(JsonPointerText.Append(pointer, "min"), min) & Finite(JsonPointerText.Append(pointer, "max"), max)
            & (typ is null || Finite(JsonPointerText.Append(pointer, "typ"), typ));
        if (!finite)
        {
            return null;
        }

        if (min.Typ > max.Typ)
        {
            sink.AtValue(JsonPointerText.Append(pointer, "min"), $"min ({Format(min.Typ, dimension)}) is above max ({Format(max.Typ, dimension)}); write the low limit as min");
            return null;
        }

        if (typ is not null && (typ.Typ < min.Typ || typ.Typ > max.Typ))
        {
            sink.AtValue(JsonPointerText.Append(pointer, "typ"), $"typ ({Format(typ.Typ, dimension)}) lies outside min .. max ({Format(min.Typ, dimension)} .. {Format(max.Typ, dimension)})");
            return null;
        }

        return new ParsedQuantity(dimension, typ?.Typ ?? (min.Typ + max.Typ) / 2, min.Typ, max.Typ, ToleranceForm.Range, typ is not null);
    }

    private (Current? Min, Current? Max) SignalCurrent()
    {
        var min = SingleOf<Current>("/input/current/min", (p, q) => CheckNonNegative(p, q, "the smallest signal current"));
        var typ = SingleOf<Current>("/input/current/typ", (p, q) => CheckNonNegative(p, q, "the typical signal current"));
        var max = SingleOf<Current>("/input/current/max", (p, q) => CheckPositive(p, q, "the full-scale current", "1.5 µA"));
        if (min is { } lo && max is { } hi)
        {
            if (lo.Si > hi.Si)
            {
                sink.AtValue("/input/current/min", $"min ({Show(lo)}) is above max ({Show(hi)}); min is the smallest signal to resolve, max the full scale");
                return (null, null);
            }

            if (typ is { } t && (t.Si < lo.Si || t.Si > hi.Si))
            {
                sink.AtValue("/input/current/typ", $"typ ({Show(t)}) lies outside min .. max ({Show(lo)} .. {Show(hi)})");
            }
        }

        return (min, max);
    }

    private (Frequency? Low, Frequency? High) NoiseBand(string pointer)
    {
        var band = Parse(pointer, Dimension.Frequency, single: false);
        if (band is null || !Finite(pointer, band))
        {
            return (null, null);
        }

        if (band.Form != ToleranceForm.Range)
        {
            sink.AtValue(pointer, $"the noise band is a range of frequencies, not {(band.Form == ToleranceForm.None ? "one value" : "a value with a tolerance")}; write e.g. \"1 Hz .. 100 kHz\"");
            return (null, null);
        }

        if (band.Min < 0 || band.Max <= band.Min)
        {
            sink.AtValue(pointer, "the noise band must run from a frequency of 0 Hz or more up to a higher one; write e.g. \"1 Hz .. 100 kHz\"");
            return (null, null);
        }

        if (!WithinLimits(pointer, band))
        {
            return (null, null);
        }

        return (Frequency.FromSi(band.Min), Frequency.FromSi(band.Max));
    }

    private ImmutableArray<Waiver> Waivers(ImmutableArray<GainSetting> settings, bool adjustable)
    {
        if (!Has("/waivers") || Node("/waivers") is not JsonArray items)
        {
            return [];
        }

        var list = ImmutableArray.CreateBuilder<Waiver>();
        for (var i = 0; i < items.Count; i++)
        {
            var at = JsonPointerText.Append("/waivers", i);
            var rule = Str(at + "/rule");
            var reason = Str(at + "/reason");
            var expires = Str(at + "/expires");
            if (expires is not null && !DateOnly.TryParseExact(expires, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out _))
            {
                sink.AtValue(at + "/expires", $"\"{expires}\" is not a calendar date; write a real YYYY-MM-DD date, e.g. 2027-03-31");
                continue;
            }

            var setting = Str(at + "/setting");
            if (setting is not null && !settings.Any(s => s.Name == setting))
            {
                sink.AtValue(at + "/setting", settings.IsDefaultOrEmpty
                    ? adjustable
                        ? "an adjustable Rf has no named settings; leave 'setting' out so the waiver covers the whole range"
                        : "this channel has no feedback.settings; leave 'setting' out"
                    : $"there is no setting named '{setting}'; the settings are {string.Join(", ", settings.Select(s => s.Name))}");
                continue;
            }

            if (rule is not null && reason is not null && expires is not null)
            {
                list.Add(new Waiver(rule, reason, DateOnly.ParseExact(expires, "yyyy-MM-dd", CultureInfo.InvariantCulture), at) { Setting = setting });
            }
        }

        return list.ToImmutable();
    }

    private void CheckTemperature(string pointer, ParsedQuantity q)
    {
        if (q.Min <= 0)
        {
            sink.AtValue(pointer, $"{Format(q.Min, Dimension.Temperature)} is at or below absolute zero (-273.15 °C); write e.g. \"-10 °C .. 60 °C\"");
        }
        else if (q.Max > Temperature.FromCelsius(500).Kelvin)
        {
            sink.AtValue(pointer, $"{Format(q.Max, Dimension.Temperature)} is not a plausible operating temperature for electronics; write e.g. \"-10 °C .. 60 °C\"");
        }
    }

    private void CheckPositive(string pointer, ParsedQuantity q, string what, string example)
    {
        if (q.Typ <= 0)
        {
            sink.AtValue(pointer, $"{what} must be greater than zero; write e.g. \"{example}\"");
        }
        else if (q.Min <= 0)
        {
            sink.AtValue(pointer, $"the tolerance takes {what} down to {Format(q.Min, q.Dimension)}, which is not physical; check the tolerance, e.g. \"±5%\"");
        }
    }

    private void CheckNonNegative(string pointer, ParsedQuantity q, string what)
    {
        if (q.Min < 0)
        {
            sink.AtValue(pointer, $"{what} cannot be negative ({Format(q.Min, q.Dimension)}); write its size, e.g. \"{UnitTable.Example(q.Dimension)}\"");
        }
    }

    private void CheckCapacitance(string pointer, ParsedQuantity q, string what, bool inFeedback)
    {
        if (q.Typ < 0)
        {
            sink.AtValue(pointer, $"{what} cannot be negative; write e.g. \"2.2 pF\"");
            return;
        }

        var limit = inFeedback ? OneMicrofarad : OneMillifarad;
        if (inFeedback ? q.Typ >= limit : q.Typ > limit)
        {
            var number = tree.ScalarText.TryGetValue(pointer, out var text) && LeadingNumberRegex().Match(text) is { Success: true } m
                ? m.Groups["num"].Value
                : QuantityFormat.Format(q.Typ, Dimension.Capacitance).Split(' ')[0];
            sink.AtValue(pointer, $"{Format(q.Typ, Dimension.Capacitance)} is not plausible for {what}; did you mean \"{number} pF\"?");
            return;
        }

        if (q.Typ > 0 && q.Min <= 0 && inFeedback)
        {
            sink.AtValue(pointer, $"the tolerance takes {what} down to {Format(q.Min, Dimension.Capacitance)}; below 10 pF write an absolute tolerance, e.g. \"2.2 pF ±0.25 pF\"");
        }
        else if (q.Min < 0)
        {
            sink.AtValue(pointer, $"the tolerance takes {what} below zero ({Format(q.Min, Dimension.Capacitance)}); check the tolerance, e.g. \"12 pF ±20%\"");
        }
    }

    /// <summary>
    /// An overflowing value (7000 dB, or a tolerance of ±1e308 %) is refused before the key's own checks run,
    /// so no message ever shows an infinity.
    /// </summary>
    private bool Finite(string pointer, ParsedQuantity q)
    {
        if (double.IsFinite(q.Typ) && double.IsFinite(q.Min) && double.IsFinite(q.Max))
        {
            return true;
        }

        var limits = PhysicalLimits.For(pointer);
        sink.AtValue(pointer, $"{Written(pointer)} is too large a number to be {UnitTable.Describe(q.Dimension)}"
            + (limits is null ? "" : $"; it must lie within {limits.Text}") + "; check the exponent and the tolerance");
        return false;
    }

    /// <summary>The hard limits of <see cref="PhysicalLimits"/>, checked after the key's own plausibility checks (which say more).</summary>
    private bool WithinLimits(string pointer, ParsedQuantity q)
    {
        if (PhysicalLimits.For(pointer) is not { } limits || (limits.Allows(q.Typ) && limits.Allows(q.Min) && limits.Allows(q.Max)))
        {
            return true;
        }

        var what = q.Form is ToleranceForm.None ? "" : " (with its tolerance or range)";
        sink.AtValue(pointer, $"{Written(pointer)}{what} is outside what a real part or figure can be here: it must lie within {limits.Text}; check the prefix and the exponent");
        return false;
    }

    private string Written(string pointer) =>
        tree.ScalarText.TryGetValue(pointer, out var text) ? $"\"{text.Trim()}\"" : "the value";

    private static string Format(double si, Dimension dimension) => QuantityFormat.FormatRounded(si, dimension);

    private static string Show<T>(T value)
        where T : struct, IQuantity<T> => QuantityFormat.FormatRounded(value.Si, T.Dimension);
}
