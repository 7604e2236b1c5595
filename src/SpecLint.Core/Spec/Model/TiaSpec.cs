using System.Collections.Immutable;
using SpecLint.Core.Units;

namespace SpecLint.Core.Spec.Model;

/// <summary>One transimpedance front-end channel as written in a spec file (references.md §D3), typed and immutable.</summary>
/// <param name="File">The path the spec was read from, as given on the command line (used in every message).</param>
/// <param name="FormatVersion">The <c>spec</c> key.</param>
/// <param name="Kind">The <c>kind</c> key; "transimpedance" in v1.</param>
/// <param name="Name">The channel's unique id.</param>
/// <param name="Title">Free text, or null.</param>
/// <param name="Tags">Tags for house rules and reports.</param>
/// <param name="Conditions">Temperature and supply.</param>
/// <param name="Bias">Voltage on the non-inverting input.</param>
/// <param name="Input">The sensor.</param>
/// <param name="Amplifier">The op-amp.</param>
/// <param name="Feedback">Rf, Cf and their parasitics.</param>
/// <param name="Board">Layout parasitics at the summing node.</param>
/// <param name="Requirements">What the channel must achieve; null members fall back to the house defaults.</param>
/// <param name="Waivers">Accepted exceptions to rules.</param>
/// <param name="Locations">Where each key sits in the file, by JSON Pointer.</param>
public sealed record TiaSpec(
    string File,
    int FormatVersion,
    string Kind,
    string Name,
    string? Title,
    ImmutableArray<string> Tags,
    Conditions Conditions,
    Spread<Voltage> Bias,
    SensorInput Input,
    Amplifier Amplifier,
    Feedback Feedback,
    Board Board,
    Requirements Requirements,
    ImmutableArray<Waiver> Waivers,
    SourceMap Locations)
{
    /// <summary>
    /// The gain setting this spec describes: a switched setting's name or an adjustable Rf's position (e.g.
    /// "Rf 182 kΩ"); null for a single-gain channel. The engine checks one such view of the spec per setting.
    /// </summary>
    public string? Setting { get; init; }

    /// <summary>How this view's keys map onto the file's: view prefix → file prefix, longest first (empty for the file itself).</summary>
    internal System.Collections.Immutable.ImmutableArray<(string View, string File)> SettingPointers { get; init; } = [];

    /// <summary>The spec as its file gives the channel, before a setting was selected; null for the file's own spec.</summary>
    internal TiaSpec? Channel { get; init; }
}
