namespace SpecLint.Cli;

/// <summary>Refuses output paths that would overwrite an input: a report must never replace a spec.</summary>
internal static class OutputGuard
{
    public static bool IsSafeTarget(string path, IEnumerable<string> inputs, string suggestedExtension, out string why)
    {
        string full;
        try
        {
            full = SpecLint.Core.Files.AtomicFile.OutputPath(path);
        }
        catch (SpecLint.Core.Files.OutputException e)
        {
            why = e.Message;
            return false;
        }

        var ext = Path.GetExtension(full).ToLowerInvariant();
        if (ext is ".yaml" or ".yml")
        {
            why = $"'{path}' looks like a spec or configuration file; write to a {suggestedExtension} file";
            return false;
        }

        if (inputs.Any(i => i.Length > 0 && string.Equals(Path.GetFullPath(i), full, StringComparison.Ordinal)))
        {
            why = $"'{path}' is one of the inputs";
            return false;
        }

        if (Directory.Exists(full))
        {
            why = $"'{path}' is a folder; give a file name such as {Path.Combine(path, "report" + suggestedExtension)}";
            return false;
        }

        why = "";
        return true;
    }
}
