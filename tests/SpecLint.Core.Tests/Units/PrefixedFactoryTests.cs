using SpecLint.Core.Units;

namespace SpecLint.Core.Tests.Units;

public sealed class PrefixedFactoryTests
{
    [Fact]
    public void Prefixed_factories_and_accessors_round_trip_through_SI()
    {
        // SI prefixes (common practice): p = 1e-12, M = 1e6, µ = 1e-6.
        Assert.Equal(2.2e-12, Capacitance.FromPicofarads(2.2).Farads, 1e-24);
        Assert.Equal(2.2, Capacitance.FromPicofarads(2.2).Picofarads, 12);
        Assert.Equal(4.7e6, Resistance.FromMegaohms(4.7).Ohms, 6);
        Assert.Equal(10, Frequency.FromHertz(10e6).Megahertz, 12);
        Assert.Equal(10e6, SlewRate.FromVoltsPerMicrosecond(10).VoltsPerSecond, 6);
        Assert.Equal(7, VoltageNoiseDensity.FromNanovoltsPerRootHertz(7).NanovoltsPerRootHertz, 12);
        Assert.Equal(50, Current.FromPicoamperes(50).Picoamperes, 12);
    }

    [Fact]
    public void Angular_frequency_differs_from_hertz_by_two_pi()
    {
        // ω = 2π·f (common practice).
        Assert.Equal(1000, Frequency.FromRadiansPerSecond(2 * Math.PI * 1000).Hertz, 9);
        Assert.Equal(2 * Math.PI * 50, Frequency.FromHertz(50).RadiansPerSecond, 9);
    }
}
