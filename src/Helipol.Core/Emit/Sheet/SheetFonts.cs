using SkiaSharp;

namespace Helipol.Emit.Sheet;

/// <summary>The sheets' typeface: DejaVu Sans from the system font folder when present (free
/// licence, wide glyph coverage, stable metrics), otherwise the platform default.</summary>
public static class SheetFonts
{
    public const string DejaVuSansPath = "/usr/share/fonts/truetype/dejavu/DejaVuSans.ttf";
    private static readonly Lazy<SKTypeface> Regular = new(() =>
        (File.Exists(DejaVuSansPath) ? SKTypeface.FromFile(DejaVuSansPath) : null) ?? SKTypeface.Default);

    public static SKTypeface Typeface => Regular.Value;
}
