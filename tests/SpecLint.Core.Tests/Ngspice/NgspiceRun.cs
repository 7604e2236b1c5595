using System.Diagnostics;
using System.Globalization;
using System.Numerics;
using System.Text.RegularExpressions;

namespace SpecLint.Core.Tests.Ngspice;

/// <summary>The parsed output of one ngspice run of a <see cref="NetlistWriter"/> netlist.</summary>
internal sealed partial class NgspiceRun
{
    private NgspiceRun(double[] frequencies, Complex[] zt, Complex[] loop, double[] dc, double noiseRms, double ngspiceTotal)
    {
        NgspiceTotalVolts = ngspiceTotal;
        FrequenciesHz = frequencies;
        Transimpedance = zt;
        LoopGain = loop;
        DcOutputs = dc;
        NoiseRmsVolts = noiseRms;
    }

    public double[] FrequenciesHz { get; }

    /// <summary>Zt = −V(oz) for 1 A into the node.</summary>
    public Complex[] Transimpedance { get; }

    /// <summary>T = −V(oxt) for 1 V at the broken loop.</summary>
    public Complex[] LoopGain { get; }

    public double[] DcOutputs { get; }

    /// <summary>Trapezoid integral of ngspice's output noise spectrum (agrees with its total to 1e-7, references.md §2).</summary>
    public double NoiseRmsVolts { get; }

    /// <summary>ngspice's own onoise_total (may be NaN).</summary>
    public double NgspiceTotalVolts { get; }

    /// <summary>Where ngspice lives, or null when it is not on PATH.</summary>
    public static string? Executable { get; } = SpecLint.Tests.Shared.ExternalTool.OnPath("ngspice");

    public static NgspiceRun Execute(string netlist)
    {
        var dir = Directory.CreateTempSubdirectory("speclint-ngspice-");
        try
        {
            File.WriteAllText(Path.Combine(dir.FullName, "check.cir"), netlist);
            var psi = new ProcessStartInfo(Executable!, "-b check.cir")
            {
                WorkingDirectory = dir.FullName,
                RedirectStandardOutput = true,
                RedirectStandardError = true,
                UseShellExecute = false,
            };
            using var p = Process.Start(psi)!;
            var stderr = p.StandardError.ReadToEndAsync();
            var log = p.StandardOutput.ReadToEnd() + "\n" + stderr.Result;
            if (!p.WaitForExit(60_000))
            {
                p.Kill(entireProcessTree: true);
                throw new TimeoutException("ngspice did not finish in 60 s");
            }

            // The exit status is 1 whenever .control runs without .print (references.md §2): judge from the log.
            var bad = log.Split('\n').Select(l => l.Trim().ToLowerInvariant())
                .FirstOrDefault(l => l.StartsWith("error", StringComparison.Ordinal) || l.StartsWith("fatal", StringComparison.Ordinal)
                    || l.StartsWith("singular matrix", StringComparison.Ordinal) || l.StartsWith("timestep too small", StringComparison.Ordinal));
            if (bad is not null)
            {
                throw new InvalidOperationException($"ngspice failed: {bad}\n{log}\n{netlist}");
            }

            var dc = new double[8];
            foreach (Match m in DcLine().Matches(log))
            {
                dc[int.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture)] = Parse(m.Groups[2].Value);
            }

            var noise = NoiseLine().Match(log);
            if (!noise.Success)
            {
                throw new InvalidOperationException($"no onoise_total in the log\n{log}");
            }

            var spectrum = ReadColumns(Path.Combine(dir.FullName, NetlistWriter.NoiseFile));
            double v2 = 0;
            for (var i = 1; i < spectrum.Length; i++)
            {
                var (f0, s0, f1, s1) = (spectrum[i - 1][0], spectrum[i - 1][1], spectrum[i][0], spectrum[i][1]);
                v2 += 0.5 * ((s0 * s0) + (s1 * s1)) * (f1 - f0);
            }

            // wrdata writes, per vector, "scale re im" columns: f, Re V(oz), Im V(oz), f, Re V(oxt), Im V(oxt).
            var rows = ReadColumns(Path.Combine(dir.FullName, NetlistWriter.AcFile));
            return new NgspiceRun(
                rows.Select(r => r[0]).ToArray(),
                rows.Select(r => -new Complex(r[1], r[2])).ToArray(),
                rows.Select(r => -new Complex(r[4], r[5])).ToArray(),
                dc,
                Math.Sqrt(v2),
                Parse(noise.Groups[1].Value));
        }
        finally
        {
            dir.Delete(recursive: true);
        }
    }

    private static double[][] ReadColumns(string path) =>
        File.ReadAllLines(path)
            .Where(l => l.Trim().Length > 0)
            .Select(l => l.Split(' ', StringSplitOptions.RemoveEmptyEntries).Select(Parse).ToArray())
            .ToArray();

    private static double Parse(string s) =>
        s.Contains("nan", StringComparison.OrdinalIgnoreCase) ? double.NaN : double.Parse(s, NumberStyles.Float, CultureInfo.InvariantCulture);


    [GeneratedRegex(@"^v\(od(\d)\)\s*=\s*(\S+)", RegexOptions.Multiline)]
    private static partial Regex DcLine();

    [GeneratedRegex(@"^onoise_total\s*=\s*(\S+)", RegexOptions.Multiline)]
    private static partial Regex NoiseLine();
}
