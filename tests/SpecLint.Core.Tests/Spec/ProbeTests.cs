using SpecLint.Core.Spec;

namespace SpecLint.Core.Tests.Spec;

public sealed class ProbeTests
{
    [Fact]
    public void Probe()
    {
        var lines = new List<string>();
        foreach (var f in Directory.GetFiles("/tmp/probe", "*.yaml").Order())
        {
            var r = SpecLoader.LoadFile(f, Path.GetFileName(f));
            lines.Add($"== {Path.GetFileName(f)} valid={r.IsValid}");
            lines.AddRange(r.Diagnostics.Select(d => d.ToString()));
        }

        File.WriteAllLines("/tmp/probe/out.txt", lines);
    }
}
