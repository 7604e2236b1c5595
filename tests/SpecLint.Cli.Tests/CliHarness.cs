using System.Text;

namespace SpecLint.Cli.Tests;

/// <summary>Runs the tool in-process in a scratch folder and captures its output.</summary>
internal sealed class CliHarness : IDisposable
{
    private static readonly object CurrentDirectoryLock = new();

    public CliHarness()
    {
        Root = Directory.CreateTempSubdirectory("speclint-cli-").FullName;
    }

    public string Root { get; }

    public string Write(string relativePath, string text)
    {
        var path = Path.Combine(Root, relativePath);
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        File.WriteAllText(path, text, new UTF8Encoding(false));
        return path;
    }

    public string WriteBytes(string relativePath, byte[] bytes)
    {
        var path = Path.Combine(Root, relativePath);
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        File.WriteAllBytes(path, bytes);
        return path;
    }

    public string Path_(string relative) => Path.Combine(Root, relative);

    /// <summary>Runs with the scratch folder as the working directory (tests in this assembly run one at a time for that).</summary>
    public (int Exit, string Out, string Err) Run(params string[] args) => RunIn(".", args);

    /// <summary>Runs with a folder inside the scratch folder as the working directory.</summary>
    public (int Exit, string Out, string Err) RunIn(string folder, params string[] args)
    {
        lock (CurrentDirectoryLock)
        {
            var previous = Directory.GetCurrentDirectory();
            Directory.SetCurrentDirectory(Path.Combine(Root, folder));
            try
            {
                using var output = new StringWriter();
                using var error = new StringWriter();
                var exit = SpecLintApp.Run(args, output, error);
                return (exit, output.ToString(), error.ToString());
            }
            finally
            {
                Directory.SetCurrentDirectory(previous);
            }
        }
    }

    /// <summary>Runs <paramref name="action"/> with the scratch folder as the working directory, for tests that call the engine directly.</summary>
    public T InRoot<T>(Func<T> action)
    {
        ArgumentNullException.ThrowIfNull(action);
        lock (CurrentDirectoryLock)
        {
            var previous = Directory.GetCurrentDirectory();
            Directory.SetCurrentDirectory(Root);
            try
            {
                return action();
            }
            finally
            {
                Directory.SetCurrentDirectory(previous);
            }
        }
    }

    public void Dispose()
    {
        try
        {
            Directory.Delete(Root, recursive: true);
        }
        catch (IOException)
        {
        }
    }
}
