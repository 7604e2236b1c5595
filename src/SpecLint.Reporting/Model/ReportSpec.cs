using System.Collections.Immutable;
using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Model;

/// <summary>What the report shows of one spec file.</summary>
/// <param name="File">The file, relative to the working folder as the run gave it.</param>
/// <param name="Name">The spec's name, or the file name when it did not load.</param>
/// <param name="Title">The spec's title, or null.</param>
/// <param name="Result">pass, fail or unreadable.</param>
/// <param name="PhaseMargin">The summary table's cells, "–" where there is no value.</param>
/// <param name="Bandwidth">See <paramref name="PhaseMargin"/>.</param>
/// <param name="InputNoise">See <paramref name="PhaseMargin"/>.</param>
/// <param name="OutputRange">See <paramref name="PhaseMargin"/>.</param>
/// <param name="Findings">The spec's findings, in the run's order.</param>
/// <param name="Section">The metrics section, or null when the spec was not analysed.</param>
/// <param name="Charts">Draws the spec's charts when asked, so a large run never holds every chart at once.</param>
internal sealed record ReportSpec(
    string File,
    string Name,
    string? Title,
    string Result,
    string PhaseMargin,
    string Bandwidth,
    string InputNoise,
    string OutputRange,
    ImmutableArray<Finding> Findings,
    ReportSection? Section,
    Func<IReadOnlyList<ReportChart>> Charts);
