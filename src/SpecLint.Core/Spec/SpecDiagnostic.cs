using System.Globalization;
using SpecLint.Core.Spec.Yaml;

namespace SpecLint.Core.Spec;

/// <summary>A problem in a spec or configuration file itself (YAML, schema, units, physics sanity).</summary>
/// <param name="File">The path as shown to the user.</param>
/// <param name="Line">1-based line.</param>
/// <param name="Column">1-based column.</param>
/// <param name="RuleId"><c>spec-invalid</c> for spec files, <c>config-invalid</c> for <c>.speclint.yaml</c>.</param>
/// <param name="Pointer">JSON Pointer of the key concerned ("" for the whole file).</param>
/// <param name="Message">Plain-English message with an example of the fix.</param>
internal sealed record SpecDiagnostic(string File, int Line, int Column, string RuleId, string Pointer, string Message)
{
    /// <summary>The rule id of problems in spec files.</summary>
    public const string SpecInvalid = "spec-invalid";

    /// <summary>The rule id of problems in the repository configuration.</summary>
    public const string ConfigInvalid = "config-invalid";

    /// <summary>The dotted key path of <see cref="Pointer"/>, e.g. <c>feedback.capacitance</c>, or <c>(file)</c>.</summary>
    public string KeyPath => JsonPointerText.ToKeyPath(Pointer);

    /// <summary><c>file:line:col: error spec-invalid: key.path: message</c>, the terminal form.</summary>
    public override string ToString() =>
        string.Create(CultureInfo.InvariantCulture, $"{File}:{Line}:{Column}: error {RuleId}: {KeyPath}: {Message}");
}
