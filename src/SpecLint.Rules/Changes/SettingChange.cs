using System.Collections.Immutable;
using SpecLint.Rules.Checking;

namespace SpecLint.Rules.Changes;

/// <summary>
/// One gain setting of a changed spec with more than one gain, its base and head outcomes paired by the setting's
/// name. A name is what a reviewer and a waiver use for a range, so a setting renamed on the head is a removed
/// one and an added one, like a finding's identity (which also includes the setting).
/// </summary>
/// <param name="Name">The setting's name (or an adjustable Rf's position).</param>
/// <param name="Before">The setting at the base, or null (added on the head, or no base version).</param>
/// <param name="After">The setting on the head, or null (removed on the head, or the spec was deleted).</param>
/// <param name="Status">"added" or "removed" when the setting is on one side only while the spec has both; else null.</param>
internal sealed record SettingChange(string Name, SettingOutcome? Before, SettingOutcome? After, string? Status)
{
    /// <summary>The base figures of this setting, or null.</summary>
    public MetricSnapshot? MetricsBefore => MetricSnapshot.Of(Before);

    /// <summary>The head figures of this setting, or null.</summary>
    public MetricSnapshot? MetricsAfter => MetricSnapshot.Of(After);

    /// <summary>
    /// The settings of both versions, head order first and then the ones only the base has, in base order (so the
    /// output does not depend on anything but the two files); empty when neither version has more than one gain.
    /// </summary>
    public static ImmutableArray<SettingChange> Pair(SpecOutcome? before, SpecOutcome? after)
    {
        var baseSettings = before?.Settings ?? [];
        var headSettings = after?.Settings ?? [];
        if (baseSettings.IsDefaultOrEmpty && headSettings.IsDefaultOrEmpty)
        {
            return [];
        }

        baseSettings = baseSettings.IsDefault ? [] : baseSettings;
        headSettings = headSettings.IsDefault ? [] : headSettings;
        // A whole spec added or deleted already says so in its own status; its settings are not "added" on top.
        var bothVersions = before is not null && after is not null;
        var pairs = new List<SettingChange>();
        foreach (var head in headSettings)
        {
            var match = baseSettings.FirstOrDefault(b => string.Equals(b.Name, head.Name, StringComparison.Ordinal));
            pairs.Add(new SettingChange(head.Name, match, head, match is null && bothVersions ? "added" : null));
        }

        foreach (var gone in baseSettings.Where(b => !headSettings.Any(h => string.Equals(h.Name, b.Name, StringComparison.Ordinal))))
        {
            pairs.Add(new SettingChange(gone.Name, gone, null, bothVersions ? "removed" : null));
        }

        return [.. pairs];
    }
}
