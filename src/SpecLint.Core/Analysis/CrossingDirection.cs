namespace SpecLint.Core.Analysis;

/// <summary>Which way |T| passes through 1 at a loop-gain crossing.</summary>
public enum CrossingDirection
{
    /// <summary>|T| falls through 1 going up in frequency; the phase margin is read at such a crossing.</summary>
    Falling,

    /// <summary>|T| rises through 1, e.g. a loop that starts below 1 and is lifted by the feedback zero.</summary>
    Rising,
}
