using System.Globalization;
using SpecLint.Core.Analysis;
using SpecLint.Core.Units;

namespace SpecLint.Reporting.Markdown;

/// <summary>The per-spec metric table: name, value with unit, and what it means, in engineering notation.</summary>
internal static class MetricRows
{
    public static IEnumerable<(string Metric, string Value, string Note)> For(AnalysisResult a)
    {
        var c = a.Circuit;
        yield return ("DC transimpedance", Q(a.Transimpedance.Ohms, Dimension.Resistance), string.Create(CultureInfo.InvariantCulture, $"Rf = {Q(c.Rf.Ohms, Dimension.Resistance)}, DC loop gain {a.LoopGainDc:G3}"));
        yield return ("−3 dB bandwidth", a.Bandwidth is { } bw ? Q(bw.Hertz, Dimension.Frequency) : "none found", "first fall through |Zt(0)|/√2");
        yield return ("Phase margin", a.PhaseMargin is { } pm ? Deg(pm.Degrees) : "undefined", a.PhaseMargin is null ? "|T| never reaches 1" : "at the first falling |T| = 1 crossing");
        yield return ("Crossover", a.Crossover is { } fc ? Q(fc.Hertz, Dimension.Frequency) : "n/a", string.Join("; ", a.Crossings.Select(x => $"{Q(x.Frequency.Hertz, Dimension.Frequency)} {x.Direction.ToString().ToLowerInvariant()}")));
        yield return ("Peaking", string.Create(CultureInfo.InvariantCulture, $"{a.PeakingDb:0.00} dB"), a.PeakFrequency is { } pf ? "at " + Q(pf.Hertz, Dimension.Frequency) : "no peak above DC");
        yield return ("High-frequency noise gain", double.IsFinite(a.NoiseGainHighFrequency) ? string.Create(CultureInfo.InvariantCulture, $"{a.NoiseGainHighFrequency:0.##}") : "unbounded", string.Create(CultureInfo.InvariantCulture, $"1 + Cin/(Cf + Cpar); Cin = {Q(c.Cin.Farads, Dimension.Capacitance)}, Cf + Cpar = {Q(c.FeedbackCapacitance.Farads, Dimension.Capacitance)}"));
        yield return ("β zero / pole", $"{(a.BetaZero is { } z ? Q(z.Hertz, Dimension.Frequency) : "none")} / {(a.BetaPole is { } p ? Q(p.Hertz, Dimension.Frequency) : "none")}", "feedback-factor corner frequencies");
        yield return ("Output range", $"{Q(a.Output.Min.Volts, Dimension.Voltage)} .. {Q(a.Output.Max.Volts, Dimension.Voltage)}", $"zero signal to full scale, ±{Q(a.Output.ErrorBand.Volts, Dimension.Voltage)} DC error included");
        yield return ("Headroom", $"{Q(a.Output.HeadroomLow.Volts, Dimension.Voltage)} / {Q(a.Output.HeadroomHigh.Volts, Dimension.Voltage)}", "to the low / high swing limit at nominal supply");
        yield return ("Imin·Rf / (2kT/q)", string.Create(CultureInfo.InvariantCulture, $"{a.ShotToRfThermalRatio:0.###}"), "≥ 1: the signal's shot noise exceeds Rf's thermal noise");
        if (a.Noise is { } n)
        {
            yield return ("Noise band", $"{Q(n.BandLow.Hertz, Dimension.Frequency)} .. {Q(n.BandHigh.Hertz, Dimension.Frequency)}", n.BandIsDefault ? "default band (no requirements.noise.band)" : "requirements.noise.band");
            yield return ("Noise temperature", string.Create(CultureInfo.InvariantCulture, $"{n.Temperature.Celsius:0.#} °C"), "hottest operating temperature");
            yield return ("Output noise, rms", Q(n.OutputRms.Volts, Dimension.Voltage), Shares(n.Output));
            yield return ("Input-referred noise, rms", Q(n.InputRms.Amperes, Dimension.Current), "output rms / |Zt(0)|");
            if (n.SnrAtMinimumDb is { } snr)
            {
                yield return ("SNR at minimum current", string.Create(CultureInfo.InvariantCulture, $"{snr:0.0} dB"), "Imin·|Zt(0)| / output rms");
            }

            if (n.NoiseEquivalentPower is { } nep)
            {
                yield return ("Noise-equivalent power", Q(nep.Watts, Dimension.Power), "input-referred rms / responsivity");
            }
        }
    }

    private static string Shares(NoiseRms o)
    {
        var total = o.Total.Volts * o.Total.Volts;
        if (total <= 0)
        {
            return "";
        }

        string S(string name, Voltage v) => string.Create(CultureInfo.InvariantCulture, $"{name} {100 * v.Volts * v.Volts / total:0.#}%");
        var series = o.SeriesThermal.Volts > 0 ? ", " + S("switch, wiper or access R", o.SeriesThermal) : "";
        return string.Join(", ", S("Rf", o.RfThermal), S("Rsh", o.RshThermal), S("shot", o.Shot), S("i_n", o.CurrentNoise), S("e_n", o.VoltageNoise)) + series + " of the power";
    }

    public static string Q(double si, Dimension d) => QuantityFormat.FormatRounded(si, d);

    public static string Deg(double degrees) => string.Create(CultureInfo.InvariantCulture, $"{degrees:0.0}°");
}
