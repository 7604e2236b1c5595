using System.Collections.Immutable;

namespace SpecLint.Core.Analysis.Tolerance;

/// <summary>One point of the tolerance box: the setting of every varied parameter.</summary>
/// <param name="Settings">Settings in a stable order (the order of <see cref="ToleranceResult.VariedParameters"/>).</param>
public sealed record Corner(ImmutableArray<CornerSetting> Settings)
{
    /// <summary>A readable description naming the parameters away from typical, e.g. "Cf low (0.75 pF), GBW low (5.6 MHz)".</summary>
    public string Describe()
    {
        var away = Settings.Where(s => s.End != CornerEnd.Typical).ToList();
        return away.Count == 0
            ? "all typical"
            : string.Join(", ", away.Select(s => $"{s.Label} {s.End.ToString().ToLowerInvariant()} ({s.Value})"));
    }
}
