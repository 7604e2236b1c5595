using SpecLint.Core.Text;

namespace SpecLint.Rules.Engine;

/// <summary>One problem found in one spec, located at the key that drives it.</summary>
/// <param name="RuleId">The rule that reported it.</param>
/// <param name="Severity">Its severity after configuration.</param>
/// <param name="File">The spec file as given on the command line.</param>
/// <param name="Pointer">JSON Pointer of the key the finding is about.</param>
/// <param name="Line">1-based line.</param>
/// <param name="Column">1-based column.</param>
/// <param name="Message">The measured figure, the limit and what to do, in plain words.</param>
/// <param name="Fix">A re-checked replacement value, when the rule can name one.</param>
/// <param name="Waived">True when a live waiver in the spec covers it.</param>
/// <param name="WaiverReason">The waiver's reason, when waived.</param>
public sealed record Finding(
    string RuleId,
    Severity Severity,
    string File,
    string Pointer,
    int Line,
    int Column,
    string Message,
    FixSuggestion? Fix = null,
    bool Waived = false,
    string? WaiverReason = null)
{
    /// <summary>The spec file as given, control characters shown as escapes (see <see cref="TextSafety"/>).</summary>
    public string File { get; init; } = TextSafety.ForTerminal(File);

    /// <summary>The message, control characters shown as escapes: it may quote a value from the file.</summary>
    public string Message { get; init; } = TextSafety.ForTerminal(Message);

    /// <summary>The waiver's reason as written in the spec, control characters shown as escapes.</summary>
    public string? WaiverReason { get; init; } = WaiverReason is null ? null : TextSafety.ForTerminal(WaiverReason);

    /// <summary>
    /// The gain setting the finding belongs to (a switched setting's name, or an adjustable Rf's position), or null
    /// for a single-gain channel and for findings every setting shares.
    /// </summary>
    public string? Setting { get; init; }

    /// <summary>The terminal form of references.md §D6: <c>file:line:col: severity rule-id: message [setting name]</c>.</summary>
    public override string ToString() =>
        $"{File}:{Line}:{Column}: {Severity.Name()} {RuleId}: {Message}{SettingSuffix}{(Waived ? " (waived: " + WaiverReason + ")" : "")}";

    /// <summary>" [setting name]" for a finding of one setting, else empty.</summary>
    public string SettingSuffix => Setting is null ? "" : $" [setting {TextSafety.ForTerminal(Setting)}]";
}
