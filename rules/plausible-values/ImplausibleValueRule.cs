using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;
using SpecLint.Rules.Fixes;

namespace SpecLint.Rules.BuiltIn;

/// <summary>
/// Flags a part or figure whose value lies outside the range any photodiode or sensor front end uses: a prefix
/// typed wrong (mΩ for MΩ, nF for pF) gives a spec that parses and analyses, but describes another circuit.
/// </summary>
public sealed class ImplausibleValueRule : IRule
{
    // The ranges are generous on purpose (common practice): only a value several decades off, as a wrong
    // prefix makes it, is flagged. The capacitance limits stay below the ones that make a spec invalid
    // (Cf ≥ 1 µF, Cd > 1 mF), so a value between the two is a warning here, not silence.
    private static readonly Figure[] Figures =
    [
        new("rf", Dimension.Resistance, "10 Ω", "1 TΩ", "a feedback resistor"),
        new("cf", Dimension.Capacitance, "10 fF", "10 nF", "a feedback capacitor"),
        new("cd", Dimension.Capacitance, "10 fF", "100 µF", "a sensor's capacitance"),
        new("rsh", Dimension.Resistance, "10 Ω", "100 TΩ", "a sensor's shunt resistance"),
        new("gbw", Dimension.Frequency, "1 kHz", "100 GHz", "an op-amp's gain-bandwidth"),
        new("current", Dimension.Current, "0.001 fA", "100 mA", "an input, dark or bias current"),
        new("voltage-noise", Dimension.VoltageNoiseDensity, "0.1 nV/√Hz", "1 µV/√Hz", "an op-amp's voltage noise"),
        new("current-noise", Dimension.CurrentNoiseDensity, "0.01 fA/√Hz", "100 pA/√Hz", "an op-amp's current noise"),
        new("supply", Dimension.Voltage, "0.5 V", "1 kV", "a supply rail"),
    ];

    /// <summary>The descriptor.</summary>
    public static RuleDescriptor Info { get; } = new(
        "plausible-values", "every part and figure lies in the range a sensor front end uses; a value outside names the prefix that fits",
        Severity.Warning,
        [.. Figures.SelectMany(f => new[] { f.MinOption, f.MaxOption })]);

    /// <inheritdoc />
    public RuleDescriptor Descriptor => Info;

    /// <inheritdoc />
    public IEnumerable<Finding> Check(RuleContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        return Problems(context.Spec, context.OptionSi).Select(p => context.Report(p.Pointer, p.Message, p.Fix));
    }

    /// <summary>
    /// The implausible figures of a spec. They need no analysis, so they are also reported when a value so far off
    /// makes the analysis itself fail.
    /// </summary>
    internal static IEnumerable<(string Pointer, string Message, FixSuggestion? Fix)> Problems(TiaSpec spec, Func<string, double> optionSi)
    {
        ArgumentNullException.ThrowIfNull(spec);
        ArgumentNullException.ThrowIfNull(optionSi);
        var input = spec.Input;
        var amp = spec.Amplifier;
        var values = new List<(string Pointer, string Figure, string Name, double Si, string? Tolerance)>
        {
            ("/feedback/resistance", "rf", "Rf", spec.Feedback.Resistance.Typ.Ohms, FixableTolerance(spec.Feedback.Resistance)),
        };
        if (spec.Feedback.Capacitance is { } cf)
        {
            values.Add(("/feedback/capacitance", "cf", "Cf", cf.Typ.Farads, FixableTolerance(cf)));
        }

        values.Add(("/input/capacitance", "cd", "Cd", input.Capacitance.Typ.Farads, FixableTolerance(input.Capacitance)));
        if (input.ShuntResistance is { } rsh)
        {
            values.Add(("/input/shunt-resistance", "rsh", "Rsh", rsh.Typ.Ohms, FixableTolerance(rsh)));
        }

        values.Add(("/amplifier/gbw", "gbw", "GBW", amp.Gbw.Typ.Hertz, FixableTolerance(amp.Gbw)));
        values.Add(("/input/current/min", "current", "the minimum input current", input.CurrentMin.Amperes, ""));
        values.Add(("/input/current/max", "current", "the maximum input current", input.CurrentMax.Amperes, ""));
        values.Add(("/input/dark-current", "current", "the dark current", input.DarkCurrent.Typ.Amperes, FixableTolerance(input.DarkCurrent)));
        values.Add(("/amplifier/bias-current", "current", "the bias current", amp.BiasCurrent.WorstMagnitude.Amperes, amp.BiasCurrent.IsExact ? "" : null));
        values.Add(("/amplifier/voltage-noise", "voltage-noise", "en", amp.VoltageNoise.Si, ""));
        values.Add(("/amplifier/current-noise", "current-noise", "in", amp.CurrentNoise.Si, ""));
        values.Add(("/conditions/supply/positive", "supply", "the positive supply", spec.Conditions.SupplyPositive.Typ.Volts, FixableTolerance(spec.Conditions.SupplyPositive)));
        values.Add(("/conditions/supply/negative", "supply", "the negative supply", spec.Conditions.SupplyNegative.Typ.Volts, FixableTolerance(spec.Conditions.SupplyNegative)));

        foreach (var (pointer, key, name, si, tolerance) in values)
        {
            // Zero is a statement (no current, a single supply), not a prefix slip.
            if (si == 0 || !double.IsFinite(si))
            {
                continue;
            }

            var figure = Figures.Single(f => f.Key == key);
            var min = optionSi(figure.MinOption.Key);
            var max = optionSi(figure.MaxOption.Key);
            var magnitude = Math.Abs(si);
            if (magnitude >= min && magnitude <= max)
            {
                continue;
            }

            var written = QuantityFormat.Format(si, figure.Dimension);
            var range = $"{QuantityFormat.FormatRounded(min, figure.Dimension)} .. {QuantityFormat.FormatRounded(max, figure.Dimension)}";
            var side = magnitude < min ? "below" : "above";
            var head = $"{name} = {written} is {side} the plausible range for {figure.What} ({range}), so the analysis describes another circuit";
            if (PrefixReading(si, figure.Dimension, min, max) is { } meant)
            {
                // The fix keeps the user's tolerance; a spread whose text cannot be carried over gets no fix. Every
                // key checked is either required or, left out, zero, so the pointer names a key in the file.
                FixSuggestion? fix = tolerance is null
                    ? null
                    : new FixSuggestion(pointer, tolerance.Length == 0 ? meant : $"{meant} {tolerance}");
                yield return (pointer, $"{head}: a prefix typed wrong? did you mean {meant}?", fix);
            }
            else
            {
                yield return (pointer, $"{head}; no other SI prefix brings it into range: check the number and the unit.", null);
            }
        }
    }

