namespace SpecLint.Reporting.Annotations;

/// <summary>How many workflow-command annotations were printed, by kind, and how many waived findings were left out.</summary>
/// <param name="Errors">Lines printed as <c>::error</c>.</param>
/// <param name="Warnings">Lines printed as <c>::warning</c>.</param>
/// <param name="Notices">Lines printed as <c>::notice</c>.</param>
/// <param name="Waived">Waived findings, not annotated.</param>
internal sealed record AnnotationCounts(int Errors, int Warnings, int Notices, int Waived)
{
    /// <summary>True when GitHub will show only some of the errors or warnings (10 of each per step).</summary>
    public bool OverGitHubLimit => Errors > GitHubAnnotations.ErrorLimitPerStep || Warnings > GitHubAnnotations.WarningLimitPerStep;
}
