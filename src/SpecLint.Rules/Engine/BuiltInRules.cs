using SpecLint.Rules.BuiltIn;

namespace SpecLint.Rules.Engine;

/// <summary>
/// The built-in rules of <c>rules/</c>, listed by hand: a start-up does not scan every exported type of the
/// assembly for them. <c>RuleCatalogTests</c> fails when a rule class is missing here or listed twice.
/// </summary>
internal static class BuiltInRules
{
    /// <summary>One new instance of each built-in rule.</summary>
    public static IRule[] Create() =>
    [
        new BandwidthBelowRequirementRule(),
        new ToleranceCornerFailsRule(),
        new FeedbackCapacitorTooSmallRule(),
        new HazardousVoltageRule(),
        new NoiseGainBelowMinimumStableRule(),
        new InputNoiseAboveLimitRule(),
        new OutputOutsideRailsRule(),
        new PeakingAboveLimitRule(),
        new PhaseMarginBelowFloorRule(),
        new ImplausibleValueRule(),
        new SlewRateTooLowRule(),
        new NonStandardPartValueRule(),
        new RfThermalNoiseDominatesRule(),
    ];
}
