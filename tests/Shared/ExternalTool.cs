namespace SpecLint.Tests.Shared;

/// <summary>
/// Outside programs some tests need (ngspice, Chromium). Missing outside CI, the test is reported as
/// skipped, not passed; missing under CI (any truthy <c>CI</c>: <c>true</c>, <c>1</c>, <c>yes</c>, …), it
/// fails, so a check cannot silently vanish from the pipeline.
/// </summary>
internal static class ExternalTool
{
    /// <summary>True when the <c>CI</c> variable is set to anything but an explicit no.</summary>
    public static bool UnderCi => IsTruthy(Environment.GetEnvironmentVariable("CI"));

    /// <summary>Whether a <c>CI</c> value means "running in CI": set and not empty, <c>0</c>, <c>false</c>, <c>no</c> or <c>off</c>.</summary>
    public static bool IsTruthy(string? value) =>
        !string.IsNullOrWhiteSpace(value) && value.Trim().ToLowerInvariant() is not ("0" or "false" or "no" or "off");

    /// <summary>Fails under CI, otherwise skips the running test, when <paramref name="path"/> is null.</summary>
    public static void Require(string? path, string what, string install)
    {
        if (path is not null)
        {
            return;
        }

        var message = $"{what} is not installed, so this check did not run ({install})";
        Assert.False(UnderCi, message + "; CI must install it");
        Skip.If(true, message);
    }

    /// <summary>The first of <paramref name="names"/> found as an executable file on PATH, or null.</summary>
    public static string? OnPath(params string[] names)
    {
        var folders = (Environment.GetEnvironmentVariable("PATH") ?? "").Split(Path.PathSeparator, StringSplitOptions.RemoveEmptyEntries);
        foreach (var name in names)
        {
            foreach (var folder in folders)
            {
                var candidate = Path.Combine(folder, name);
                if (File.Exists(candidate) && (OperatingSystem.IsWindows() || (File.GetUnixFileMode(candidate) & UnixFileMode.UserExecute) != 0))
                {
                    return candidate;
                }
            }
        }

        return null;
    }
}
