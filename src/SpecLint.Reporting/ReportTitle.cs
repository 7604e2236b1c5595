namespace SpecLint.Reporting;

/// <summary>The title reports carry when none is given, kept in one place so check and merge write the same heading.</summary>
internal static class ReportTitle
{
    /// <summary>The first heading of the Markdown and HTML reports and the job summary.</summary>
    public const string Default = "SpecLint report";
}
