using SpecLint.Core.Analysis;
using SpecLint.Core.Analysis.Tolerance;
using SpecLint.Core.Spec.Model;
using SpecLint.Core.Units;
using static SpecLint.Core.Tests.Tolerance.TolerantSpecs;

namespace SpecLint.Core.Tests.Tolerance;

public sealed class CornerSearchTests
{
    /// <summary>Five spreads that all move the loop; 5 levels each make a 3125-point brute-force grid.</summary>
    private static TiaSpec FiveSpreads() => Channel(
        rf: Rel<Resistance>(1e6, 1),
        cf: Rel<Capacitance>(2.2e-12, 10),
        sensor: Rel<Capacitance>(12e-12, 20),
        gbw: Rel<Frequency>(8e6, 30),
        secondPole: Rel<Frequency>(40e6, 20));

    [Fact]
    public void Corner_extremes_match_or_beat_a_brute_force_grid()
    {
        var spec = FiveSpreads();
        var r = ToleranceAnalyzer.Analyze(spec, ToleranceOptions.CornersOnly)!;

        var nominal = CircuitFactory.Nominal(spec);
        double[] levels = [-1, -0.5, 0, 0.5, 1];
        double pmMin = double.MaxValue, pmMax = double.MinValue, bwMin = double.MaxValue, bwMax = double.MinValue, peakMax = double.MinValue;
        foreach (var a in levels)
        {
            foreach (var b in levels)
            {
                foreach (var c in levels)
                {
                    foreach (var d in levels)
                    {
                        foreach (var e in levels)
                        {
                            var circuit = nominal with
                            {
                                Rf = new Resistance(1e6 * (1 + (0.01 * a))),
                                Cf = new Capacitance(2.2e-12 * (1 + (0.1 * b))),
                                SensorCapacitance = new Capacitance(12e-12 * (1 + (0.2 * c))),
                                Gbw = new Frequency(8e6 * (1 + (0.3 * d))),
                                SecondPole = new Frequency(40e6 * (1 + (0.2 * e))),
                            };
                            var x = TiaAnalyzer.Analyze(circuit, AnalysisOptions.WithoutNoise);
                            pmMin = Math.Min(pmMin, x.PhaseMargin!.Value.Degrees);
                            pmMax = Math.Max(pmMax, x.PhaseMargin!.Value.Degrees);
                            bwMin = Math.Min(bwMin, x.Bandwidth!.Value.Hertz);
                            bwMax = Math.Max(bwMax, x.Bandwidth!.Value.Hertz);
                            peakMax = Math.Max(peakMax, x.PeakingDb);
                        }
                    }
                }
            }
        }

        // The minima sit at vertices (references.md §4 item 13), which the grid contains: equal to rounding.
        Assert.Equal(pmMin, r.PhaseMarginMin!.Value.Degrees, 1e-9);
        Assert.Equal(bwMin, r.BandwidthMin!.Value.Hertz, bwMin * 1e-12);
        // The maxima may lie between grid points: the search must find at least as much.
        Assert.True(r.PhaseMarginMax!.Value.Degrees >= pmMax - 1e-9, $"{r.PhaseMarginMax.Value.Degrees} < grid {pmMax}");
        Assert.True(r.BandwidthMax!.Value.Hertz >= bwMax * (1 - 1e-12), $"{r.BandwidthMax.Value.Hertz} < grid {bwMax}");
        Assert.True(r.PeakingDbMax >= peakMax - 1e-9, $"{r.PeakingDbMax} < grid {peakMax}");
        Assert.False(r.UnstableCornerExists);
    }

    [Fact]
    public void Each_reported_corner_reproduces_its_value()
    {
        var spec = FiveSpreads();
        var r = ToleranceAnalyzer.Analyze(spec, ToleranceOptions.CornersOnly)!;
        AnalysisResult At(Corner c) => TiaAnalyzer.Analyze(ToleranceAnalyzer.CircuitAt(spec, c), AnalysisOptions.WithoutNoise);
        Assert.Equal(r.PhaseMarginMin!.Value.Degrees, At(r.PhaseMarginMinAt).PhaseMargin!.Value.Degrees, 1e-12);
        Assert.Equal(r.PhaseMarginMax!.Value.Degrees, At(r.PhaseMarginMaxAt!).PhaseMargin!.Value.Degrees, 1e-12);
        Assert.Equal(r.BandwidthMin!.Value.Hertz, At(r.BandwidthMinAt).Bandwidth!.Value.Hertz, 1e-6);
        Assert.Equal(r.BandwidthMax!.Value.Hertz, At(r.BandwidthMaxAt).Bandwidth!.Value.Hertz, 1e-6);
        Assert.Equal(r.PeakingDbMax, At(r.PeakingMaxAt).PeakingDb, 1e-12);
    }

