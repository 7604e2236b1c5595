using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;

namespace SpecLint.Rules.Fixes;

/// <summary>Copies of a spec with one part changed, keeping the part's tolerance, for re-checking a fix.</summary>
public static class SpecEdits
{
    /// <summary>The spec with feedback capacitance <paramref name="cf"/> (same tolerance; ±10 % when there was no Cf).</summary>
    public static TiaSpec WithCf(TiaSpec spec, Capacitance cf)
    {
        ArgumentNullException.ThrowIfNull(spec);
        var spread = spec.Feedback.Capacitance is { } old ? old.Retarget(cf) : Spread<Capacitance>.Exact(cf);
        return spec with { Feedback = spec.Feedback with { Capacitance = spread } };
    }

    /// <summary>The spec with feedback resistance <paramref name="rf"/> (same tolerance).</summary>
    public static TiaSpec WithRf(TiaSpec spec, Resistance rf)
    {
        ArgumentNullException.ThrowIfNull(spec);
        return spec with { Feedback = spec.Feedback with { Resistance = spec.Feedback.Resistance.Retarget(rf) } };
    }

    /// <summary>The text a fix writes at /feedback/capacitance for <paramref name="cf"/>, keeping the tolerance as written.</summary>
    public static string CfText(TiaSpec spec, Capacitance cf) =>
        spec.Feedback.Capacitance is { } old ? old.TextAt(cf) : cf.ToString();

    /// <summary>The text a fix writes at /feedback/resistance for <paramref name="rf"/>, keeping the tolerance as written.</summary>
    public static string RfText(TiaSpec spec, Resistance rf) => spec.Feedback.Resistance.TextAt(rf);

    /// <summary>The JSON Pointer of the part that differs between two versions of a spec, or null.</summary>
    public static string? ChangedPointer(TiaSpec original, TiaSpec candidate)
    {
        ArgumentNullException.ThrowIfNull(original);
        ArgumentNullException.ThrowIfNull(candidate);
        if (original.Feedback.Capacitance != candidate.Feedback.Capacitance)
        {
            return "/feedback/capacitance";
        }

        if (original.Feedback.Resistance != candidate.Feedback.Resistance)
        {
            return "/feedback/resistance";
        }

        return original.Feedback.Dielectric != candidate.Feedback.Dielectric ? "/feedback/dielectric" : null;
    }
}
