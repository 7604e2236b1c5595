using System.Globalization;
using System.Text;
using SpecLint.Core.Analysis;

namespace SpecLint.Core.Tests.Ngspice;

/// <summary>
/// Writes one ngspice netlist that checks a <see cref="Circuit"/> independently of <see cref="TiaModel"/>,
/// with the technique of references.md §2: an op-amp macro from G/R/C with noiseless resistors, noise sources from
/// reverse-biased diodes scaled by CCCS/CCVS, the loop broken at the ideal op-amp output, and eight DC copies.
/// </summary>
/// <remarks>
/// Copies in the one netlist (linear and unconnected, so they do not interact):
/// z — closed loop, 1 A AC into the inverting node: V(oz) = −Zt (references.md §4 item 9);
/// t — loop broken at the VCVS output, 1 V AC driving Rf ∥ Cf: T = −V(oxt);
/// n — closed loop with the noise diodes, for <c>.noise</c>;
/// d0…d7 — DC: ±Vos × ±Ib × (idle, full scale).
/// The diodes sit at 100 V reverse bias with IS = 1 mA, where SPICE's reverse current is IS to 1e-10
/// (references.md §2 notes), so the gains use 1 mA instead of a separately measured Id. temp = tnom keeps IS at 1 mA.
/// </remarks>
internal static class NetlistWriter
{
    public const string AcFile = "ac.txt";

    public const string NoiseFile = "noise.txt";

    private const double DiodeAmperes = 1e-3;
    private const double Q = PhysicalConstants.ElementaryChargeCoulombs;

    public static string Write(Circuit c, double acStartHz, double acStopHz, double noiseLowHz, double noiseHighHz)
    {
        var sb = new StringBuilder();
        sb.AppendLine("* SpecLint cross-check");
        var celsius = F(c.Temperature.Celsius);
        sb.AppendLine($".options temp={celsius} tnom={celsius}");

        // z: transimpedance.
        Core(sb, c, "z", plus: "pbz", node: "nz", output: "oz");
        sb.AppendLine("Vbz pbz 0 DC 0");
        sb.AppendLine($"Iacz 0 {Source(c, "z", "nz")} DC 0 AC 1");

        // t: loop gain with the loop broken at the ideal op-amp output.
        Feedback(sb, c, "t", node: "nt", output: "ot", farEnd: "0");
        Amplifier(sb, c, "t", plus: "0", minus: "nt", output: "oxt");
        sb.AppendLine("Vtt ot 0 DC 0 AC 1");

        // n: noise.
        Core(sb, c, "n", plus: "pn", node: "nn", output: "on", farEnd: "pbn");
        sb.AppendLine("Vbn pbn 0 DC 0");
        sb.AppendLine("Iinn 0 nn DC 0 AC 1");
        var unit = Math.Sqrt(2 * Q * DiodeAmperes);
        var shot = Math.Abs(c.Imin.Amperes + c.Idark.Amperes);
        NoiseDiode(sb, "sh", 0);
        sb.AppendLine($"Fsh 0 {Source(c, "n", "nn")} Vssh {F(Math.Sqrt(shot / DiodeAmperes))}");
        NoiseDiode(sb, "in", c.InCorner.Hertz);
        sb.AppendLine($"Fin 0 nn Vsin {F(c.In.AmperesPerRootHertz / unit)}");
        NoiseDiode(sb, "en", c.EnCorner.Hertz);
        sb.AppendLine($"Hen pn pbn Vsen {F(c.En.VoltsPerRootHertz / unit)}");

        // d0…d7: DC with finite A0 (the capacitors are open at DC).
        var pol = c.Polarity;
        var k = 0;
        foreach (var current in new[] { pol * c.Idark.Amperes, pol * (c.Imax.Amperes + c.Idark.Amperes) })
        {
            foreach (var vos in new[] { -c.Vos.Volts, c.Vos.Volts })
            {
                foreach (var ib in new[] { -c.Ib.Amperes, c.Ib.Amperes })
                {
                    var s = $"d{k}";
                    Core(sb, c, s, plus: $"p{s}", node: $"n{s}", output: $"o{s}", farEnd: $"b{s}");
                    sb.AppendLine($"Vb{s} b{s} 0 DC {F(c.Vbias.Volts)}");
                    sb.AppendLine($"Vos{s} p{s} b{s} DC {F(vos)}");
                    // Current sources pull their value out of the first node: the signal and Ib leave the node.
                    sb.AppendLine($"Isig{s} {Source(c, s, $"n{s}")} 0 DC {F(current)}");
                    sb.AppendLine($"Ib{s} n{s} 0 DC {F(ib)}");
                    k++;
                }
            }
        }

        sb.AppendLine(".control");
        sb.AppendLine("op");
        // 12 significant digits: the default 7 would limit the DC comparison to the printed resolution (~1 µV at volts).
        sb.AppendLine("set numdgt=12");
        sb.AppendLine("print " + string.Join(' ', Enumerable.Range(0, 8).Select(i => $"v(od{i})")));
        sb.AppendLine($"ac dec 4000 {F(acStartHz)} {F(acStopHz)}");
        sb.AppendLine($"wrdata {AcFile} v(oz) v(oxt)");
        sb.AppendLine($"noise v(on) Iinn dec 1000 {F(noiseLowHz)} {F(noiseHighHz)}");
        // ngspice's own total can come out as NaN (seen with the Cf = 0 spike), so the spectrum is written too.
        sb.AppendLine("setplot noise1");
        sb.AppendLine($"wrdata {NoiseFile} onoise_spectrum");
        sb.AppendLine("setplot noise2");
        sb.AppendLine("print onoise_total");
        sb.AppendLine(".endc");
        sb.AppendLine(".end");
        return sb.ToString();
    }