    /// <summary>
    /// The value with another SI prefix that lies in [min, max], as text that parses back: the same letter in the
    /// other case first (m for M), then the nearest prefix step, then the one nearest the middle of the range.
    /// </summary>
    internal static string? PrefixReading(double si, Dimension dimension, double min, double max)
    {
        var written = QuantityFormat.Format(si, dimension);
        var unit = UnitTable.DisplayUnit(dimension).Symbol;
        var space = written.IndexOf(' ', StringComparison.Ordinal);
        if (space < 0 || !written.EndsWith(unit, StringComparison.Ordinal))
        {
            return null;
        }

        var number = written[..space];
        var prefix = written[(space + 1)..^unit.Length];
        var power = UnitTable.FormatPrefixes.Single(p => p.Value == prefix).Key;
        var centre = (Math.Log10(min) + Math.Log10(max)) / 2;
        var best = UnitTable.FormatPrefixes
            .Where(p => p.Key != power)
            .Select(p => (Text: $"{number} {p.Value}{unit}", Power: p.Key, Prefix: p.Value))
            .Select(c => (c.Text, c.Power, c.Prefix, Si: Math.Abs(QuantityParser.ParseSingle(c.Text, dimension))))
            .Where(c => c.Si >= min && c.Si <= max)
            .OrderBy(c => c.Prefix.Length == 1 && prefix.Length == 1 && c.Prefix != prefix && string.Equals(c.Prefix, prefix, StringComparison.OrdinalIgnoreCase) ? 0 : 1)
            .ThenBy(c => Math.Abs(c.Power - power))
            .ThenBy(c => Math.Abs(Math.Log10(c.Si) - centre))
            .Select(c => c.Text)
            .FirstOrDefault();
        return best;
    }

    // The tolerance text to carry over to the fixed value, "" for none, or null when it cannot be carried over
    // (an absolute tolerance or a range is in the old prefix's units).
    private static string? FixableTolerance<T>(Spread<T> spread)
        where T : struct, IQuantity<T> =>
        spread.Form switch
        {
            ToleranceForm.None => "",
            ToleranceForm.Relative => spread.ToleranceText,
            ToleranceForm.LetterCode when T.Dimension != Dimension.Capacitance => spread.ToleranceText,
            _ => null,
        };

    private sealed record Figure(string Key, Dimension Dimension, string Min, string Max, string What)
    {
        public RuleOption MinOption { get; } = new($"{Key}-min", Dimension, Min, $"smallest plausible value for {What}");

        public RuleOption MaxOption { get; } = new($"{Key}-max", Dimension, Max, $"largest plausible value for {What}");
    }
}
