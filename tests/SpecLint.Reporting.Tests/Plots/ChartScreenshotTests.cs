using System.Diagnostics;
using SpecLint.Reporting.Plots;
using SpecLint.Tests.Shared;
using Xunit.Abstractions;

namespace SpecLint.Reporting.Tests.Plots;

/// <summary>
/// Renders each ready-made chart in headless Chromium and checks the picture is really there. Chromium is
/// installed by .ci/run and found on PATH under its usual names; on a developer machine without it the test
/// is reported as skipped, and under a truthy CI a missing browser is a failure.
/// </summary>
public sealed class ChartScreenshotTests(ITestOutputHelper output)
{
    private static readonly string? ChromiumPath = ExternalTool.OnPath("chromium", "chromium-browser", "google-chrome", "google-chrome-stable", "chrome");
    private const int WindowWidth = 900;
    private const int WindowHeight = 700;

    public static TheoryData<string> ChartNames => new() { "loop-gain", "transimpedance", "noise-density" };

    [SkippableTheory]
    [MemberData(nameof(ChartNames))]
    public void Each_chart_renders_in_headless_chromium_as_a_picture_with_content(string name)
    {
        ExternalTool.Require(ChromiumPath, "Chromium", "apt-get install -y chromium");

        var chart = name switch
        {
            "loop-gain" => SampleChannel.LoopGain(),
            "transimpedance" => SampleChannel.Transimpedance(),
            _ => SampleChannel.NoiseDensity(),
        };
        // Kept under bin/ so a person can look at the pictures after a run.
        var folder = Path.Combine(AppContext.BaseDirectory, "screenshots");
        Directory.CreateDirectory(folder);
        var svg = Path.Combine(folder, name + ".svg");
        var png = Path.Combine(folder, name + ".png");
        File.Delete(png);
        SvgChartWriter.WriteFile(chart, svg);

        Screenshot(svg, png);

        Assert.True(File.Exists(png), $"Chromium wrote no {png}");
        var image = PngImage.Read(File.ReadAllBytes(png));
        Assert.Equal(WindowWidth, image.Width);
        Assert.Equal(WindowHeight, image.Height);

        var colours = new HashSet<int>();
        var inked = 0;
        var seriesBlue = 0;
        for (var y = 0; y < chart.Height; y++)
        {
            for (var x = 0; x < chart.Width; x++)
            {
                var (r, g, b) = image.Pixel(x, y);
                colours.Add((r << 16) | (g << 8) | b);
                if (r < 200 || g < 200 || b < 200)
                {
                    inked++;
                }

                // The first palette colour, #332288, give or take anti-aliasing.
                if (Math.Abs(r - 0x33) < 24 && Math.Abs(g - 0x22) < 24 && Math.Abs(b - 0x88) < 24)
                {
                    seriesBlue++;
                }
            }
        }

        var inkedShare = inked / (double)(chart.Width * chart.Height);
        output.WriteLine($"{name}: {colours.Count} colours, {inkedShare:P1} inked, {seriesBlue} series pixels");
        Assert.True(colours.Count > 40, $"only {colours.Count} distinct colours: the picture looks blank");
        Assert.InRange(inkedShare, 0.01, 0.5);
        Assert.True(seriesBlue > 150 || name == "noise-density" && seriesBlue > 50, $"only {seriesBlue} pixels in the first series colour");
        Assert.Equal((255, 255, 255), image.Pixel(WindowWidth - 2, WindowHeight - 2));
    }

    private static void Screenshot(string svg, string png)
    {
        var profile = Path.Combine(Path.GetTempPath(), "speclint-chromium-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(profile);
        var start = new ProcessStartInfo(ChromiumPath!)
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        foreach (var arg in new[]
        {
            "--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
            "--disable-background-networking", "--disable-component-update", "--disable-sync",
            "--hide-scrollbars", "--user-data-dir=" + profile, "--screenshot=" + png,
            $"--window-size={WindowWidth},{WindowHeight}", new Uri(svg).AbsoluteUri,
        })
        {
            start.ArgumentList.Add(arg);
        }

        try
        {
            using var process = Process.Start(start)!;
            var stderr = process.StandardError.ReadToEndAsync();
            _ = process.StandardOutput.ReadToEndAsync();
            if (!process.WaitForExit(TimeSpan.FromSeconds(90)))
            {
                process.Kill(entireProcessTree: true);
                Assert.Fail("Chromium did not finish within 90 s");
            }

            Assert.True(process.ExitCode == 0, $"Chromium exited with {process.ExitCode}: {stderr.Result}");
        }
        finally
        {
            try
            {
                Directory.Delete(profile, recursive: true);
            }
            catch (IOException)
            {
                // A helper process may still hold a file for a moment; the temp folder is cleaned by the OS.
            }
        }
    }
}