    private static void Core(StringBuilder sb, Circuit c, string s, string plus, string node, string output, string farEnd = "0")
    {
        Feedback(sb, c, s, node, output, farEnd);
        Amplifier(sb, c, s, plus, node, output);
    }

    /// <summary>
    /// Rf ∥ (Cf + Cpar) (behind the switch's on-resistance when there is one), each unselected branch behind its
    /// off-capacitance, Cin to ground and Rsh to the sensor's far end (Vbias); an electrode's Cd and Rsh sit behind
    /// its access resistance.
    /// </summary>
    private static void Feedback(StringBuilder sb, Circuit c, string s, string node, string output, string farEnd)
    {
        var top = node;
        if (c.FeedbackSeriesResistance.Ohms > 0)
        {
            top = $"m{s}";
            sb.AppendLine($"Ron{s} {node} {top} {F(c.FeedbackSeriesResistance.Ohms)}");
        }

        sb.AppendLine($"Rf{s} {top} {output} {F(c.Rf.Ohms)}");
        if (c.FeedbackCapacitance.Farads > 0)
        {
            sb.AppendLine($"Cf{s} {top} {output} {F(c.FeedbackCapacitance.Farads)}");
        }

        var k = 0;
        foreach (var b in c.OffBranches)
        {
            sb.AppendLine($"Coff{k}{s} {node} k{k}{s} {F(b.OffCapacitance.Farads)}");
            sb.AppendLine($"Rk{k}{s} k{k}{s} {output} {F(b.Rf.Ohms)}");
            if (b.Capacitance.Farads > 0)
            {
                sb.AppendLine($"Ck{k}{s} k{k}{s} {output} {F(b.Capacitance.Farads)}");
            }

            k++;
        }

        var sensor = Source(c, s, node);
        if (sensor != node)
        {
            sb.AppendLine($"Rs{s} {sensor} {node} {F(c.SeriesResistance.Ohms)}");
            if (c.NodeCapacitance.Farads > 0)
            {
                sb.AppendLine($"Cn{s} {node} 0 {F(c.NodeCapacitance.Farads)}");
            }

            if (c.SensorCapacitance.Farads > 0)
            {
                sb.AppendLine($"Cd{s} {sensor} 0 {F(c.SensorCapacitance.Farads)}");
            }
        }
        else if (c.Cin.Farads > 0)
        {
            sb.AppendLine($"Cin{s} {node} 0 {F(c.Cin.Farads)}");
        }

        if (c.Rsh is { } rsh)
        {
            sb.AppendLine($"Rsh{s} {sensor} {farEnd} {F(rsh.Ohms)}");
        }
    }

    /// <summary>Where the source current enters: the node itself, or an electrode's far side of its access resistance.</summary>
    private static string Source(Circuit c, string s, string node) => c.SeriesResistance.Ohms > 0 ? $"e{s}" : node;

    /// <summary>gm = 1 into A0 ∥ 1/(2π·GBW), an optional second pole stage, then a unity VCVS.</summary>
    private static void Amplifier(StringBuilder sb, Circuit c, string s, string plus, string minus, string output)
    {
        sb.AppendLine($"Ga{s} 0 a{s} {plus} {minus} 1");
        sb.AppendLine($"Ra{s} a{s} 0 {F(c.A0.Linear)} noisy=0");
        sb.AppendLine($"Ca{s} a{s} 0 {F(1 / (2 * Math.PI * c.Gbw.Hertz))}");
        var last = $"a{s}";
        if (c.SecondPole is { } p2)
        {
            sb.AppendLine($"Gb{s} 0 b2{s} a{s} 0 1");
            sb.AppendLine($"Rb{s} b2{s} 0 1 noisy=0");
            sb.AppendLine($"Cb{s} b2{s} 0 {F(1 / (2 * Math.PI * p2.Hertz))}");
            last = $"b2{s}";
        }

        sb.AppendLine($"Eo{s} {output} 0 {last} 0 1");
    }

    /// <summary>A diode loop whose short-circuit noise current flows through the 0 V source Vs{name}.</summary>
    private static void NoiseDiode(StringBuilder sb, string name, double cornerHz)
    {
        sb.AppendLine($"Vd{name} vd{name} 0 DC 100");
        sb.AppendLine($"Vs{name} vd{name} vs{name} DC 0");
        sb.AppendLine($"D{name} 0 vs{name} DM{name}");
        // Flicker KF·Id/f against shot 2q·Id puts the 1/f corner at KF/(2q).
        sb.AppendLine($".model DM{name} D(IS={F(DiodeAmperes)} KF={F(2 * Q * cornerHz)} AF=1)");
    }

    private static string F(double x) => x.ToString("R", CultureInfo.InvariantCulture);
}
