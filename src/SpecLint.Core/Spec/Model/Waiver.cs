namespace SpecLint.Core.Spec.Model;

/// <summary>An accepted exception to one rule for this spec.</summary>
/// <param name="Rule">The rule id waived.</param>
/// <param name="Reason">Why the exception is accepted.</param>
/// <param name="Expires">The last day the waiver holds.</param>
/// <param name="Pointer">JSON Pointer of the waiver entry, for locating messages.</param>
public sealed record Waiver(string Rule, string Reason, DateOnly Expires, string Pointer)
{
    /// <summary>The gain setting the waiver is limited to, or null for every setting.</summary>
    public string? Setting { get; init; }
}
