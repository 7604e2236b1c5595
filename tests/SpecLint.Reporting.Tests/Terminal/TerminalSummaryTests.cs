using SpecLint.Reporting.Terminal;
using SpecLint.Rules.Checking;

namespace SpecLint.Reporting.Tests.Terminal;

/// <summary>The last lines of a terminal check: a file that was read but is not a valid spec is "invalid", not "could not be read".</summary>
public sealed class TerminalSummaryTests : IDisposable
{
    private readonly string _root = Directory.CreateTempSubdirectory("speclint-summary-").FullName;

    public void Dispose() => Directory.Delete(_root, recursive: true);

    private CheckRun Run(params string[] paths) =>
        CheckRunner.Run(new CheckOptions { Paths = [.. paths.Select(p => Path.Combine(_root, p))], Today = new DateOnly(2026, 6, 1), Tolerances = false });

    [Fact]
    public void A_file_that_was_read_but_is_not_a_spec_is_counted_as_invalid()
    {
        File.WriteAllText(Path.Combine(_root, "bad.tia.yaml"), "spec: 1\nkind: transimpedance\nname: bad\n");

        var summary = TerminalReport.Summary(Run("bad.tia.yaml"));

        Assert.Contains("; 1 spec invalid.", summary, StringComparison.Ordinal);
        Assert.DoesNotContain("could not be read", summary, StringComparison.Ordinal);
    }

    [Fact]
    public void A_file_that_could_not_be_read_is_counted_as_such()
    {
        File.WriteAllText(Path.Combine(_root, "bad.tia.yaml"), "spec: 1\n");

        // A missing file next to an invalid one: one of each.
        var run = Run("bad.tia.yaml");
        var unreadable = CheckRunner.CheckOne(Path.Combine(_root, "gone.tia.yaml"), Core.Config.RepoConfig.Default, new CheckOptions { Tolerances = false });
        var summary = TerminalReport.Summary(run with { Specs = [.. run.Specs, unreadable] });

        Assert.True(unreadable.IsUnreadable);
        Assert.Contains("; 1 spec invalid; 1 file could not be read.", summary, StringComparison.Ordinal);
    }
}
