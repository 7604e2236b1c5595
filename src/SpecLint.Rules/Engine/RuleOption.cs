using SpecLint.Core.Units;

namespace SpecLint.Rules.Engine;

/// <summary>
/// A threshold a rule reads from <c>.speclint.yaml</c> (<c>rules: &lt;id&gt;: { key: value }</c>). Options are
/// declared on the rule so that configuration typos are caught and the docs list them.
/// </summary>
/// <param name="Key">The configuration key, e.g. "floor".</param>
/// <param name="Dimension">The value's dimension; parsed with the quantity grammar.</param>
/// <param name="Default">The default, written as a user would, e.g. "45 deg".</param>
/// <param name="Description">One line for the docs and <c>speclint why</c>.</param>
public sealed record RuleOption(string Key, Dimension Dimension, string Default, string Description)
{
    /// <summary>The default in SI.</summary>
    public double DefaultSi => QuantityParser.ParseSingle(Default, Dimension);
}
