using System.Text;
using SpecLint.Core.Config;
using SpecLint.Rules.Checking;
using SpecLint.Rules.Engine;

namespace SpecLint.HouseRules.Tests;

/// <summary>A throw-away repository with a .speclint.yaml, house-rule sources and specs, checked in-process.</summary>
internal sealed class HouseRuleRepo : IDisposable
{
    public HouseRuleRepo(string config = "house-rules: [house-rules/]\n")
    {
        Root = Directory.CreateTempSubdirectory("speclint-hr-").FullName;
        Cache = Path.Combine(Root, "..", Path.GetFileName(Root) + "-cache");
        Directory.CreateDirectory(Path.Combine(Root, ".git"));
        Write(".speclint.yaml", config);
    }

    public string Root { get; }

    public string Cache { get; }

    public string Write(string relativePath, string text)
    {
        var path = Path.Combine(Root, relativePath);
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        File.WriteAllText(path, text, new UTF8Encoding(false));
        return path;
    }

    public RepoConfig Config => RepoConfigLoader.Load(Path.Combine(Root, ".speclint.yaml")).Config;

    public RoslynHouseRuleSource Source() => new(Cache);

    public HouseRuleSet Load() => Source().Load(Config);

    /// <summary>Checks the repository's specs with its house rules, nominal only unless asked.</summary>
    public CheckRun Check(bool tolerances = false) => CheckRunner.Run(new CheckOptions
    {
        Paths = [Root],
        HouseRules = Source(),
        Tolerances = tolerances,
        Today = new DateOnly(2026, 12, 2),
    });

    public void Dispose()
    {
        foreach (var dir in new[] { Root, Cache })
        {
            try
            {
                Directory.Delete(dir, recursive: true);
            }
            catch (IOException)
            {
            }
            catch (UnauthorizedAccessException)
            {
            }
        }
    }
}
