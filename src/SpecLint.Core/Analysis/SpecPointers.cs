namespace SpecLint.Core.Analysis;

/// <summary>JSON Pointers of the spec keys an <see cref="ISpreadPicker"/> is asked about (references.md §D3 key names).</summary>
public static class SpecPointers
{
    /// <summary>Feedback resistance.</summary>
    public const string FeedbackResistance = "/feedback/resistance";

    /// <summary>Feedback capacitance.</summary>
    public const string FeedbackCapacitance = "/feedback/capacitance";

    /// <summary>Parasitic capacitance across Rf.</summary>
    public const string ParasiticCapacitance = "/feedback/parasitic-capacitance";

    /// <summary>Sensor capacitance.</summary>
    public const string SensorCapacitance = "/input/capacitance";

    /// <summary>Sensor shunt resistance.</summary>
    public const string ShuntResistance = "/input/shunt-resistance";

    /// <summary>An electrode's access resistance.</summary>
    public const string SeriesResistance = "/input/series-resistance";

    /// <summary>Sensor dark current.</summary>
    public const string DarkCurrent = "/input/dark-current";

    /// <summary>Board stray capacitance.</summary>
    public const string StrayCapacitance = "/board/stray-capacitance";

    /// <summary>Gain-bandwidth product.</summary>
    public const string Gbw = "/amplifier/gbw";

    /// <summary>Second pole.</summary>
    public const string SecondPole = "/amplifier/second-pole";

    /// <summary>Bias current.</summary>
    public const string BiasCurrent = "/amplifier/bias-current";

    /// <summary>Offset voltage.</summary>
    public const string OffsetVoltage = "/amplifier/offset-voltage";

    /// <summary>Bias voltage.</summary>
    public const string Bias = "/bias";

    /// <summary>Positive supply.</summary>
    public const string SupplyPositive = "/conditions/supply/positive";

    /// <summary>Negative supply.</summary>
    public const string SupplyNegative = "/conditions/supply/negative";
}
