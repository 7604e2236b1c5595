namespace SpecLint.Core.Units;

/// <summary>How a spread was written; reports echo it and the tolerance analysis reads it.</summary>
public enum ToleranceForm
{
    /// <summary>A single exact value.</summary>
    None,

    /// <summary>Relative, e.g. ±5 % or +10 %/-20 %.</summary>
    Relative,

    /// <summary>Absolute, e.g. ±0.25 pF.</summary>
    Absolute,

    /// <summary>An IEC 60062 letter code such as C or J.</summary>
    LetterCode,

    /// <summary>A range a .. b or a {min, typ, max} map.</summary>
    Range,
}