    [Fact]
    public void The_worst_phase_margin_corner_names_low_Cf_and_high_sensor_capacitance()
    {
        // Less Cf and more Cin move the 1/β zero down and raise the noise-gain plateau: less margin ([G], references.md §1 row 4).
        var r = ToleranceAnalyzer.Analyze(FiveSpreads(), ToleranceOptions.CornersOnly)!;
        var at = r.PhaseMarginMinAt.Settings.ToDictionary(s => s.Label, s => s.End);
        Assert.Equal(CornerEnd.Low, at["Cf"]);
        Assert.Equal(CornerEnd.High, at["Csensor"]);
        Assert.Contains("Cf low (1.98 pF)", r.PhaseMarginMinAt.Describe(), StringComparison.Ordinal);
    }

    /// <summary>
    /// PM against GBW with a fixed second pole (references.md §4 item 13): at low GBW the crossover sits below the
    /// 1/β pole where the noise gain still rises, at high GBW it runs into the second pole; the margin peaks between.
    /// </summary>
    private static TiaSpec GbwSweep() => Channel(
        gbw: new Spread<Frequency>(new Frequency(1e6), new Frequency(1e6), new Frequency(100e6), ToleranceForm.Range),
        secondPole: Exact<Frequency>(60e6));

    [Fact]
    public void An_interior_phase_margin_maximum_is_found_inside_the_box()
    {
        var spec = GbwSweep();
        var nominal = CircuitFactory.Nominal(spec);
        double Pm(double gbw) => TiaAnalyzer.Analyze(nominal with { Gbw = new Frequency(gbw) }, AnalysisOptions.WithoutNoise).PhaseMargin!.Value.Degrees;
        var dense = Enumerable.Range(0, 2001).Select(i => 1e6 + (i * (99e6 / 2000))).Select(Pm).Max();
        var vertices = Math.Max(Pm(1e6), Pm(100e6));
        Assert.True(dense > vertices + 5, $"the case needs a clear interior maximum: dense {dense}°, vertices {vertices}°");

        var r = ToleranceAnalyzer.Analyze(spec, ToleranceOptions.CornersOnly)!;
        Assert.True(r.PhaseMarginMax!.Value.Degrees >= dense - 1e-6, $"search {r.PhaseMarginMax.Value.Degrees}° < dense {dense}°");
        Assert.Equal(CornerEnd.Inside, r.PhaseMarginMaxAt!.Settings.Single(s => s.Label == "GBW").End);

        var verticesOnly = ToleranceAnalyzer.Analyze(spec, ToleranceOptions.CornersOnly with { SearchInterior = false })!;
        // Without the search only the vertices (the typical value is the low end here) are seen.
        Assert.Equal(vertices, verticesOnly.PhaseMarginMax!.Value.Degrees, 1e-9);
        Assert.True(verticesOnly.PhaseMarginMax.Value.Degrees < dense - 1);
    }

    [Fact]
    public void The_minimum_phase_margin_stays_at_a_vertex_when_the_maximum_is_inside()
    {
        var r = ToleranceAnalyzer.Analyze(GbwSweep(), ToleranceOptions.CornersOnly)!;
        Assert.NotEqual(CornerEnd.Inside, r.PhaseMarginMinAt.Settings.Single(s => s.Label == "GBW").End);
    }

    [Fact]
    public void A_corner_where_the_loop_gain_never_reaches_one_makes_the_minimum_undefined()
    {
        // references.md §4 item 1: undefined when A0·Rsh/(Rsh + Rf) < 1; 5 × 0.1/1.1 = 0.45 at Rsh = 100 kΩ, 4.5 at 10 MΩ.
        var spec = Channel(
            rsh: new Spread<Resistance>(new Resistance(1e6), new Resistance(100e3), new Resistance(10e6), ToleranceForm.Range),
            a0: new Gain(5));
        var r = ToleranceAnalyzer.Analyze(spec, ToleranceOptions.CornersOnly)!;
        Assert.Null(r.PhaseMarginMin);
        Assert.True(r.UnstableCornerExists);
        Assert.Equal(CornerEnd.Low, r.PhaseMarginMinAt.Settings.Single(s => s.Label == "Rsh").End);
        Assert.NotNull(r.PhaseMarginMax);
    }

    [Fact]
    public void A_spec_without_spreads_has_no_tolerance_result()
    {
        Assert.Null(ToleranceAnalyzer.Analyze(Channel(), ToleranceOptions.CornersOnly));
    }

