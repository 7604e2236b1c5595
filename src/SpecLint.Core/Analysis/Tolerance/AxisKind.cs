namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>Which circuit value a tolerance axis moves.</summary>
internal enum AxisKind
{
    FeedbackResistance,
    FeedbackCapacitance,
    Dielectric,
    ParasiticCapacitance,
    SensorCapacitance,
    ShuntResistance,
    StrayCapacitance,
    Gbw,
    SecondPole,
    Temperature,
    SupplyPositive,
    SupplyNegative,
    DarkCurrent,
    Bias,
    SeriesResistance,
}
