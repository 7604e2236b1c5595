using System.Collections.Immutable;
using SpecLint.Core.Config;
using SpecLint.Core.Spec;
using SpecLint.Core.Spec.Schema;
using SpecLint.Core.Units;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Checking;

/// <summary>
/// Turns a loaded <c>.speclint.yaml</c> into per-rule configuration and checks it against the rules that
/// exist: an unknown rule id, an option a rule does not declare, or a value in the wrong unit is a
/// <c>config-invalid</c> error at its line, never silently ignored.
/// </summary>
internal static class ConfigurationBinding
{
    /// <summary>The configuration of one rule.</summary>
    public static RuleConfiguration For(RepoConfig config, string ruleId)
    {
        ArgumentNullException.ThrowIfNull(config);
        if (config.ForRule(ruleId) is not { } s)
        {
            return RuleConfiguration.Default;
        }

        Severity? severity = s.Severity switch
        {
            ConfigSeverity.Error => Severity.Error,
            ConfigSeverity.Warning => Severity.Warning,
            ConfigSeverity.Note => Severity.Note,
            _ => null,
        };
        return new RuleConfiguration(
            s.IsOff,
            severity,
            s.Options.ToImmutableDictionary(o => o.Key, o => o.Value.RawText, StringComparer.Ordinal),
            s.Options.ToImmutableDictionary(o => o.Key, o => o.Value.Position, StringComparer.Ordinal),
            config.Path);
    }

    /// <summary>The fail level a configuration sets.</summary>
    public static Severity FailOn(RepoConfig config) => config.FailOn switch
    {
        ConfigSeverity.Warning => Severity.Warning,
        ConfigSeverity.Note => Severity.Note,
        _ => Severity.Error,
    };

    /// <summary>Problems with the rule section of a configuration, as <c>config-invalid</c> findings.</summary>
    public static IEnumerable<Finding> Validate(RepoConfig config, RuleCatalog catalog, string displayPath)
    {
        ArgumentNullException.ThrowIfNull(config);
        ArgumentNullException.ThrowIfNull(catalog);
        foreach (var (id, settings) in config.Rules.OrderBy(r => r.Key, StringComparer.Ordinal))
        {
            var rule = catalog.Find(id);
            if (rule is null)
            {
                var known = catalog.Rules.Select(r => r.Descriptor.Id).ToList();
                // Case is ignored when suggesting: "Phase-Margin" is plainly phase-margin.
                var hint = known.FirstOrDefault(k => string.Equals(k, id, StringComparison.OrdinalIgnoreCase)) is { } same
                    ? $" (did you mean '{same}'? ids are lower case)"
                    : EditDistance.Closest(id.ToLowerInvariant(), known) is { } s ? $" (did you mean '{s}'?)" : "";
                yield return Problem(displayPath, KeyOf(settings.Position), "/rules/" + id, $"rules: '{id}' is not a rule{hint}; 'speclint rules' lists the ids");
                continue;
            }

            foreach (var (key, option) in settings.Options.OrderBy(o => o.Key, StringComparer.Ordinal))
            {
                var declared = rule.Descriptor.Options.FirstOrDefault(o => o.Key == key);
                if (declared is null)
                {
                    var keys = rule.Descriptor.Options.Select(o => o.Key).ToList();
                    var hint = EditDistance.Closest(key, keys) is { } s ? $" (did you mean '{s}'?)" : "";
                    var allowed = keys.Count == 0 ? "it has no options besides severity" : "its options are " + string.Join(", ", keys);
                    yield return Problem(displayPath, KeyOf(option.Position), $"/rules/{id}/{key}", $"rules.{id}: unknown option '{key}'{hint}; {allowed}");
                    continue;
                }

                if (!OptionValues.TryRead(declared, option.RawText, out _, out var error))
                {
                    yield return Problem(displayPath, option.Position, $"/rules/{id}/{key}",
                        $"rules.{id}.{key}: {error}; write e.g. \"{declared.Default}\"");
                }
            }
        }
    }

    // An unknown id or option key is a problem with the key, so the editor should land on the key, not its value.
    private static SourcePosition KeyOf(SourcePosition value) =>
        value.KeyLine > 0 ? value with { Line = value.KeyLine, Column = value.KeyColumn } : value;

    private static Finding Problem(string file, SourcePosition at, string pointer, string message) =>
        new(RuleIds.ConfigInvalid, Severity.Error, file, pointer, at.Line, at.Column, message);
}
