using SpecLint.Reporting.Annotations;
using SpecLint.Rules.Accepting;
using SpecLint.Rules.Changes;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Reporting.Tests.Annotations;

/// <summary>A stale entry of the accepted-findings file becomes a workflow notice at its line in that file.</summary>
public sealed class StaleAcceptedAnnotationTests
{
    private static CheckRun EmptyRun() => new([], [], Severity.Error, []);

    [Fact]
    public void A_stale_entry_is_a_notice_at_its_line_of_the_accepted_file()
    {
        var entry = new AcceptedEntry(new FindingKey("phase-margin", "ch-d", "/feedback/capacitance", null), "known", new DateOnly(2026, 6, 1), Line: 7);
        var run = EmptyRun() with { Acceptance = new Acceptance("ci/speclint-accepted.json", [entry], new HashSet<Finding>(), [entry]) };

        var line = GitHubAnnotations.Format(Assert.Single(GitHubAnnotations.Of(run)));

        Assert.Equal(
            "::notice file=ci/speclint-accepted.json,line=7,col=1,title=SpecLint accepted-stale::'phase-margin' at /feedback/capacitance of ch-d no longer occurs; remove the entry",
            line);
    }

    [Fact]
    public void Without_stale_entries_nothing_is_added()
    {
        var entry = new AcceptedEntry(new FindingKey("phase-margin", "ch-d", "/feedback/capacitance", null), null, new DateOnly(2026, 6, 1), Line: 7);
        var run = EmptyRun() with { Acceptance = new Acceptance("acc.json", [entry], new HashSet<Finding>(), []) };

        Assert.Empty(GitHubAnnotations.Of(run));
        Assert.Empty(GitHubAnnotations.Of(EmptyRun()));
    }
}
