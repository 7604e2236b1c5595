namespace SpecLint.Reporting.Plots;

/// <summary>One tick: its value, whether it is major (gridline and label) and its label (empty when unlabelled).</summary>
internal readonly record struct AxisTick(double Value, bool Major, string Label);
