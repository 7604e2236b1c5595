namespace SpecLint.Core.Spec.Model;

/// <summary>The kind of sensor driving the summing node.</summary>
public enum SensorType
{
    Photodiode,
    Phototransistor,
    CurrentSource,
    Electrode,
}
