namespace SpecLint.Rules.Engine;

/// <summary>Severity names as users type them in configuration and see them in output.</summary>
internal static class SeverityNames
{
    /// <summary>The configuration word that turns a rule off.</summary>
    public const string Off = "off";

    /// <summary>The lower-case name: error, warning, note.</summary>
    public static string Name(this Severity severity) => severity switch
    {
        Severity.Error => "error",
        Severity.Warning => "warning",
        _ => "note",
    };

    /// <summary>Parses error | warning | note; false for anything else (including "off").</summary>
    public static bool TryParse(string? text, out Severity severity)
    {
        switch (text)
        {
            case "error": severity = Severity.Error; return true;
            case "warning": severity = Severity.Warning; return true;
            case "note": severity = Severity.Note; return true;
            default: severity = Severity.Note; return false;
        }
    }
}
