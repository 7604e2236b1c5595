using System.Diagnostics;
using System.Text;

namespace SpecLint.Cli.Tests.Hostile;

/// <summary>Issue 14: work grows in proportion to the input.</summary>
public sealed class ScaleTests
{
    [Fact]
    public void Sixteen_thousand_unknown_keys_are_reported_in_bounded_time()
    {
        using var cli = new CliHarness();
        var text = new StringBuilder(Specs.Clean).Append('\n');
        for (var i = 0; i < 16_000; i++)
        {
            text.Append("unknown-key-").Append(i).Append(": 1\n");
        }

        cli.Write("ch.tia.yaml", text.ToString());
        var watch = Stopwatch.StartNew();
        var (exit, output, _) = cli.Run("check", "ch.tia.yaml", "--nominal-only");
        Assert.True(watch.Elapsed < TimeSpan.FromSeconds(20), $"took {watch.Elapsed.TotalSeconds:0.0} s");
        Assert.Equal(2, exit);
        Assert.Contains("unknown key \"unknown-key-15999\"", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Html_for_many_specs_links_its_charts_instead_of_inlining_them()
    {
        using var cli = new CliHarness();
        for (var i = 0; i <= Outputs.InlineChartLimit; i++)
        {
            cli.Write($"hw/ch{i:000}.tia.yaml", Specs.Clean.Replace("name: e2e-clean", $"name: ch-{i:000}", StringComparison.Ordinal));
        }

        var (exit, _, error) = cli.Run("check", "hw", "--nominal-only", "--html", "out/r.html");
        Assert.True(exit == 0, error);
        var html = File.ReadAllText(cli.Path_("out/r.html"));
        Assert.DoesNotContain("<svg", html, StringComparison.Ordinal);
        Assert.Contains("src=\"r-plots/ch-000.", html, StringComparison.Ordinal);
        Assert.True(File.Exists(cli.Path_("out/r-plots/ch-100.loop-gain.svg")) || Directory.GetFiles(cli.Path_("out/r-plots"), "ch-100.*.svg").Length > 0);
        Assert.True(html.Length < 200 * (Outputs.InlineChartLimit + 1) * 100, $"{html.Length} characters");
    }
}
