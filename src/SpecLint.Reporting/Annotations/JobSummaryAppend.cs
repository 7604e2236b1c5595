namespace SpecLint.Reporting.Annotations;

/// <summary>What <see cref="JobSummary.Append"/> did.</summary>
/// <param name="BytesWritten">UTF-8 bytes appended, the truncation note included.</param>
/// <param name="Truncated">True when only part of the Markdown fitted under GitHub's 1 MiB.</param>
internal sealed record JobSummaryAppend(long BytesWritten, bool Truncated);
