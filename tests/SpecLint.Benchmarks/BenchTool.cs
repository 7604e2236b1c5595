using System.Diagnostics;

namespace SpecLint.Benchmarks;

/// <summary>
/// The tool the whole-check benchmarks run, as a user gets it: the package packed from this source (ReadyToRun
/// for linux-x64) and installed into a private tool folder; or, with <c>--jit</c>, the assembly the benchmark
/// project built (compiled by the JIT at start-up).
/// </summary>
internal sealed class BenchTool
{
    private readonly string _fileName;
    private readonly string _prefix;

    private BenchTool(string fileName, string prefix, string description)
    {
        _fileName = fileName;
        _prefix = prefix;
        Description = description;
    }

    /// <summary>What is being run, for the printed figures.</summary>
    public string Description { get; }

    /// <summary>The built assembly run by <c>dotnet</c>.</summary>
    public static BenchTool Jit() =>
        new("dotnet", $"\"{Path.Combine(AppContext.BaseDirectory, "speclint.dll")}\" ", "the built assembly, JIT-compiled at start-up (--jit)");

    /// <summary>Packs the tool from the repository into <paramref name="work"/> and installs it there (about a minute).</summary>
    public static BenchTool Packed(string repoRoot, string work)
    {
        var packages = Path.Combine(work, "nupkg");
        Run("dotnet", $"pack \"{Path.Combine(repoRoot, "src", "SpecLint.Cli")}\" -c Release -o \"{packages}\"", repoRoot);
        var config = Path.Combine(work, "nupkg.config");
        File.WriteAllText(config, $"<configuration><packageSources><clear /><add key=\"local\" value=\"{packages}\" /></packageSources></configuration>");
        var tools = Path.Combine(work, "tool");
        Run("dotnet", $"tool install SpecLint --tool-path \"{tools}\" --configfile \"{config}\"", work);
        return new BenchTool(Path.Combine(tools, "speclint"), "", "the packed tool as installed (ReadyToRun on linux-x64)");
    }

    /// <summary>Starts a check in <paramref name="folder"/> with <paramref name="arguments"/> after <c>check</c>.</summary>
    public ProcessStartInfo Check(string folder, string arguments) => new(_fileName, $"{_prefix}check {arguments}")
    {
        WorkingDirectory = folder,
        RedirectStandardOutput = true,
        RedirectStandardError = true,
    };

    private static void Run(string file, string arguments, string folder)
    {
        using var process = Process.Start(new ProcessStartInfo(file, arguments)
        {
            WorkingDirectory = folder,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
        })!;
        var output = process.StandardOutput.ReadToEndAsync();
        var error = process.StandardError.ReadToEnd();
        process.WaitForExit();
        if (process.ExitCode != 0)
        {
            throw new InvalidOperationException($"{file} {arguments} exited {process.ExitCode}: {output.Result}{error}");
        }
    }
}
