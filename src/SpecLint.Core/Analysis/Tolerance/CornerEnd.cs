namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>Where in its spread a varied parameter sits at a corner.</summary>
public enum CornerEnd
{
    /// <summary>The low limit.</summary>
    Low,

    /// <summary>The typical value.</summary>
    Typical,

    /// <summary>The high limit.</summary>
    High,

    /// <summary>Strictly inside the spread (an interior extremum found by search).</summary>
    Inside,
}
