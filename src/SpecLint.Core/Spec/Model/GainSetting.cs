using SpecLint.Core.Units;

namespace SpecLint.Core.Spec.Model;

/// <summary>One named setting of a switched-gain channel (<c>feedback.settings</c>, references.md §D7).</summary>
/// <param name="Name">The setting's name, unique in the spec.</param>
/// <param name="Resistance">Its Rf.</param>
/// <param name="Capacitance">Its Cf, or null.</param>
/// <param name="Dielectric">Cf's dielectric code, or null.</param>
/// <param name="ParasiticCapacitance">Capacitance across its Rf (zero when not given).</param>
/// <param name="CurrentMin">The smallest signal current this setting must resolve, or null for the channel's.</param>
/// <param name="CurrentMax">This setting's full scale, or null for the channel's.</param>
/// <param name="Requirements">Requirements of this setting; its members override the channel's.</param>
/// <param name="Pointer">JSON Pointer of the setting's entry, e.g. <c>/feedback/settings/1</c>.</param>
public sealed record GainSetting(
    string Name,
    Spread<Resistance> Resistance,
    Spread<Capacitance>? Capacitance,
    string? Dielectric,
    Spread<Capacitance> ParasiticCapacitance,
    Current? CurrentMin,
    Current? CurrentMax,
    Requirements? Requirements,
    string Pointer);
