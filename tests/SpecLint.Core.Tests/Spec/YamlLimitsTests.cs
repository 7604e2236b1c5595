using System.Diagnostics;
using System.Text;
using SpecLint.Core.Spec;
using SpecLint.Core.Spec.Yaml;

namespace SpecLint.Core.Tests.Spec;

public sealed class YamlLimitsTests
{
    private static string DesignExample => File.ReadAllText(TestPaths.Output("Spec", "Resources", "design-example.tia.yaml"));

    [Fact]
    public void Rejects_a_file_one_byte_over_one_mebibyte()
    {
        var bytes = new byte[YamlTreeReader.MaxFileBytes + 1];
        Array.Fill(bytes, (byte)'#');

        var d = Assert.Single(SpecLoader.LoadBytes(bytes, "big.tia.yaml").Diagnostics);

        Assert.Equal((1, 1), (d.Line, d.Column));
        Assert.Contains("1048577 bytes", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Rejects_a_big_file_on_disk_before_reading_it()
    {
        var path = Path.Combine(Path.GetTempPath(), $"speclint-big-{Guid.NewGuid():N}.tia.yaml");
        File.WriteAllBytes(path, new byte[YamlTreeReader.MaxFileBytes + 1]);
        try
        {
            var d = Assert.Single(SpecLoader.LoadFile(path, "big.tia.yaml").Diagnostics);
            Assert.Contains("limited to 1048576 bytes", d.Message, StringComparison.Ordinal);
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void Rejects_nesting_sixty_five_deep()
    {
        var text = "a: " + new string('[', 65) + new string(']', 65);

        var d = Assert.Single(SpecLoader.LoadText(text, "deep.tia.yaml").Diagnostics);

        Assert.Contains("nested more than 64 deep", d.Message, StringComparison.Ordinal);
        Assert.Equal((1, 67), (d.Line, d.Column));
    }

    [Fact]
    public void Accepts_nesting_sixty_four_deep_as_yaml()
    {
        var text = "a: " + new string('[', 63) + new string(']', 63);

        var tree = YamlTreeReader.Read(text);

        Assert.Empty(tree.Problems);
    }

    [Fact]
    public void Stops_a_hundred_thousand_open_brackets_quickly()
    {
        var text = new string('[', 100_000);
        var clock = Stopwatch.StartNew();

        var d = Assert.Single(SpecLoader.LoadText(text, "brackets.tia.yaml").Diagnostics);

        Assert.True(clock.Elapsed < TimeSpan.FromSeconds(2), $"took {clock.Elapsed}");
        Assert.Contains("nested more than 64 deep", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Refuses_the_billion_laughs_at_the_first_alias()
    {
        var sb = new StringBuilder("a: &a [\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\",\"lol\"]\n");
        for (var c = 'b'; c <= 'i'; c++)
        {
            var prev = (char)(c - 1);
            sb.Append(c).Append(": &").Append(c).Append(" [").Append(string.Join(",", Enumerable.Repeat("*" + prev, 9))).Append("]\n");
        }

        var clock = Stopwatch.StartNew();
        var d = Assert.Single(SpecLoader.LoadText(sb.ToString(), "lol.tia.yaml").Diagnostics);

        Assert.True(clock.Elapsed < TimeSpan.FromSeconds(2));
        Assert.Equal((2, 8), (d.Line, d.Column));
        Assert.Contains("aliases (*a) are not supported", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Caps_the_node_count()
    {
        var text = "a: [" + string.Join(",", Enumerable.Repeat("1", YamlTreeReader.MaxNodes + 1)) + "]";

        var d = Assert.Single(SpecLoader.LoadText(text, "wide.tia.yaml").Diagnostics);

        Assert.Contains("more than 100000 values", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Reports_the_line_and_column_of_a_byte_that_is_not_utf8()
    {
        var bytes = Encoding.UTF8.GetBytes("spec: 1\nname: µ-ch\ntitle: caf").Concat(new byte[] { 0xE9 }).Concat(Encoding.UTF8.GetBytes("\n")).ToArray();

        var d = Assert.Single(SpecLoader.LoadBytes(bytes, "latin1.tia.yaml").Diagnostics);

        Assert.Equal((3, 11), (d.Line, d.Column));
        Assert.Contains("byte 0xE9 is not valid UTF-8", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Empty_file_is_an_error()
    {
        var d = Assert.Single(SpecLoader.LoadBytes([], "empty.tia.yaml").Diagnostics);

        Assert.Equal((1, 1), (d.Line, d.Column));
        Assert.Contains("the file is empty", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void File_with_only_comments_is_an_error()
    {
        var d = Assert.Single(SpecLoader.LoadText("# nothing yet\n", "c.tia.yaml").Diagnostics);

        Assert.Contains("the file is empty", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Byte_order_mark_is_accepted()
    {
        var bytes = new byte[] { 0xEF, 0xBB, 0xBF }.Concat(Encoding.UTF8.GetBytes(DesignExample)).ToArray();

        var result = SpecLoader.LoadBytes(bytes, "bom.tia.yaml");

        Assert.Empty(result.Diagnostics);
        Assert.Equal(1, result.Spec!.Locations.Locate("/spec").Line);
    }

    [Fact]
    public void Crlf_line_endings_are_accepted_with_the_same_positions()
    {
        var crlf = DesignExample.ReplaceLineEndings("\r\n");
        var bad = crlf.Replace("capacitance: 2.2 pF ±0.25 pF", "capacitance: 2.2", StringComparison.Ordinal);

        Assert.Empty(SpecLoader.LoadText(crlf, "crlf.tia.yaml").Diagnostics);
        var d = Assert.Single(SpecLoader.LoadText(bad, "crlf.tia.yaml").Diagnostics);
        Assert.Equal((37, 16), (d.Line, d.Column));
    }

    [Fact]
    public void Plain_scalars_follow_the_yaml_1_2_core_schema()
    {
        var tree = YamlTreeReader.Read("a: yes\nb: true\nc: 0x1F\nd: 1e3\ne: ~\nf: '12'\ng: 0o17\nh: 4.7k\ni: on\n");

        Assert.Empty(tree.Problems);
        var root = tree.Root!.AsObject();
        Assert.Equal("yes", root["a"]!.GetValue<string>());
        Assert.True(root["b"]!.GetValue<bool>());
        Assert.Equal(31, root["c"]!.GetValue<long>());
        Assert.Equal(1000.0, root["d"]!.GetValue<double>());
        Assert.Null(root["e"]);
        Assert.Equal("12", root["f"]!.GetValue<string>());
        Assert.Equal(15, root["g"]!.GetValue<long>());
        Assert.Equal("4.7k", root["h"]!.GetValue<string>());
        Assert.Equal("on", root["i"]!.GetValue<string>());
        Assert.Equal("1e3", tree.ScalarText["/d"]);
    }

    [Fact]
    public void Keeps_value_and_key_positions_by_json_pointer()
    {
        var tree = YamlTreeReader.Read("a:\n  b/c: 5 pF\n  list: [x, 'y']\n");

        var p = tree.Positions["/a/b~1c"];
        Assert.Equal(new SourcePosition(2, 8, 2, 12, 2, 3), p);
        Assert.Equal(3, tree.Positions["/a/list/1"].Line);
        Assert.Equal(13, tree.Positions["/a/list/1"].Column);
        Assert.Equal(0, tree.Positions["/a/list/1"].KeyLine);
    }

    [Fact]
    public void Collects_duplicate_keys_and_merge_keys_together()
    {
        var tree = YamlTreeReader.Read("a: 1\nb: 2\na: 3\nc:\n  <<: {x: 1}\n  y: 2\n");

        Assert.Equal(["3:1", "5:3"], tree.Problems.Select(p => $"{p.Line}:{p.Column}"));
        Assert.Equal(1, tree.Root!["a"]!.GetValue<long>());
    }
}
