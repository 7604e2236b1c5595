using SpecLint.Core.Analysis;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;

namespace SpecLint.Rules.Engine;

/// <summary>
/// What a rule sees while it checks one spec: the typed spec, its analysis, its options, and helpers to
/// report findings at the right line. Built-in rules and house rules get exactly this.
/// </summary>
public sealed class RuleContext
{
    private readonly RuleDescriptor _descriptor;
    private readonly RuleConfiguration _configuration;
    private readonly Func<string, RuleConfiguration> _configurationOf;

    private readonly ISpecAnalyzer _analyzer;

    /// <summary>Creates a context for one rule and one analysed spec (the engine does; rules receive it).</summary>
    internal RuleContext(
        SpecAnalysis analysis,
        ISpecAnalyzer analyzer,
        RuleDescriptor descriptor,
        RuleConfiguration configuration,
        Func<string, RuleConfiguration>? configurationOf = null)
    {
        Current = analysis ?? throw new ArgumentNullException(nameof(analysis));
        _analyzer = analyzer ?? throw new ArgumentNullException(nameof(analyzer));
        _descriptor = descriptor ?? throw new ArgumentNullException(nameof(descriptor));
        _configuration = configuration ?? RuleConfiguration.Default;
        _configurationOf = configurationOf ?? (_ => RuleConfiguration.Default);
    }

    /// <summary>The spec with its analysis.</summary>
    public SpecAnalysis Current { get; }

    /// <summary>The spec under check.</summary>
    public TiaSpec Spec => Current.Spec;

    /// <summary>The nominal operating point.</summary>
    public Circuit Circuit => Current.Circuit;

    /// <summary>Nominal results; noise at the hottest temperature.</summary>
    public AnalysisResult Analysis => Current.Analysis;

    /// <summary>Tolerance corners and Monte Carlo, or null when nothing in the spec varies.</summary>
    public ToleranceResult? Tolerances => Current.Tolerances;

    /// <summary>
    /// False while the engine re-checks another rule's fix: rules then report findings only and do not
    /// search for fixes of their own (which keeps verification cheap and free of recursion).
    /// </summary>
    public bool SearchFixes { get; internal init; } = true;

    /// <summary>Runs the other enabled rules on a candidate spec and tells whether any error-level rule that was clean now fails.</summary>
    internal Func<TiaSpec, string, IReadOnlyList<string>>? OtherRulesCheck { get; init; }

    /// <summary>
    /// True when <paramref name="candidate"/> trips no error-level rule (besides this one) that passes for the
    /// current spec: a fix must not trade one error for another.
    /// </summary>
    public bool LeavesOtherRulesClean(TiaSpec candidate) => RulesTrippedBy(candidate).Count == 0;

    /// <summary>
    /// The ids of the other rules that reject <paramref name="candidate"/>: an error that was not there before, or
    /// one about the key being changed. Empty when it leaves them clean.
    /// </summary>
    public IReadOnlyList<string> RulesTrippedBy(TiaSpec candidate) => OtherRulesCheck?.Invoke(candidate, _descriptor.Id) ?? [];

    /// <summary>Analyses a changed spec, the way a rule re-checks a fix before suggesting it.</summary>
    public SpecAnalysis Reanalyze(TiaSpec changed, bool includeNoise = false) =>
        _analyzer.Analyze(changed, includeNoise, includeCorners: Current.Tolerances is not null);

    /// <summary>
    /// Analyses a changed spec at its nominal values only, without the corner search. Cheap: a fix search uses it
    /// to reject a candidate whose nominal figure already fails (a worst case is never better than nominal) before
    /// paying for <see cref="Reanalyze"/>, and for figures that do not depend on corners (the DC output).
    /// </summary>
    public SpecAnalysis ReanalyzeNominal(TiaSpec changed, bool includeNoise = false) =>
        _analyzer.Analyze(changed, includeNoise, includeCorners: false);

    /// <summary>The value of one of this rule's options in SI: the configured value, or the declared default.</summary>
    public double OptionSi(string key) => OptionSi(_descriptor, _configuration, key);

    /// <summary>
    /// The value of one of this rule's options as a typed quantity. <typeparamref name="T"/> must have the
    /// dimension the option declares: reading a "50 deg" option as a <see cref="Capacitance"/> throws.
    /// </summary>
    public T Option<T>(string key)
        where T : struct, IQuantity<T> => T.FromSi(OptionSi(_descriptor, _configuration, key, T.Dimension));

    /// <summary>The value of another rule's option (for rules that share a threshold, such as the phase-margin floor).</summary>
    public T OptionOf<T>(RuleDescriptor other, string key)
        where T : struct, IQuantity<T>
    {
        ArgumentNullException.ThrowIfNull(other);
        return T.FromSi(OptionSi(other, _configurationOf(other.Id), key, T.Dimension));
    }

    /// <summary>Creates a finding at the key <paramref name="pointer"/> (or its nearest written ancestor).</summary>
    public Finding Report(string pointer, string message, FixSuggestion? fix = null, Severity? severity = null)
    {
        var at = Spec.Locations.LocateKeyOrValue(pointer);
        return new Finding(_descriptor.Id, severity ?? _descriptor.DefaultSeverity, Spec.File, pointer, at.Line, at.Column, message, fix);
    }

    internal static double OptionSi(RuleDescriptor descriptor, RuleConfiguration configuration, string key, Dimension? wanted = null)
    {
        var option = descriptor.Options.FirstOrDefault(o => o.Key == key)
            ?? throw new ArgumentException($"rule '{descriptor.Id}' declares no option '{key}'", nameof(key));
        if (wanted is { } w && w != option.Dimension)
        {
            throw new ArgumentException(
                $"option '{key}' of rule '{descriptor.Id}' is declared as {option.Dimension}, but was read as {w}; read it as the type of its dimension", nameof(key));
        }

        // An unusable value was already reported as config-invalid (exit 2); the rule runs on its default.
        return configuration.Options.TryGetValue(key, out var text) && OptionValues.TryRead(option, text, out var si, out _)
            ? si
            : option.DefaultSi;
    }
}
