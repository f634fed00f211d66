namespace Helipol.Emit.Dxf;

/// <summary>Text for DXF TEXT entities: plain ASCII upper case, which every reader shows alike,
/// and the box a reader may draw it in.</summary>
internal static class DxfText
{
    /// <summary>Width allowed per character, in text heights. A reader draws TEXT in a font of its
    /// choosing; a full text height per character holds the wide capitals of common CAD fonts with
    /// their spacing (common practice, no source), so layouts that keep this box clear keep every
    /// reader's lettering clear.</summary>
    public const double CharWidthPerHeight = 1.0;

    /// <summary>Depth below the baseline allowed for descenders, in text heights.</summary>
    public const double DescentPerHeight = 0.35;

    public static string Clean(string s)
    {
        var chars = s.ToUpperInvariant().Select(c => c is >= ' ' and <= '~' ? c : '_').ToArray();
        return new string(chars);
    }

    public static double WidthMm(string text, double heightMm) => text.Length * heightMm * CharWidthPerHeight;

    /// <summary>The height for a text to fit a width: the wanted height, or smaller, never below the floor.</summary>
    public static double HeightToFit(string text, double widthMm, double wantedMm, double floorMm = 1.0) =>
        Math.Max(floorMm, Math.Min(wantedMm, widthMm / Math.Max(1, text.Length * CharWidthPerHeight)));

    /// <summary>Breaks a text at spaces into lines no wider than the width at the given height.</summary>
    public static IReadOnlyList<string> Wrap(string text, double widthMm, double heightMm)
    {
        var max = Math.Max(1, (int)Math.Floor(widthMm / (heightMm * CharWidthPerHeight)));
        var lines = new List<string>();
        var line = "";
        foreach (var word in text.Split(' ', StringSplitOptions.RemoveEmptyEntries))
        {
            if (line.Length == 0) line = word;
            else if (line.Length + 1 + word.Length <= max) line += " " + word;
            else { lines.Add(line); line = word; }
        }
        if (line.Length > 0) lines.Add(line);
        return lines;
    }
}
