namespace SpecLint.Rules.Engine;

/// <summary>How serious a finding is; the names and order are SARIF's levels.</summary>
public enum Severity
{
    /// <summary>Worth knowing; never fails a run unless fail-on is note.</summary>
    Note,

    /// <summary>Likely a problem on the bench.</summary>
    Warning,

    /// <summary>The design does not meet its requirements or will not work.</summary>
    Error,
}
