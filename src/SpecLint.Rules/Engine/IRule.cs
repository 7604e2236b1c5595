namespace SpecLint.Rules.Engine;

/// <summary>
/// A design rule. Built-in rules under <c>rules/&lt;id&gt;/</c> and a team's house rules implement the same
/// interface; the engine discovers implementations, so adding a rule is adding a class and its page.
/// </summary>
public interface IRule
{
    /// <summary>Id, title, default severity and options.</summary>
    RuleDescriptor Descriptor { get; }

    /// <summary>Checks one spec. Reads the typed spec and its analysis from the context; never parses YAML.</summary>
    IEnumerable<Finding> Check(RuleContext context);
}
