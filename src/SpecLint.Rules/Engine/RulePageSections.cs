using System.Collections.Immutable;

namespace SpecLint.Rules.Engine;

/// <summary>
/// The shape of a rule page (<c>rules/&lt;id&gt;/&lt;id&gt;.md</c>, and a house rule's page): a title line
/// <c># &lt;id&gt;: …</c>, then these level-2 headings in this order. The page reads like an analog design
/// review: the condition over the spec keys, what it does to a real board, the flagged design and the revised
/// one (YAML that the tests run), the settings and the sources. The catalog tests, SARIF help text and the
/// rule scaffold all take the headings from here, so there is one list to change.
/// </summary>
public static class RulePageSections
{
    /// <summary>The condition checked, as a formula over the spec keys.</summary>
    public const string Condition = "Condition";

    /// <summary>What happens to a real board when the condition fails.</summary>
    public const string OnTheBench = "On the bench";

    /// <summary>A complete spec (one YAML block) that the rule flags.</summary>
    public const string FlaggedDesign = "Flagged design";

    /// <summary>The same channel revised (one YAML block) so that the rule passes.</summary>
    public const string RevisedDesign = "Revised design";

    /// <summary>The rule's settings table: <c>| key | default | meaning |</c>, <c>severity</c> first.</summary>
    public const string Settings = "Settings";

    /// <summary>Published sources, with "from memory" or "common practice" marks where they apply.</summary>
    public const string Sources = "Sources";

    /// <summary>The headings, in page order.</summary>
    public static ImmutableArray<string> Ordered { get; } = [Condition, OnTheBench, FlaggedDesign, RevisedDesign, Settings, Sources];

    /// <summary>The headings that must hold exactly one YAML block each.</summary>
    public static ImmutableArray<string> WithSpec { get; } = [FlaggedDesign, RevisedDesign];

    /// <summary>The Markdown line of a heading (<c>## Condition</c>).</summary>
    public static string Line(string heading) => "## " + heading;

    /// <summary>A new page for <paramref name="id"/> with every heading and a line on what each holds.</summary>
    public static string Template(string id, string title) =>
        $"""
        # {id}: {title}

        {Line(Condition)}
        The condition, written as a formula over the spec keys (`feedback.capacitance`, …).

        {Line(OnTheBench)}
        What a board built to a flagged spec does: the symptom on the bench and why.

        {Line(FlaggedDesign)}
        ```yaml
        # a complete spec that this rule flags
        ```

        {Line(RevisedDesign)}
        ```yaml
        # the same channel, changed so that this rule passes
        ```

        {Line(Settings)}
        | key | default | meaning |
        |---|---|---|
        | `severity` | `warning` | `error`, `warning`, `note` or `off` |

        {Line(Sources)}
        - Author, *Title*, edition, year: what is taken from it (mark "from memory" where not read from the source).

        """;

    /// <summary>
    /// What is wrong with a page's shape: a missing or foreign title line, headings missing, extra or out of
    /// order, a design section without exactly one YAML block. Empty when the page has the shape.
    /// </summary>
    public static IReadOnlyList<string> Problems(string id, string markdown)
    {
        ArgumentNullException.ThrowIfNull(markdown);
        var problems = new List<string>();
        var lines = markdown.Replace("\r\n", "\n", StringComparison.Ordinal).Split('\n');
        if (lines.Length == 0 || !lines[0].StartsWith($"# {id}: ", StringComparison.Ordinal))
        {
            problems.Add($"the first line must be '# {id}: <what is checked>'");
        }

        var headings = new List<string>();
        var inFence = false;
        foreach (var line in lines)
        {
            if (line.StartsWith("```", StringComparison.Ordinal))
            {
                inFence = !inFence;
            }
            else if (!inFence && line.StartsWith("## ", StringComparison.Ordinal))
            {
                headings.Add(line[3..].Trim());
            }
        }

        if (!headings.SequenceEqual(Ordered, StringComparer.Ordinal))
        {
            problems.Add($"the sections must be {string.Join(", ", Ordered.Select(h => "'" + Line(h) + "'"))} in this order; found {(headings.Count == 0 ? "none" : string.Join(", ", headings.Select(h => "'" + Line(h) + "'")))}");
            return problems;
        }

        foreach (var heading in WithSpec)
        {
            var blocks = YamlBlocks(Section(markdown, heading)).Count;
            if (blocks != 1)
            {
                problems.Add($"'{Line(heading)}' must hold exactly one ```yaml block; found {blocks}");
            }
        }

        return problems;
    }

    /// <summary>The body of a section (after its heading, up to the next level-2 heading), or "" when absent.</summary>
    public static string Section(string markdown, string heading)
    {
        ArgumentNullException.ThrowIfNull(markdown);
        var text = markdown.Replace("\r\n", "\n", StringComparison.Ordinal);
        var marker = "\n" + Line(heading) + "\n";
        var start = text.IndexOf(marker, StringComparison.Ordinal);
        if (start < 0)
        {
            return "";
        }

        start += marker.Length;
        var inFence = false;
        var position = start;
        foreach (var line in text[start..].Split('\n'))
        {
            if (line.StartsWith("```", StringComparison.Ordinal))
            {
                inFence = !inFence;
            }
            else if (!inFence && line.StartsWith("## ", StringComparison.Ordinal))
            {
                return text[start..position];
            }

            position += line.Length + 1;
        }

        return text[start..];
    }

    /// <summary>The contents of the <c>```yaml</c> blocks in <paramref name="markdown"/>, in order.</summary>
    public static IReadOnlyList<string> YamlBlocks(string markdown)
    {
        ArgumentNullException.ThrowIfNull(markdown);
        var blocks = new List<string>();
        List<string>? current = null;
        foreach (var line in markdown.Replace("\r\n", "\n", StringComparison.Ordinal).Split('\n'))
        {
            if (current is null && line.Trim() == "```yaml")
            {
                current = [];
            }
            else if (current is not null && line.Trim() == "```")
            {
                blocks.Add(string.Join('\n', current) + "\n");
                current = null;
            }
            else
            {
                current?.Add(line);
            }
        }

        return blocks;
    }
}
