using Helipol.Emit.Sheet;
using ScottPlot;

namespace Helipol.Emit.Report;

/// <summary>
/// The one look every report plot shares, set here and nowhere else: the sheets' sans typeface,
/// titles as plain text above the frame, lines at least 2 px wide, and a palette a reader with a
/// colour-vision deficiency can still tell apart (Okabe and Ito, "Color Universal Design", 2008).
/// RHCP and LHCP also differ in line pattern (solid against dashed), so a grey print or a reader
/// who sees neither red nor blue still tells them apart.
/// </summary>
public static class PlotStyle
{
    /// <summary>Okabe–Ito colours (sRGB values as published by Okabe and Ito, 2008).</summary>
    public static readonly Color Black = new(0, 0, 0);
    public static readonly Color Orange = new(0xE6, 0x9F, 0x00);
    public static readonly Color SkyBlue = new(0x56, 0xB4, 0xE9);
    public static readonly Color BluishGreen = new(0x00, 0x9E, 0x73);
    public static readonly Color Blue = new(0x00, 0x72, 0xB2);
    public static readonly Color Vermillion = new(0xD5, 0x5E, 0x00);
    public static readonly Color ReddishPurple = new(0xCC, 0x79, 0xA7);
    public static readonly Color Grey = new(0x80, 0x80, 0x80);

    /// <summary>Width of every data line, px; guide lines (band edges, limits) are a little thinner.</summary>
    public const float LineWidth = 2.5f;
    public const float GuideWidth = 2f;

    /// <summary>Name under which the sheets' typeface is registered with the plotting library.</summary>
    public const string FontName = "helipol-sans";

    private static readonly Lazy<bool> Registered = new(() =>
    {
        // The plots use the very file the sheets use, so plot lettering and sheet lettering match.
        if (!File.Exists(SheetFonts.DejaVuSansPath)) return false;
        Fonts.AddFontFile(FontName, SheetFonts.DejaVuSansPath);
        // Set as the library's default before the first plot is made, so every label of every
        // plot (colour bars and polar labels included) is born in it; setting fonts item by item
        // after the fact left a colour bar's first render in another face.
        Fonts.Default = FontName;
        Fonts.Sans = FontName;
        Fonts.Serif = FontName;
        return true;
    });

    /// <summary>Colour and pattern of a sense's curve.</summary>
    public static (Color Colour, LinePattern Pattern) Sense(bool rhcp) =>
        rhcp ? (Vermillion, LinePattern.Solid) : (Blue, LinePattern.Dashed);

    /// <summary>A new plot in the house style: the font applied to every label, white background.</summary>
    public static Plot NewPlot()
    {
        _ = Registered.Value;
        return new Plot();
    }

    /// <summary>Applies the font to everything in the plot; call after the last item is added.</summary>
    public static void Finish(Plot plt, string title)
    {
        plt.Title(title, size: 15);
        plt.Axes.Title.Label.Bold = false;
        if (Registered.Value)
            foreach (var axis in plt.Axes.GetAxes())
            {
                // Axis labels carry their own face, fixed when the axis is made; name ours.
                axis.Label.FontName = FontName;
                axis.Label.Bold = false;
                axis.TickLabelStyle.FontName = FontName;
            }
        plt.Legend.FontSize = 12;
        plt.Legend.ShadowColor = Colors.Transparent;
        plt.Legend.OutlineColor = Grey;
        plt.Legend.BackgroundColor = Colors.White.WithAlpha(0.9);
    }

    /// <summary>A label style in the house face, upright and not bold.</summary>
    public static void Plain(LabelStyle style)
    {
        if (!Registered.Value) return;
        style.FontName = FontName;
        style.Bold = false;
    }

    /// <summary>A data curve in the house style.</summary>
    public static void Curve(ScottPlot.Plottables.Scatter s, Color colour, LinePattern pattern, string legend)
    {
        s.MarkerSize = 0;
        s.LineWidth = LineWidth;
        s.Color = colour;
        s.LinePattern = pattern;
        s.LegendText = legend;
    }
}
