using SpecLint.Core.Config;
using SpecLint.Core.Spec;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.Rules.Tests.Support;

/// <summary>Loads an inline spec (with <c>[|…|]</c> markers) and an optional inline <c>.speclint.yaml</c>, and checks it at nominal.</summary>
internal static class Lint
{
    /// <summary>The fixed date waivers are judged against.</summary>
    public static readonly DateOnly Today = new(2026, 6, 1);

    public const string SpecFile = "channel.tia.yaml";

    public const string ConfigFile = ".speclint.yaml";

    public static LintResult Check(string markedSpec, string? config = null) => Check(markedSpec, config, corners: false);

    /// <summary>Checks with the standard tolerance corners and Monte Carlo, as the tool does.</summary>
    public static LintResult CheckWithCorners(string markedSpec, string? config = null) => Check(markedSpec, config, corners: true);

    private static LintResult Check(string markedSpec, string? config, bool corners)
    {
        var marked = MarkedText.Parse(markedSpec);
        var repoConfig = config is null ? RepoConfig.Default : LoadConfig(config);
        var spec = Load(marked.Text);
        // Most rule tests run at nominal so that hand computations apply; corner tests opt in.
        var outcome = CheckRunner.CheckSpec(spec, repoConfig, new CheckOptions { Today = Today, Tolerances = corners });
        return new LintResult(marked, outcome, repoConfig, corners);
    }

    public static Core.Spec.Model.TiaSpec Load(string yaml)
    {
        var loaded = SpecLoader.LoadText(yaml, SpecFile);
        Assert.True(loaded.IsValid, "the test spec does not load: " + string.Join("; ", loaded.Diagnostics));
        return loaded.Spec!;
    }

    public static RepoConfig LoadConfig(string yaml)
    {
        var loaded = RepoConfigLoader.LoadText(yaml, ConfigFile);
        Assert.True(loaded.IsValid, "the test configuration does not load: " + string.Join("; ", loaded.Diagnostics));
        var problems = ConfigurationBinding.Validate(loaded.Config, RuleCatalog.BuiltIn, ConfigFile).ToList();
        Assert.True(problems.Count == 0, "the test configuration is invalid: " + string.Join("; ", problems));
        return loaded.Config;
    }

    /// <summary>Writes <paramref name="fix"/>'s value at its path into the spec text, as a user accepting the fix would.</summary>
    public static string ApplyFix(string yaml, FixSuggestion fix)
    {
        ArgumentNullException.ThrowIfNull(fix);
        var spec = Load(yaml);
        var lines = yaml.Split('\n').ToList();
        if (spec.Locations.Contains(fix.Path))
        {
            var at = spec.Locations.Locate(fix.Path);
            Assert.Equal(at.Line, at.EndLine);
            var line = lines[at.Line - 1];
            lines[at.Line - 1] = line[..(at.Column - 1)] + fix.Value + line[(at.EndColumn - 1)..];
        }
        else
        {
            // A key the spec left out: write it as the first key of its (block) parent map.
            var slash = fix.Path.LastIndexOf('/');
            var parent = spec.Locations.Locate(fix.Path[..slash]);
            lines.Insert(parent.Line - 1, new string(' ', parent.Column - 1) + fix.Path[(slash + 1)..] + ": " + fix.Value);
        }

        return string.Join('\n', lines);
    }
}
