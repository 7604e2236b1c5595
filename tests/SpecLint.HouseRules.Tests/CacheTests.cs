namespace SpecLint.HouseRules.Tests;

// Each source counts its own compilations, so these tests are independent of other tests compiling in parallel.
public sealed class CacheTests
{
    [Fact]
    public void A_second_load_of_unchanged_rules_does_not_start_the_compiler()
    {
        using var repo = new HouseRuleRepo();
        repo.Write("house-rules/rf-max/RfMaxRule.cs", Sources.RfMaxRule());

        var firstSource = repo.Source();
        var first = firstSource.Load(repo.Config);
        var secondSource = repo.Source();
        var second = secondSource.Load(repo.Config);

        Assert.Equal(1, firstSource.Compilations);
        Assert.Equal(0, secondSource.Compilations);
        Assert.Equal(first.Rules.Select(r => r.Descriptor.Id), second.Rules.Select(r => r.Descriptor.Id));
        Assert.Single(second.Rules);
        Assert.NotEmpty(Directory.GetFiles(repo.Cache, "*.dll"));
        Assert.Empty(Directory.GetFiles(repo.Root, "*.dll", SearchOption.AllDirectories));
    }

    [Fact]
    public void Editing_a_source_compiles_again()
    {
        using var repo = new HouseRuleRepo();
        repo.Write("house-rules/rf-max/RfMaxRule.cs", Sources.RfMaxRule());
        repo.Source().Load(repo.Config);

        repo.Write("house-rules/rf-max/RfMaxRule.cs", Sources.RfMaxRule().Replace("\"100 kΩ\"", "\"2 MΩ\"", StringComparison.Ordinal));
        var source = repo.Source();
        var reloaded = source.Load(repo.Config);

        Assert.Equal(1, source.Compilations);
        Assert.Equal("2 MΩ", Assert.Single(Assert.Single(reloaded.Rules).Descriptor.Options).Default);
    }

    [Fact]
    public void Compile_errors_are_cached_and_reported_again_without_compiling()
    {
        using var repo = new HouseRuleRepo();
        repo.Write("house-rules/probe/ProbeRule.cs", Sources.Rule("probe", "var x = nope;\n        yield break;"));
        var first = repo.Source().Load(repo.Config);

        var source = repo.Source();
        var second = source.Load(repo.Config);

        Assert.Equal(0, source.Compilations);
        Assert.Equal(first.Problems.Select(p => p.ToString()), second.Problems.Select(p => p.ToString()));
        Assert.NotEmpty(second.Problems);
    }

    [Fact]
    public void A_damaged_cache_entry_is_ignored_and_rebuilt()
    {
        using var repo = new HouseRuleRepo();
        repo.Write("house-rules/rf-max/RfMaxRule.cs", Sources.RfMaxRule());
        repo.Source().Load(repo.Config);
        foreach (var f in Directory.GetFiles(repo.Cache, "*.json"))
        {
            File.WriteAllText(f, "{ not json");
        }

        var source = repo.Source();
        var reloaded = source.Load(repo.Config);

        Assert.Equal(1, source.Compilations);
        Assert.Single(reloaded.Rules);
    }

    [Fact]
    public void The_cache_folder_follows_SPECLINT_CACHE()
    {
        var previous = Environment.GetEnvironmentVariable("SPECLINT_CACHE");
        var folder = Path.Combine(Path.GetTempPath(), "speclint-cache-env-test");
        try
        {
            Environment.SetEnvironmentVariable("SPECLINT_CACHE", folder);
            Assert.Equal(Path.GetFullPath(folder), new RoslynHouseRuleSource().CacheFolder);
        }
        finally
        {
            Environment.SetEnvironmentVariable("SPECLINT_CACHE", previous);
        }
    }
}
