namespace SpecLint.Analyzers;

/// <summary>
/// The diagnostic ids, allocated here only. Numbers are never reused: a retired id leaves a gap.
/// </summary>
public static class DiagnosticIds
{
    /// <summary>A literal into a quantity factory whose magnitude is implausible for the factory's unit.</summary>
    public const string ImplausibleMagnitude = "SLU0001";

    /// <summary>A raw reading in one unit stored under a name that carries another unit or dimension.</summary>
    public const string UnitNameMismatch = "SLU0002";

    /// <summary>A sum or comparison of raw readings in different dimensions or units.</summary>
    public const string MixedUnitArithmetic = "SLU0003";

    /// <summary>A Celsius reading in a kT product.</summary>
    public const string CelsiusInThermalProduct = "SLU0004";

    /// <summary>Degrees where radians are expected, or radians compared with a degree threshold.</summary>
    public const string DegreesAsRadians = "SLU0005";

    /// <summary>An angular frequency 1/(R·C) or 1/√(L·C) used as hertz.</summary>
    public const string AngularFrequencyAsHertz = "SLU0006";

    /// <summary>A decibel value converted with the wrong scale, or a ratio used as decibels.</summary>
    public const string DecibelScale = "SLU0007";

    /// <summary>A rule option read as a quantity of another dimension than its descriptor declares.</summary>
    public const string OptionDimensionMismatch = "SLU0008";

    /// <summary>The repository folder of the pages, one per id (the same base the rule pages use).</summary>
    public const string HelpBase = "https://github.com/speclint/speclint/blob/main/docs/analyzers";

    /// <summary>Where an id's page lives.</summary>
    public static string HelpLink(string id) => HelpBase + "/" + id + ".md";
}
