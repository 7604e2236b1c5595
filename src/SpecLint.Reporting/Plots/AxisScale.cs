namespace SpecLint.Reporting.Plots;

/// <summary>How an axis maps values to positions.</summary>
internal enum AxisScale
{
    /// <summary>Equal steps of value are equal distances (dB, degrees, volts).</summary>
    Linear,

    /// <summary>Equal ratios are equal distances, in decades with minor ticks at 2…9 (frequency, noise density).</summary>
    Log,
}
