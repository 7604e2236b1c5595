namespace SpecLint.Reporting.Plots;

/// <summary>How <see cref="TransimpedanceChart"/> shows |Zt|.</summary>
internal enum TransimpedanceScale
{
    /// <summary>Ohms on a logarithmic axis, labelled "1 MΩ".</summary>
    Ohms,

    /// <summary>dBΩ (20·log10 |Zt| / 1 Ω) on a linear axis.</summary>
    DecibelOhms,
}
