using System.Diagnostics;
using System.IO.Compression;

namespace SpecLint.Analyzers.Tests;

/// <summary>
/// Packs the analyzer as users get it and builds a small project that references the package from a
/// local folder: the warnings must appear in `dotnet build` output. Offline: the only source is the folder.
/// </summary>
public sealed class PackageTests
{
#if DEBUG
    private const string Configuration = "Debug";
#else
    private const string Configuration = "Release";
#endif

    [Fact]
    public void A_project_referencing_the_packed_analyzer_shows_its_warnings_in_dotnet_build()
    {
        var root = new DirectoryInfo(AppContext.BaseDirectory);
        while (!File.Exists(Path.Combine(root.FullName, "SpecLint.sln")))
        {
            root = root.Parent!;
        }

        var work = Directory.CreateTempSubdirectory("speclint-analyzer-pack-");
        try
        {
            // A fresh version each run: NuGet would otherwise serve an older package of the same version from its cache.
            var version = "0.0.0-t" + DateTime.UtcNow.Ticks;
            var feed = Path.Combine(work.FullName, "feed");
            Run(root.FullName, "pack", "src/SpecLint.Analyzers.CodeFixes/SpecLint.Analyzers.CodeFixes.csproj", "--no-build",
                "-c", Configuration, "-o", feed, "-p:PackageVersion=" + version);

            var nupkg = Path.Combine(feed, "SpecLint.Analyzers." + version + ".nupkg");
            using (var zip = ZipFile.OpenRead(nupkg))
            {
                var names = zip.Entries.Select(e => e.FullName).ToList();
                Assert.Contains("analyzers/dotnet/cs/SpecLint.Analyzers.dll", names);
                Assert.Contains("analyzers/dotnet/cs/SpecLint.Analyzers.CodeFixes.dll", names);
            }

            var core = typeof(SpecLint.Core.Units.Capacitance).Assembly.Location;
            var sample = Path.Combine(work.FullName, "sample");
            Directory.CreateDirectory(sample);
            File.WriteAllText(Path.Combine(sample, "nuget.config"), $"""
                <configuration><packageSources><clear /><add key="local" value="{feed}" /></packageSources></configuration>
                """);
            File.WriteAllText(Path.Combine(sample, "Sample.csproj"), $"""
                <Project Sdk="Microsoft.NET.Sdk">
                  <PropertyGroup><TargetFramework>net10.0</TargetFramework><Nullable>enable</Nullable>
                    <RestorePackagesPath>{Path.Combine(work.FullName, "packages")}</RestorePackagesPath></PropertyGroup>
                  <ItemGroup>
                    <Reference Include="SpecLint.Core" HintPath="{core}" />
                    <PackageReference Include="SpecLint.Analyzers" Version="{version}" PrivateAssets="all" />
                  </ItemGroup>
                </Project>
                """);
            File.WriteAllText(Path.Combine(sample, "Cf.cs"), """
                using SpecLint.Core.Units;
                public static class Cf
                {
                    public static Capacitance Value => new Capacitance(2.2);
                    public static double Kt(Temperature t) => 1.380649e-23 * t.Celsius;
                }
                """);

            var output = Run(sample, "build", "-nologo", "-v:q");
            Assert.Contains("Cf.cs(4,40): warning SLU0001", output, StringComparison.Ordinal);
            Assert.Matches(@"Cf\.cs\(5,\d+\): warning SLU0004", output);
        }
        finally
        {
            work.Delete(recursive: true);
        }
    }

    private static string Run(string dir, params string[] args)
    {
        var psi = new ProcessStartInfo("dotnet") { WorkingDirectory = dir, RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (var a in args)
        {
            psi.ArgumentList.Add(a);
        }

        psi.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        psi.Environment["DOTNET_NOLOGO"] = "1";
        using var p = Process.Start(psi)!;
        var stderr = p.StandardError.ReadToEndAsync();
        var stdout = p.StandardOutput.ReadToEnd();
        Assert.True(p.WaitForExit(TimeSpan.FromSeconds(120)), "dotnet " + string.Join(' ', args) + " timed out");
        var all = stdout + stderr.Result;
        Assert.True(p.ExitCode == 0, "dotnet " + string.Join(' ', args) + " failed:\n" + all);
        return all;
    }
}
