namespace SpecLint.Core.Config;

/// <summary>A severity as written in <c>.speclint.yaml</c> (SARIF's levels, plus off for a rule).</summary>
internal enum ConfigSeverity
{
    /// <summary>The rule does not run.</summary>
    Off,

    /// <summary>SARIF note.</summary>
    Note,

    /// <summary>SARIF warning.</summary>
    Warning,

    /// <summary>SARIF error.</summary>
    Error,
}
