namespace SpecLint.Reporting.Plots;

/// <summary>
/// SpecLint's plot colours. Series colours follow Paul Tol's "muted" scheme, designed to stay distinct for
/// the common forms of colour blindness; each also gets its own dash pattern so a greyscale print still
/// tells them apart. The light members (sand, pale cyan) are left out: thin lines in them vanish on white.
/// </summary>
internal static class ChartPalette
{
    private static readonly string[] Colors = ["#332288", "#44AA99", "#CC6677", "#999933", "#882255", "#6699CC", "#AA4499", "#117733"];
    private static readonly string?[] Dashes = [null, "8 4", "2 3", "10 3 2 3", "5 2", "1.5 2.5 6 2.5", "12 4", "3 5"];

    /// <summary>Text, axis and title colour.</summary>
    public const string Ink = "#2B2F36";

    /// <summary>Secondary text: subtitle, axis titles.</summary>
    public const string MutedInk = "#5C636E";

    /// <summary>Plot area background: a warm off-white that is easy on the eye next to page white.</summary>
    public const string PlotBackground = "#FBFBF8";

    /// <summary>Plot area frame.</summary>
    public const string Frame = "#B8BDC4";

    /// <summary>Major grid lines (decades, labelled ticks).</summary>
    public const string MajorGrid = "#DCE0E4";

    /// <summary>Minor grid lines (2…9 within a decade).</summary>
    public const string MinorGrid = "#EEF0F2";

    /// <summary>Horizontal reference lines (0 dB, −180°, DC value).</summary>
    public const string Reference = "#7D848C";

    /// <summary>Vertical markers and point markers (crossover, −3 dB point): a muted rust, apart from every series colour.</summary>
    public const string Marker = "#A0522D";

    /// <summary>Shaded frequency bands (the noise integration band).</summary>
    public const string Band = "#E6ECF3";

    /// <summary>The emphasised series (a total): near-black and thicker, so it leads the eye.</summary>
    public static SeriesStyle Emphasis { get; } = new(Ink, null, 2.4);

    /// <summary>The style of the <paramref name="index"/>-th ordinary series; cycles after eight.</summary>
    public static SeriesStyle Series(int index)
    {
        var i = ((index % Colors.Length) + Colors.Length) % Colors.Length;
        return new SeriesStyle(Colors[i], Dashes[i], 1.8);
    }
}
