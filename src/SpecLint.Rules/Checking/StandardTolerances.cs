using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Config;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;
namespace SpecLint.Rules.Checking;

/// <summary>The tolerance analysis a check runs: corners always, Monte Carlo in the main run, thresholds from the configuration.</summary>
internal static class StandardTolerances
{
    private const string PhaseMarginRule = "phase-margin";
    private const string PeakingRule = "peaking";

    /// <summary>
    /// Corners for every analysis, Monte Carlo only when <paramref name="monteCarlo"/> is set (the main run,
    /// never a fix re-check), with the repository's samples, seed and distribution.
    /// </summary>
    public static ToleranceResult? Analyze(TiaSpec spec, RepoConfig config, bool monteCarlo) =>
        ToleranceAnalyzer.Analyze(spec, OptionsFor(config, monteCarlo));

    /// <summary>
    /// The yield thresholds are the ones the rules judge by: the spec's requirement first (the analyzer reads
    /// it), else <c>rules: phase-margin: floor</c> and <c>rules: peaking: max</c>, else 45° and 1 dB.
    /// </summary>
    public static ToleranceOptions OptionsFor(RepoConfig config, bool monteCarlo)
    {
        ArgumentNullException.ThrowIfNull(config);
        var d = ToleranceOptions.CornersOnly;
        return d with
        {
            MonteCarlo = monteCarlo ? config.MonteCarlo : null,
            PhaseMarginFloor = Option(config, PhaseMarginRule, "floor", Dimension.Angle) is { } floor ? Angle.FromSi(floor) : d.PhaseMarginFloor,
            PeakingLimitDb = Option(config, PeakingRule, "max", Dimension.Gain) is { } max ? Gain.FromSi(max).Decibels : d.PeakingLimitDb,
        };
    }

    /// <summary>A rule option in SI, or null when absent or unreadable (configuration checks already report the latter).</summary>
    private static double? Option(RepoConfig config, string ruleId, string key, Dimension dimension) =>
        config.ForRule(ruleId)?.Options.TryGetValue(key, out var option) == true
        && QuantityParser.TryParse(option.RawText, dimension, out var parsed, out _)
        && parsed is { Form: ToleranceForm.None } p
            ? p.Typ
            : null;
}
