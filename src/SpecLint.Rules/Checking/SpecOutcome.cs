using System.Collections.Immutable;
using SpecLint.Core.Analysis;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Spec.Model;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Checking;

/// <summary>Everything a run learned about one spec file: the spec (when it loaded), its analysis and its findings.</summary>
/// <param name="File">The file as given or found, forward slashes.</param>
/// <param name="Spec">The typed spec, or null when the file could not be read.</param>
/// <param name="Circuit">The nominal operating point, or null.</param>
/// <param name="Analysis">The nominal analysis with noise, or null.</param>
/// <param name="Tolerances">Corners and Monte Carlo, or null when nothing varies or the analysis did not run.</param>
/// <param name="Findings">Findings ordered by line, column and rule id.</param>
internal sealed record SpecOutcome(
    string File,
    TiaSpec? Spec,
    Circuit? Circuit,
    AnalysisResult? Analysis,
    ToleranceResult? Tolerances,
    ImmutableArray<Finding> Findings)
{
    /// <summary>One entry per gain setting of a channel with more than one gain; empty for a single gain.</summary>
    public ImmutableArray<SettingOutcome> Settings { get; init; } = [];

    /// <summary>The spec's name, or the file name when it did not load.</summary>
    public string Name => Spec?.Name ?? Path.GetFileName(File);

    /// <summary>True when the file itself was unusable (spec-invalid).</summary>
    public bool IsUnusable => Spec is null || Findings.Any(f => f.RuleId == RuleIds.SpecInvalid);

    /// <summary>The file itself could not be read, as opposed to read and found invalid.</summary>
    public bool IsUnreadable { get; init; }

    /// <summary>The highest severity among unwaived findings, or null when there are none.</summary>
    public Severity? WorstSeverity => Findings.Where(f => !f.Waived).Select(f => (Severity?)f.Severity).Max();
}

/// <summary>What a run learned about one gain setting of a spec.</summary>
/// <param name="Name">The setting's name (or an adjustable Rf's position).</param>
/// <param name="Spec">The view of the spec at this setting.</param>
/// <param name="Circuit">Its nominal operating point, or null when the analysis failed.</param>
/// <param name="Analysis">Its nominal analysis, or null.</param>
/// <param name="Tolerances">Its corners and Monte Carlo, or null.</param>
/// <param name="Findings">The findings of this setting, and those every setting shares.</param>
internal sealed record SettingOutcome(
    string Name,
    TiaSpec Spec,
    Circuit? Circuit,
    AnalysisResult? Analysis,
    ToleranceResult? Tolerances,
    ImmutableArray<Finding> Findings);