    [Fact]
    public void Temperature_alone_varies_but_leaves_the_loop_alone_with_a_C0G_capacitor_at_25_degrees_nominal()
    {
        var spec = Channel(temperature: Range(-10, 60));
        var r = ToleranceAnalyzer.Analyze(spec, ToleranceOptions.CornersOnly)!;
        var nominal = TiaAnalyzer.Analyze(CircuitFactory.Nominal(spec), AnalysisOptions.WithoutNoise);
        Assert.Equal("T", Assert.Single(r.VariedParameters).Label);
        Assert.Equal(nominal.PhaseMargin!.Value.Degrees, r.PhaseMarginMin!.Value.Degrees, 1e-12);
    }

    [Fact]
    public void Ib_doubles_every_10_kelvin_in_the_corner_circuits()
    {
        // Common practice for FET inputs: Ib doubles every 10 K; 60 °C is 35 K above 25 °C.
        var spec = Channel(temperature: Range(-10, 60), biasCurrent: 1e-12);
        var r = ToleranceAnalyzer.Analyze(spec, ToleranceOptions.CornersOnly)!;
        var hot = r.PhaseMarginMinAt with
        {
            Settings = [.. r.PhaseMarginMinAt.Settings.Select(s => s.Label == "T" ? s with { End = CornerEnd.High, SiValue = Temperature.FromCelsius(60).Kelvin } : s)],
        };
        var c = ToleranceAnalyzer.CircuitAt(spec, hot);
        Assert.Equal(1e-12 * Math.Pow(2, 3.5), c.Ib.Amperes, 1e-24);
        Assert.Equal(Temperature.FromCelsius(60).Kelvin, c.Temperature.Kelvin, 1e-9);
        var flat = ToleranceAnalyzer.CircuitAt(spec, hot, ToleranceOptions.CornersOnly with { BiasCurrentDoublingKelvin = double.PositiveInfinity });
        Assert.Equal(1e-12, flat.Ib.Amperes, 1e-24);
    }

    [Fact]
    public void The_dielectric_is_a_separate_factor_on_top_of_Cf_tolerance()
    {
        // references.md §4 item 13: the dielectric and Cf's own tolerance are separate factors; X7R ±15 % (§3.6).
        var spec = Channel(cf: Rel<Capacitance>(10e-12, 5), dielectric: "X7R", temperature: Range(-10, 60));
        var r = ToleranceAnalyzer.Analyze(spec, ToleranceOptions.CornersOnly)!;
        var d = r.VariedParameters.Single(p => p.Pointer == "/feedback/dielectric");
        Assert.Equal("×0.85", d.Low);
        Assert.Equal("×1.15", d.High);
        var c = ToleranceAnalyzer.CircuitAt(spec, r.PhaseMarginMinAt);
        Assert.Equal(10e-12 * 0.95 * 0.85, c.Cf.Farads, 1e-24);
    }

    [Fact]
    public void A_letter_code_C_on_a_small_capacitor_is_an_absolute_quarter_picofarad()
    {
        // references.md §3.5 (IEC 60062, from memory): 0.68 pF "C" means ±0.25 pF, which is ±37 %.
        var parsed = QuantityParser.Parse("0.68 pF C", Dimension.Capacitance);
        var spec = Channel(cf: Spread<Capacitance>.From(parsed));
        var r = ToleranceAnalyzer.Analyze(spec, ToleranceOptions.CornersOnly)!;
        var cf = r.VariedParameters.Single(p => p.Label == "Cf");
        Assert.True(cf.Low == "0.43 pF" && cf.High == "0.93 pF", $"{cf.Low} .. {cf.High}: {cf.Source}");
        Assert.Equal("0.43 pF", cf.Low);
        Assert.Equal("0.93 pF", cf.High);
        Assert.True(cf.Source.Contains("±0.25 pF", StringComparison.Ordinal), cf.Source);
        var low = ToleranceAnalyzer.CircuitAt(spec, r.PhaseMarginMinAt).Cf.Farads;
        Assert.Equal(0.37, 1 - (low / 0.68e-12), 0.005);
    }

    [Fact]
    public void Past_the_vertex_cap_the_most_influential_parameters_are_enumerated_and_the_search_covers_the_rest()
    {
        var spec = FiveSpreads();
        var full = ToleranceAnalyzer.Analyze(spec, ToleranceOptions.CornersOnly)!;
        var capped = ToleranceAnalyzer.Analyze(spec, ToleranceOptions.CornersOnly with { MaxVertexParameters = 2 })!;
        Assert.Equal(5, full.VertexParameters);
        Assert.Equal(2, capped.VertexParameters);
        Assert.Equal(full.PhaseMarginMin!.Value.Degrees, capped.PhaseMarginMin!.Value.Degrees, 0.05);
        Assert.Equal(full.BandwidthMin!.Value.Hertz, capped.BandwidthMin!.Value.Hertz, full.BandwidthMin.Value.Hertz * 1e-3);
    }
}
